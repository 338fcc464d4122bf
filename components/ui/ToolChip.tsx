// The square-cornered button of the Slate's bars (tools, undo, band twists) and of the Readout's
// band comparison: a word, or a symbol with the word as its accessible label; "on" for a chosen tool.
import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, radius, type } from '@/constants/theme';

export function ToolChip({ label, text, onPress, on = false, disabled = false }: { label: string; text?: string; onPress: () => void; on?: boolean; disabled?: boolean }) {
  return (
    <Pressable role="button" accessibilityLabel={label} aria-pressed={on} aria-disabled={disabled} disabled={disabled} onPress={onPress}
      style={({ pressed }) => [styles.chip, on && styles.chipOn, pressed && styles.chipPressed, disabled && styles.disabled]}>
      <Text style={[styles.chipText, on && styles.chipTextOn, text !== undefined && styles.symbol]}>{text ?? label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: { flexDirection: 'row', alignItems: 'center', gap: 5, minHeight: 40, minWidth: 38, justifyContent: 'center', paddingHorizontal: 9, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  chipOn: { backgroundColor: colors.ink, borderColor: colors.ink },
  chipPressed: { backgroundColor: colors.accentSoft },
  chipText: { ...type.label, color: colors.ink },
  chipTextOn: { color: colors.paper },
  symbol: { fontSize: 18, lineHeight: 22 },
  disabled: { opacity: 0.4 },
});
