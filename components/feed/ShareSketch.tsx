// "Share a sketch": my sketches that the server holds and that are not in this group yet; one
// tap shares it (a sync change of its group, so my devices and the group's learn of it).
import { StyleSheet, Text, View } from 'react-native';
import { useMyServerSketches, useShare } from '@/hooks/queries/useFeed';
import { useSession } from '@/hooks/useSession';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { colors, space, type } from '@/constants/theme';

export function ShareSketch({ groupId, onShared }: { groupId: string; onShared: (sketchId: string) => void }) {
  const me = useSession((s) => s.user);
  const sketches = useMyServerSketches(true);
  const share = useShare();
  const mine = (sketches.data ?? []).filter((s) => s.ownerId === me?.id && s.groupId !== groupId && !s.deleted);
  return (
    <View style={styles.box}>
      <Text style={styles.title}>Share one of my sketches</Text>
      {sketches.isPending ? <Text style={styles.muted}>Loading your sketchbook…</Text> : null}
      {sketches.data && mine.length === 0 ? (
        <Text style={styles.muted}>Nothing to share: sketches appear here once they have synced to the server.</Text>
      ) : null}
      {share.error ? <Banner tone="error">{share.error.message}</Banner> : null}
      {mine.map((s) => (
        <View key={s.id} style={styles.row}>
          <Text style={styles.name} numberOfLines={1}>{s.title || 'Untitled sketch'}{s.groupId ? ' (in another group)' : ''}</Text>
          <Button variant="secondary" label={`Share ${s.title || 'sketch'}`} busy={share.isPending && share.variables?.sketchId === s.id} busyLabel="Sharing…"
            onPress={() => share.mutate({ sketchId: s.id, groupId }, { onSuccess: () => onShared(s.id) })} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: 12, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  title: { ...type.heading, color: colors.ink },
  muted: { ...type.small, color: colors.inkMuted },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  name: { ...type.body, color: colors.ink, flex: 1 },
});
