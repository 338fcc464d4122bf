import { StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/constants/theme';

type Tone = 'error' | 'info' | 'success';

/** A message in the flow of the page: server errors, confirmations, notes. */
export function Banner({ tone, title, children }: { tone: Tone; title?: string; children?: React.ReactNode }) {
  const t = tones[tone];
  return (
    <View role={tone === 'error' ? 'alert' : 'status'} style={[styles.box, { backgroundColor: t.bg, borderLeftColor: t.fg }]}>
      {title ? <Text style={[styles.title, { color: t.fg }]}>{title}</Text> : null}
      {children ? <Text style={styles.body}>{children}</Text> : null}
    </View>
  );
}

const tones: Record<Tone, { bg: string; fg: string }> = {
  error: { bg: colors.dangerSoft, fg: colors.danger },
  info: { bg: colors.accentSoft, fg: colors.accent },
  success: { bg: colors.successSoft, fg: colors.success },
};

const styles = StyleSheet.create({
  box: { borderRadius: radius.sm, borderLeftWidth: 3, paddingVertical: space.md, paddingHorizontal: space.lg, gap: 2 },
  title: { ...type.heading },
  body: { ...type.small, color: colors.ink },
});
