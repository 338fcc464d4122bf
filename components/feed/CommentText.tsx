// A comment's body: Markdown and $TeX$ parsed to blocks of spans (shared/text/comment-markdown.ts)
// and drawn as text nodes, maths typeset by KaTeX on web; links open in the browser.
import { Linking, StyleSheet, Text, View } from 'react-native';
import { commentBlocks, type Span } from '@/shared/text/comment-markdown';
import { TeX } from '@/components/ui/Math';
import { colors, fonts, radius, space, type } from '@/constants/theme';

function SpanText({ s }: { s: Span }) {
  if (s.kind === 'break') return <Text>{'\n'}</Text>;
  if (s.kind === 'math') return <TeX tex={s.tex} text={s.tex} />;
  return (
    <Text style={[s.bold && styles.bold, s.italic && styles.italic, s.code && styles.code, s.href && styles.link]}
      {...(s.href && { role: 'link' as const, onPress: () => void Linking.openURL(s.href!) })}>
      {s.text}
    </Text>
  );
}

export function CommentText({ body }: { body: string }) {
  return (
    <View style={styles.wrap}>
      {commentBlocks(body).map((b, i) => (
        <Text key={i} style={[styles.body, b.kind === 'heading' && styles.heading, b.kind === 'quote' && styles.quote, b.kind === 'code' && styles.codeBlock,
          b.depth ? { paddingLeft: space.md * b.depth } : null]}>
          {b.marker ? `${b.marker} ` : null}
          {b.spans.map((s, j) => <SpanText key={j} s={s} />)}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  body: { ...type.body, color: colors.ink },
  heading: { fontFamily: fonts.semibold },
  quote: { paddingLeft: space.md, borderLeftWidth: 3, borderLeftColor: colors.line, color: colors.inkMuted },
  codeBlock: { padding: space.sm, borderRadius: radius.md, backgroundColor: colors.sunken },
  bold: { fontFamily: fonts.semibold },
  italic: { fontStyle: 'italic' },
  code: { fontFamily: fonts.mono, fontSize: 14, backgroundColor: colors.sunken },
  link: { color: colors.accent, textDecorationLine: 'underline' },
});
