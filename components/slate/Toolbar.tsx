// Above the Slate: the tool, undo / redo, fit; and, when a component is selected, what can be
// done to it (reverse, framing, colour, delete).
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { deleteComponent, reverseComponent } from '@/shared/drawing/sketch';
import { colourOf } from '@/lib/slate/picture';
import { redoable, undoable, useSlate, type Tool } from '@/lib/slate/slate-store';
import { chalk, colors, space, type } from '@/constants/theme';
import { ToolChip as Chip } from '@/components/ui/ToolChip';


const tools: { tool: Tool; label: string }[] = [
  { tool: 'draw', label: 'Draw' },
  { tool: 'flip', label: 'Flip' },
  { tool: 'move', label: 'Move' },
  { tool: 'reshape', label: 'Reshape' },
  { tool: 'bands', label: 'Bands' },
];

export function Toolbar() {
  const tool = useSlate((s) => s.tool);
  const canUndo = useSlate(undoable);
  const canRedo = useSlate(redoable);
  const s = useSlate.getState();
  return (
    <View style={styles.bar}>
      <View style={styles.group} role="radiogroup" aria-label="Tool">
        {tools.map((t) => (
          <Chip key={t.tool} label={t.label} on={tool === t.tool} onPress={() => s.setTool(t.tool)} />
        ))}
      </View>
      <View style={styles.group}>
        <Chip label="Undo" text="↶" onPress={s.undo} disabled={!canUndo} />
        <Chip label="Redo" text="↷" onPress={s.redo} disabled={!canRedo} />
        <Chip label="Fit" text="⤢" onPress={s.fit} />
      </View>
    </View>
  );
}

export function SelectionBar({ numberOf, onFraming }: { numberOf: (id: string) => number | null; onFraming: (id: string) => void }) {
  const selected = useSlate((s) => s.selected);
  const doc = useSlate((s) => s.history.present);
  if (!selected || !doc.sketch.components.some((c) => c.id === selected)) return null;
  const s = useSlate.getState();
  const edit = (sketch: typeof doc.sketch) => s.apply({ ...doc, sketch });
  const current = colourOf(doc, selected);
  const number = numberOf(selected);
  return (
    <View style={styles.selection} testID="selection-bar">
      <Text style={styles.selText}>{number ? `Component ${number}` : 'Unfinished strand'}</Text>
      <View style={styles.swatches} role="radiogroup" aria-label="Colour">
        {chalk.map((c, i) => (
          <Pressable key={c} role="radio" aria-checked={c === current} accessibilityLabel={`Colour ${i + 1}`}
            onPress={() => s.apply({ ...doc, colours: { ...doc.colours, [selected]: i } })}
            style={[styles.swatch, { backgroundColor: c }, c === current && styles.swatchOn]} />
        ))}
      </View>
      <View style={styles.group}>
        <Chip label="Reverse" onPress={() => edit(reverseComponent(doc.sketch, selected))} />
        <Chip label="Framing" onPress={() => onFraming(selected)} />
        <Chip label="Delete" onPress={() => (edit(deleteComponent(doc.sketch, selected)), s.select(null))} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', gap: space.sm, paddingHorizontal: space.sm, paddingVertical: space.sm, backgroundColor: colors.paper },
  group: { flexDirection: 'row', flexWrap: 'wrap', gap: 4 },
  selection: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.sunken, borderTopWidth: 1, borderTopColor: colors.line },
  selText: { ...type.label, color: colors.ink },
  swatches: { flexDirection: 'row', gap: 6 },
  swatch: { width: 24, height: 24, borderRadius: 12, borderWidth: 2, borderColor: 'transparent' },
  swatchOn: { borderColor: colors.ink },
});
