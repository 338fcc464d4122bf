// "Compare with…": the Slate's band surface against another sketch's on the same knot drawing (a
// fork, or a copy with other bands). Both classes are carried to one diagram (local-compare.ts)
// in a worker; different classes over F2 mean the surfaces are not isotopic rel boundary, equal
// ones prove nothing, and another drawing (even of the same knot) is another diagram: no comparison.
import { useMemo, useState } from 'react';
import { create } from 'zustand';
import { StyleSheet, Text, View } from 'react-native';
import { bandsOf } from '@/shared/drawing/bands';
import { useBandComparison } from '@/hooks/useBandComparison';
import { useLocalSketches } from '@/hooks/queries/useLocalSketches';
import { drawnDoc } from '@/lib/slate/record';
import { useSlate } from '@/lib/slate/slate-store';
import { ToolChip as Chip } from '@/components/ui/ToolChip';
import { TeX } from '@/components/ui/Math';
import { colors, space, type } from '@/constants/theme';
import type { CompareAnswer } from './local-compare';
import { bidegree } from './SurfaceClassText';

const titleOf = (t: string) => t || 'Untitled sketch';

// The sketch chosen for comparison, kept outside the component: the Readout is mounted again
// when the phone's split changes, and the choice belongs to the open sketch until another opens.
const useChoice = create<{ of: string | null; other: string | null; choose(of: string | null, other: string): void }>((set) => ({
  of: null,
  other: null,
  choose: (of, other) => set({ of, other }),
}));

function verdictText(r: CompareAnswer): string {
  if (r.kind === 'not-same') return 'Drawn on different diagrams: no comparison (the two sketches need the same knot drawing, as a fork has; their bands may differ).';
  if (r.kind === 'refused') return `No comparison: ${r.reason}`;
  if (r.verdict === 'differ') return 'Their classes differ: the surfaces are not isotopic rel boundary.';
  return 'Equal classes (no conclusion).';
}

/** Other sketches of this device with bands, and their drawings. */
function useCandidates(current: string | null) {
  const list = useLocalSketches().data;
  return useMemo(
    () =>
      (list ?? []).flatMap((s) => {
        const doc = s.id !== current && !s.deleted ? drawnDoc(s.diagram) : null;
        return doc && bandsOf(doc.sketch).length > 0 ? [{ id: s.id, title: titleOf(s.title), sketch: doc.sketch }] : [];
      }),
    [list, current],
  );
}

export function BandsCompare() {
  const sketchId = useSlate((s) => s.sketchId);
  const sketch = useSlate((s) => s.history.present.sketch);
  const dragging = useSlate((s) => s.preview !== null);
  const candidates = useCandidates(sketchId);
  const [open, setOpen] = useState(false);
  const choice = useChoice();
  const chosen = choice.of === sketchId ? choice.other : null;
  const other = candidates.find((c) => c.id === chosen) ?? null;
  const r = useBandComparison(sketch, other?.sketch ?? null, dragging);
  return (
    <View style={styles.box} testID="readout-bands-compare">
      {/* The title wraps beside the button, never below it (the Readout pane is narrow when wide). */}
      <View style={styles.head}>
        <Chip label="Compare with…" on={open} onPress={() => setOpen(!open)} />
        {other ? <Text style={styles.line}>with “{other.title}”</Text> : null}
      </View>
      {open ? (
        candidates.length ? (
          <View style={styles.row}>
            {candidates.map((c) => (
              <Chip key={c.id} label={`Compare with ${c.title}`} text={c.title} on={c.id === chosen} onPress={() => (choice.choose(sketchId, c.id), setOpen(false))} />
            ))}
          </View>
        ) : (
          <Text style={styles.note}>No other sketch on this device has bands: fork this one, or draw other bands on a copy.</Text>
        )
      ) : null}
      {other && r.stale ? <Text style={styles.updating} aria-busy>comparing…</Text> : null}
      {other && r.error ? <Text style={styles.error}>Could not compare: {r.error}</Text> : null}
      {other && r.value ? (
        <View style={r.stale && styles.stale} testID="readout-bands-verdict">
          <Text style={styles.line}>{verdictText(r.value)}</Text>
          {r.value.kind === 'compared' ? (
            <Text style={styles.note}>
              This sketch: {r.value.a.zero ? 'zero' : 'nonzero'} at {bidegree(r.value.a)}; “{other.title}”: {r.value.b.zero ? 'zero' : 'nonzero'} at {bidegree(r.value.b)} (over <TeX tex="\mathbb{F}_2" text="𝔽₂" />, {r.value.on === 'knot' ? 'on the knot drawing, the fingers that bring each band to a saddle taken back' : 'on the drawing with both sets of bands'}).
            </Text>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, marginTop: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  line: { ...type.small, color: colors.ink, flexShrink: 1 },
  stale: { opacity: 0.5 },
  updating: { ...type.label, fontSize: 12, color: colors.accent },
  note: { ...type.small, fontSize: 12, color: colors.inkFaint },
  error: { ...type.small, color: colors.danger },
});
