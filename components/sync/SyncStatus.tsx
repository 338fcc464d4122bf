// The visible sync status (sync/SPEC.md S31) with "Sync now"; in conflict it opens them; a
// failure says why beside it.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { router } from 'expo-router';
import { colors, radius, space, type } from '@/constants/theme';
import { useSyncStatus } from '@/hooks/useDevice';
import type { SyncStatus as Status } from '@/sync/status';

const tone = (s: Status) =>
  s.kind === 'conflict' || s.kind === 'rejected' || s.kind === 'failed'
    ? { fg: colors.danger, bg: colors.dangerSoft }
    : s.kind === 'upToDate'
      ? { fg: colors.success, bg: colors.successSoft }
      : { fg: colors.inkMuted, bg: colors.sunken };

export function SyncStatus() {
  const { status, label, syncNow } = useSyncStatus();
  const t = tone(status);
  const syncing = status.kind === 'syncing';
  return (
    <View style={styles.row} accessibilityLiveRegion="polite">
      <Pressable
        testID="sync-status"
        role={status.kind === 'conflict' ? 'link' : undefined}
        accessibilityLabel={status.kind === 'conflict' ? `${label}: open them` : label}
        disabled={status.kind !== 'conflict'}
        onPress={() => router.push('/sketches/conflicts')}
        style={[styles.pill, { backgroundColor: t.bg }]}
      >
        <Text style={[styles.text, { color: t.fg }]}>{label}</Text>
      </Pressable>
      {status.kind === 'failed' ? <Text style={styles.reason} numberOfLines={2}>{status.error}</Text> : null}
      {/* Kept (disabled) while syncing, so the row keeps its width and the list below does not jump. */}
      <Pressable role="button" accessibilityLabel="Sync now" aria-disabled={syncing} disabled={syncing} onPress={() => void syncNow()} style={[styles.action, syncing && styles.idle]}>
        <Text style={styles.actionText}>Sync now</Text>
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  pill: { borderRadius: radius.pill, paddingHorizontal: space.md, paddingVertical: 4 },
  text: { ...type.label },
  reason: { ...type.small, color: colors.danger, flexShrink: 1 },
  action: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.sm },
  actionText: { ...type.label, color: colors.accent },
  idle: { opacity: 0.4 },
});
