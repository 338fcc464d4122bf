// Above the Readout while the drawing is descending: a drawn knot starts so (each later passage
// goes under), and then every invariant is the unlink's. Says so, and offers the one action that
// makes it alternating.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/constants/theme';

/** What a descending diagram of this many components is: one component is a knot, so it is the unknot. */
const trivial = (components: number) => (components === 1 ? 'the unknot' : `the ${components}-component unlink`);

export function DescendingNote({ components, onAlternate }: { components: number; onAlternate: () => void }) {
  return (
    <View style={styles.box} role="status" testID="descending-note">
      <Text style={styles.text}>
        Descending: each strand passes over before it passes under, so this is {trivial(components)} whatever it looks like. Flip crossings, or make it alternating.
      </Text>
      <Pressable role="button" accessibilityLabel="Make alternating" onPress={onAlternate} style={({ pressed }) => [styles.button, pressed && styles.pressed]}>
        <Text style={styles.buttonText}>Alternate</Text>
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flexDirection: 'row', alignItems: 'center', gap: space.md, padding: space.md, borderRadius: radius.md, backgroundColor: colors.accentSoft },
  text: { ...type.small, color: colors.ink, flex: 1 },
  button: { minHeight: 44, paddingHorizontal: space.md, justifyContent: 'center', borderRadius: radius.md, backgroundColor: colors.accent },
  pressed: { opacity: 0.8 },
  buttonText: { ...type.label, color: colors.surface },
});
