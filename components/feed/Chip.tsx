import { Pressable, StyleSheet, Text } from 'react-native';
import { colors, radius, space, type } from '@/constants/theme';

/** A small toggle used by the group picker and the feed filters. */
export function Chip({ label, on, onPress }: { label: string; on: boolean; onPress: () => void }) {
  return (
    <Pressable role="button" aria-pressed={on} onPress={onPress} style={[styles.chip, on && styles.on]}>
      <Text style={[styles.text, on && styles.textOn]} numberOfLines={1}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: { maxWidth: '100%', minHeight: 36, justifyContent: 'center', paddingHorizontal: space.md, borderRadius: radius.pill, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.surface },
  on: { backgroundColor: colors.accent, borderColor: colors.accent },
  text: { ...type.label, color: colors.ink, flexShrink: 1 },
  textOn: { color: colors.onAccent },
});
