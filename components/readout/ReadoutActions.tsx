// What can be done from the Readout: copy the codes, bring a code or a family onto the Slate,
// simplify or make alternating, start a heavy run, export the picture (with what it shows
// besides the strands: arrows, component numbers, framings; TikZ bare or as a document).
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { defaultExportChoices, type ExportChoices } from '@/lib/slate/exports';
import { Checkbox } from '@/components/ui/Checkbox';
import { colors, radius, space, type } from '@/constants/theme';

export type ExportKind = 'svg' | 'png' | 'tikz';

type Props = {
  hasDiagram: boolean;
  /** The diagram has crossings to set alternating. */
  canAlternate: boolean;
  onAlternate: () => void;
  hasBraid: boolean;
  message: string | null;
  onCopyPD: () => void;
  onCopyBraid: () => void;
  onPaste: () => void;
  onFamilies: () => void;
  onSimplify: () => void;
  onRun: () => void;
  onExport: (kind: ExportKind, choices: ExportChoices) => void;
};

function Action({ label, onPress, disabled = false, primary = false }: { label: string; onPress: () => void; disabled?: boolean; primary?: boolean }) {
  return (
    <Pressable role="button" accessibilityLabel={label} aria-disabled={disabled} disabled={disabled} onPress={onPress}
      style={({ pressed }) => [styles.action, primary && styles.primary, pressed && styles.pressed, disabled && styles.disabled]}>
      <Text style={[styles.actionText, primary && styles.primaryText]}>{label}</Text>
    </Pressable>
  );
}

const toggles: [keyof ExportChoices, string][] = [
  ['arrows', 'Orientation arrows'],
  ['numbers', 'Component numbers'],
  ['framings', 'Framings'],
  ['standalone', 'TikZ as a LaTeX document'],
];

export function ReadoutActions(p: Props) {
  const [choices, setChoices] = useState<ExportChoices>(defaultExportChoices);
  return (
    <View style={styles.box}>
      <View style={styles.group}>
        <Text style={styles.head}>Onto the Slate</Text>
        <View style={styles.row}>
          <Action label="Paste a code" onPress={p.onPaste} primary />
          <Action label="Families" onPress={p.onFamilies} primary />
          <Action label="Simplify" onPress={p.onSimplify} disabled={!p.hasDiagram} />
          <Action label="Alternate" onPress={p.onAlternate} disabled={!p.canAlternate} />
        </View>
      </View>
      <View style={styles.group}>
        <Text style={styles.head}>Take it away</Text>
        <View style={styles.row}>
          <Action label="Copy PD code" onPress={p.onCopyPD} disabled={!p.hasDiagram} />
          {p.hasBraid ? <Action label="Copy braid word" onPress={p.onCopyBraid} /> : null}
          <Action label="Start a heavy run" onPress={p.onRun} disabled={!p.hasDiagram} />
        </View>
        <View style={styles.row}>
          <Action label="Export SVG" onPress={() => p.onExport('svg', choices)} disabled={!p.hasDiagram} />
          <Action label="Export PNG" onPress={() => p.onExport('png', choices)} disabled={!p.hasDiagram} />
          <Action label="Export TikZ" onPress={() => p.onExport('tikz', choices)} disabled={!p.hasDiagram} />
        </View>
        <View style={styles.row} role="group" aria-label="What the exports show">
          {toggles.map(([key, label]) => (
            <Checkbox key={key} label={label} on={choices[key]} onPress={() => setChoices((c) => ({ ...c, [key]: !c[key] }))} />
          ))}
        </View>
      </View>
      {p.message ? <Text role="status" style={styles.message}>{p.message}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.lg, paddingTop: space.lg, borderTopWidth: 1, borderTopColor: colors.line },
  group: { gap: space.sm },
  head: { ...type.caps, color: colors.inkMuted },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  action: { minHeight: 40, paddingHorizontal: space.md, justifyContent: 'center', borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  primary: { borderColor: colors.accent, backgroundColor: colors.accentSoft },
  pressed: { backgroundColor: colors.sunken },
  disabled: { opacity: 0.4 },
  actionText: { ...type.label, color: colors.ink },
  primaryText: { color: colors.accent },
  message: { ...type.small, color: colors.success },
});
