import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/constants/theme';

/** A box that ticks, with its label beside it: the Slate's export choices and the run form's options. */
export function Checkbox({ label, on, onPress }: { label: string; on: boolean; onPress: () => void }) {
  return (
    <Pressable role="checkbox" aria-checked={on} accessibilityLabel={label} onPress={onPress} style={styles.toggle}>
      <View style={[styles.tick, on && styles.tickOn]}>{on ? <Text style={styles.tickMark}>✓</Text> : null}</View>
      <Text style={styles.text}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  toggle: { minHeight: 44, flexDirection: 'row', alignItems: 'center', gap: space.xs + 2, paddingRight: space.sm },
  tick: { width: 20, height: 20, borderRadius: radius.sm, borderWidth: 1.5, borderColor: colors.inkMuted, alignItems: 'center', justifyContent: 'center' },
  tickOn: { borderColor: colors.accent, backgroundColor: colors.accent },
  tickMark: { color: colors.surface, fontSize: 13, lineHeight: 15 },
  text: { ...type.label, color: colors.ink, flexShrink: 1 },
});
