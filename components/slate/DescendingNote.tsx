// Above the Readout while the drawing is descending: a drawn knot starts so (each later passage
// goes under), and then every invariant is the unlink's. Says so, and offers the one action that
// makes it alternating; a drawing that already alternates (a curl) gets more crossings instead:
// each of its crossings is nugatory, so no flip changes it (a reduced alternating diagram with
// n > 0 crossings has bracket span 4n and is nonsplit: Kauffman, Murasugi, Thistlethwaite 1987;
// Menasco 1984; neither holds for an unlink).
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radius, space, type } from '@/constants/theme';

/** What a descending diagram of this many components is: one component is a knot, so it is the unknot. */
const trivial = (components: number) => (components === 1 ? 'the unknot' : `the ${components}-component unlink`);

export function DescendingNote({ components, alternating, onAlternate }: { components: number; alternating: boolean; onAlternate: () => void }) {
  return (
    <View style={styles.box} role="status" testID="descending-note">
      <Text style={styles.text}>
        Descending: each strand passes over before it passes under, so this is {trivial(components)} whatever it looks like.
        {alternating ? ' It already alternates, so each crossing untwists away: no flip changes that. Draw more crossings.' : ' Flip crossings, or make it alternating.'}
      </Text>
      {alternating ? null : <Pressable role="button" accessibilityLabel="Make alternating" onPress={onAlternate} style={({ pressed }) => [styles.button, pressed && styles.pressed]}>
        <Text style={styles.buttonText}>Alternate</Text>
      </Pressable>}
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
