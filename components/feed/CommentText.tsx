// A comment's body with its simple formatting, as text nodes only (lib/comment-format.ts).
import { StyleSheet, Text } from 'react-native';
import { formatComment } from '@/lib/comment-format';
import { colors, fonts, type } from '@/constants/theme';

export function CommentText({ body }: { body: string }) {
  return (
    <Text style={styles.body}>
      {formatComment(body).map((s, i) => (
        <Text key={i} style={[s.bold && styles.bold, s.italic && styles.italic, s.code && styles.code]}>{s.text}</Text>
      ))}
    </Text>
  );
}

const styles = StyleSheet.create({
  body: { ...type.body, color: colors.ink },
  bold: { fontFamily: fonts.semibold },
  italic: { fontStyle: 'italic' },
  code: { fontFamily: fonts.mono, fontSize: 14, backgroundColor: colors.sunken },
});
