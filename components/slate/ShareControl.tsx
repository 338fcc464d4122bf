// Where a sketch is shared, and for its owner: share it to one of their groups (not where they
// are a viewer, sync/SPEC.md S23) or stop sharing. Setting groupId is an ordinary local write
// (S5, S8), so it works offline and reaches the group on the next sync.
import { StyleSheet, Text, View } from 'react-native';
import type { LocalSketch } from '@/lib/store/types';
import type { Rejected } from '@/sync/outbox';
import { groupName, useKnownGroups, useRejected, useSketchWrites } from '@/hooks/queries/useLocalSketches';
import { useSession } from '@/hooks/useSession';
import { Banner } from '@/components/ui/Banner';
import { Button } from '@/components/ui/Button';
import { colors, space, type } from '@/constants/theme';

/** "Shared to Knot lunch", or null for a private sketch. */
export function sharedLabel(sketch: Pick<LocalSketch, 'groupId'>, groups: ReturnType<typeof useKnownGroups>): string | null {
  return sketch.groupId ? `Shared to ${groupName(groups, sketch.groupId)}` : null;
}

/** S24: this sketch's share changes the server refused (kept until the owner dismisses them). */
export function useRefusedShares(sketchId: string): Rejected[] {
  return (useRejected(sketchId).data ?? []).filter((r) => 'groupId' in r.mutation.fields);
}

const why: Record<string, string> = {
  forbidden: 'only the owner shares a sketch, and not to a group where they are a viewer',
  invalid: 'the change was not valid',
};

function refusal(r: Rejected, groups: ReturnType<typeof useKnownGroups>): string {
  const to = r.mutation.fields.groupId;
  const what = typeof to === 'string' ? `sharing to ${groupName(groups, to)}` : 'to stop sharing';
  return `The server refused ${what}: ${why[r.reason] ?? r.reason}.`;
}

export function ShareControl({ sketch }: { sketch: LocalSketch }) {
  const me = useSession((s) => s.user?.id ?? null);
  const groups = useKnownGroups();
  const { update, dismissRejected } = useSketchWrites();
  const refused = useRefusedShares(sketch.id);
  const mine = sketch.ownerId === null || sketch.ownerId === me;
  const shared = sharedLabel(sketch, groups);
  const targets = groups.filter((g) => g.role !== 'viewer' && g.id !== sketch.groupId);
  const setGroup = (groupId: string | null) => update.mutate({ id: sketch.id, patch: { groupId } });

  if (!mine) return <Text style={styles.state}>{shared ?? 'Private'} by its owner; only they can change where it is shared.</Text>;
  return (
    <View style={styles.box}>
      <Text style={styles.state} testID="share-state">
        {shared ?? 'Private: only you see it'}
        {sketch.groupId && sketch.pending ? ' (reaches the group on the next sync)' : ''}
      </Text>
      {refused.map((r) => (
        <View key={r.mutation.mutationId} style={styles.refused} testID="share-refused">
          <Banner tone="error" title="Share not applied">{refusal(r, groups)}</Banner>
          <View style={styles.row}>
            <Button variant="quiet" label="Dismiss" onPress={() => dismissRejected.mutate(r.mutation.mutationId)} disabled={dismissRejected.isPending} />
          </View>
        </View>
      ))}
      {sketch.groupId ? (
        <View style={styles.row}>
          <Button variant="danger" label="Stop sharing" onPress={() => setGroup(null)} busy={update.isPending} busyLabel="Saving…" />
        </View>
      ) : null}
      {targets.length ? (
        <View style={styles.row}>
          {targets.map((g) => (
            <Button key={g.id} variant="secondary" label={`${sketch.groupId ? 'Move to' : 'Share to'} ${g.name}`} onPress={() => setGroup(g.id)} disabled={update.isPending} />
          ))}
        </View>
      ) : groups.length === 0 ? (
        <Text style={styles.note}>Join or create a group (Account) to share sketches with it.</Text>
      ) : groups.some((g) => g.id !== sketch.groupId) ? (
        <Text style={styles.note}>{sketch.groupId ? 'In your other groups' : 'In your groups'} you are a viewer; members, admins and owners share.</Text>
      ) : null}
      {/* Only where there is a share to make or undo; a viewer everywhere has read why not. */}
      {targets.length || sketch.groupId ? <Text style={styles.note}>Everyone in the group sees the sketch, its photos and its Readout in the Feed. Works offline: the change syncs later.</Text> : null}
      {update.error ? <Banner tone="error">{update.error.message}</Banner> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  state: { ...type.body, color: colors.ink },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  note: { ...type.small, color: colors.inkMuted },
  refused: { gap: space.xs },
});
