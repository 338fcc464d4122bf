// The conventions the Readout's values follow, in short (the full text is docs/conventions.md),
// and the line under a knot's name saying which chirality the name table means by it.
import { StyleSheet, Text, View } from 'react-native';
import { Dialog } from '@/components/ui/Dialog';
import { NameText } from './NameText';
import { minus } from '@/shared/text/integers';
import { colors, space, type } from '@/constants/theme';

/**
 * Which of the two mirror images the table's entry is, told by its signature (the one
 * invariant on the Readout that changes sign with the mirror). Null when the signature is 0
 * and cannot tell them apart.
 */
export function chiralityNote(name: string, mirror: boolean, signature: number): string | null {
  if (signature === 0) return null;
  const entry = mirror ? -signature : signature;
  const which = name === '3_1' ? 'is the positive (right-handed) trefoil, with' : 'has';
  return `Our table's ${name} ${which} signature ${minus(entry)}${mirror ? '; this diagram is its mirror' : ''}. Positive knots have negative signature here.`;
}

const sections: [string, string][] = [
  ['PD code', 'X[a,b,c,d]: the edges met counterclockwise around a crossing, starting from the incoming under-strand (under-strand a → c). A crossing is positive when the over-strand runs from d to b.'],
  ['Jones polynomial', 'V(L) = (−A³)^(−w) ⟨L⟩ at A = t^(−1/4). The positive trefoil has V = t + t³ − t⁴.'],
  ['Signature', 'From the Goeritz matrix with the Gordon–Litherland correction. Positive knots have negative signature: the positive trefoil has signature −2.'],
  ['Names', 'A name means the invariants match that entry of our table (prime knots up to 8 crossings, numbered as in Rolfsen); it is a guess, not a proof. A chiral entry is one fixed mirror image: 3_1 is the positive trefoil; the other one reads "3_1 (mirror)".'],
  ['Framings and linking numbers', 'A framing is an integer per component; by default the blackboard framing (bb), the writhe of the component\'s self-crossings. lk(i, j) is half the sum of the signs of the crossings between components i and j. Components are numbered in drawing order.'],
  ['Khovanov homology and s', 'Bar-Natan\'s grading (homological i, quantum j). With these signs the positive trefoil has s = 2.'],
];

export function ConventionsSheet({ visible, onClose }: { visible: boolean; onClose: () => void }) {
  return (
    <Dialog title="Conventions" visible={visible} onClose={onClose} wide>
      {sections.map(([title, text]) => (
        <View key={title} style={styles.section}>
          <Text role="heading" aria-level={3} style={styles.title}>{title}</Text>
          <NameText style={styles.text} text={text} />
        </View>
      ))}
    </Dialog>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.xs },
  title: { ...type.heading, color: colors.ink },
  text: { ...type.body, color: colors.inkMuted },
});
