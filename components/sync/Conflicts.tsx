// Conflict copies (sync/SPEC.md S20, S21): for each, the sketch's current values beside the
// ones that lost, field by field; keep the current ones or bring the other version back.
import { StyleSheet, Text, View } from 'react-native';
import { useConflicts, useLocalSketch, useSketchWrites } from '@/hooks/queries/useLocalSketches';
import type { LocalConflict } from '@/lib/store/types';
import type { SketchFieldsPatch } from '@/shared/api/sketches';
import { Button } from '@/components/ui/Button';
import { Banner } from '@/components/ui/Banner';
import { EmptyState } from '@/components/ui/EmptyState';
import { Section } from '@/components/ui/Section';
import { colors, space, type } from '@/constants/theme';

const fieldNames: Record<string, string> = {
  title: 'Title',
  seenAt: 'Where it was seen',
  notes: 'Notes',
  tags: 'Tags',
  diagram: 'Drawing',
  attachments: 'Board photos',
  groupId: 'Shared to',
  deleted: 'Deleted',
};

/** A field's value in words, short enough to compare side by side. */
export function describe(field: string, value: unknown): string {
  if (value === undefined || value === null || value === '') return '(empty)';
  if (field === 'deleted') return value ? 'deleted' : 'kept';
  if (field === 'diagram') {
    const d = value as { pd?: unknown[]; unknots?: number };
    return `${d.pd?.length ?? 0} crossings${d.unknots ? `, ${d.unknots} unknotted circles` : ''}`;
  }
  if (field === 'attachments') return `${(value as unknown[]).length} photo(s)`;
  if (Array.isArray(value)) return value.join(', ');
  return String(value);
}

function ConflictCard({ conflict }: { conflict: LocalConflict }) {
  const { resolve } = useSketchWrites();
  const sketch = useLocalSketch(conflict.recordId).data ?? undefined; // deleted ones too
  const fields = Object.keys(conflict.losing) as (keyof SketchFieldsPatch)[];
  const current = (f: keyof SketchFieldsPatch) => sketch?.[f];
  const choose = (chosen: SketchFieldsPatch) => resolve.mutate({ conflictId: conflict.id, chosen });
  return (
    <Section title={sketch?.title || 'Untitled sketch'} note="Edited on two devices before they synced.">
      {fields.map((f) => (
        <View key={f} style={styles.field} testID={`conflict-${f}`}>
          <Text style={styles.name}>{fieldNames[f] ?? f}</Text>
          <Text style={styles.value}>Now: {describe(f, current(f))}</Text>
          <Text style={styles.other}>Other version: {describe(f, conflict.losing[f])}</Text>
        </View>
      ))}
      {resolve.error ? <Banner tone="error">{resolve.error.message}</Banner> : null}
      <View style={styles.actions}>
        <Button label="Keep current" variant="secondary" onPress={() => choose({})} busy={resolve.isPending} />
        <Button label="Use the other version" onPress={() => choose(conflict.losing as SketchFieldsPatch)} busy={resolve.isPending} />
      </View>
    </Section>
  );
}

export function Conflicts() {
  const conflicts = useConflicts();
  if (conflicts.data && conflicts.data.length === 0) {
    return <EmptyState title="No conflicts">Every sketch agrees across your devices.</EmptyState>;
  }
  return (
    <View style={styles.list}>
      {(conflicts.data ?? []).map((c) => (
        <ConflictCard key={c.id} conflict={c} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xl },
  field: { gap: 2 },
  name: { ...type.label, color: colors.inkMuted },
  value: { ...type.body, color: colors.ink },
  other: { ...type.body, color: colors.accent },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
});
