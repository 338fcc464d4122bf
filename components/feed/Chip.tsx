import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, radius, space, type } from '@/constants/theme';

/** A small toggle used by the group picker and the feed filters; a long label wraps to a second line. */
export function Chip({ label, on, onPress }: { label: string; on: boolean; onPress: () => void }) {
  return (
    <Pressable role="button" aria-pressed={on} onPress={onPress} style={[styles.chip, on && styles.on]}>
      <Text style={[styles.text, on && styles.textOn]} numberOfLines={2}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: { maxWidth: '100%', minHeight: 44, paddingVertical: space.xs, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: radius.pill, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  on: { backgroundColor: colors.accent, borderColor: colors.accent },
  text: { ...type.label, color: colors.ink, flexShrink: 1 },
  textOn: { color: colors.onAccent },
});
