import { StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/constants/theme';

/** What a screen shows when it has nothing yet: what this place is for and what to do next. */
export function EmptyState({ art, title, children, action }: {
  art?: React.ReactNode;
  title: string;
  children: React.ReactNode;
  action?: React.ReactNode;
}) {
  return (
    <View style={styles.box}>
      {art ? <View style={styles.art}>{art}</View> : null}
      <Text role="heading" aria-level={2} style={styles.title}>
        {title}
      </Text>
      <Text style={styles.body}>{children}</Text>
      {action ? <View style={styles.action}>{action}</View> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    paddingVertical: space.xxxl,
    paddingHorizontal: space.xl,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderColor: colors.line,
    gap: space.md,
  },
  art: { marginBottom: space.sm },
  title: { ...type.title, color: colors.ink, textAlign: 'center' },
  body: { ...type.body, color: colors.inkMuted, textAlign: 'center', maxWidth: 420 },
  action: { marginTop: space.sm },
});
