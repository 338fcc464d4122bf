import { StyleSheet, View } from 'react-native';
import { colors, radius } from '@/constants/theme';
import type { RunStatus } from '@/shared/api/runs';

const fill: Record<RunStatus, string> = {
  queued: colors.inkFaint,
  running: colors.accent,
  done: colors.success,
  failed: colors.danger,
  cancelled: colors.inkFaint,
};

export function ProgressBar({ fraction, status, label }: { fraction: number; status: RunStatus; label: string }) {
  const pct = Math.round(Math.max(0, Math.min(1, fraction)) * 100);
  return (
    <View role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} style={styles.track}>
      <View style={[styles.fill, { width: `${pct}%`, backgroundColor: fill[status] }]} />
    </View>
  );
}

const styles = StyleSheet.create({
  track: { height: 8, borderRadius: radius.pill, backgroundColor: colors.sunken, overflow: 'hidden', minWidth: 60 },
  fill: { height: '100%', borderRadius: radius.pill },
});
