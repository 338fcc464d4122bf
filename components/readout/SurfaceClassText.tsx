// The class of the band surface in Kh^{0,chi}(K; F2) as the Readout shows it: its bidegree,
// zero or not, and its coordinates in the basis of shared/knot/bands/class.ts (enhanced states of
// the band drawing's PD code: a 0/1 resolution per crossing, the x-labelled circles named by
// their smallest edge label) or, past the cube's limit, of class-local.ts (numbered generators of
// the simplified complex), or why it was not computed (the crossing limits).
import { StyleSheet, Text, View } from 'react-native';
import type { SurfaceClass } from '@/shared/knot/bands';
import { CLASS_CROSSINGS, LOCAL_CLASS_CROSSINGS, LOCAL_CLASS_EDGES } from '@/shared/knot/bands';
import { colors, fonts, type } from '@/constants/theme';
import type { ClassAnswer } from './local-bands';

/** Basis states listed before "… and n more". */
const shown = 6;

const minus = (n: number) => (n < 0 ? `−${-n}` : `${n}`);

export const bidegree = (c: SurfaceClass) => `(h, q) = (0, ${minus(c.q)})`;

export function coordinates(c: SurfaceClass): string {
  if (c.zero) return `all 0 (a basis of ${c.basisSize})`;
  const states = c.support.slice(0, shown).map((s) => ('generator' in s ? `g${s.generator}` : s.x.length ? `${s.smoothing}·x{${s.x.join(',')}}` : s.smoothing || '∅'));
  const more = c.support.length > shown ? ` … and ${c.support.length - shown} more` : '';
  return `1 at ${states.join(', ')}${more} (of a basis of ${c.basisSize})`;
}

export function SurfaceClassText({ surface }: { surface: ClassAnswer }) {
  if (surface === null) return null;
  if ('reason' in surface) return <Text style={styles.note} testID="readout-bands-class">Class in Khovanov homology not computed: {surface.reason}.</Text>;
  const c = surface.value;
  return (
    <View testID="readout-bands-class">
      <Text style={styles.num}>Class over F2: {c.zero ? 'zero' : 'nonzero'} at {bidegree(c)}</Text>
      <Text style={styles.coords} selectable>Coordinates: {coordinates(c)}</Text>
      <Text style={styles.note}>
        {c.basis === 'cube'
          ? "Basis: enhanced states of the band drawing's code (resolution per crossing; x-circles by smallest edge label)."
          : "Basis: generators g0, g1, … of the code's complex simplified by the local algorithm (numbered in its order, for this drawing's bands only)."}{' '}
        Cube of resolutions up to {CLASS_CROSSINGS} crossings; past it the local algorithm, up to {LOCAL_CLASS_CROSSINGS} crossings and bands on {LOCAL_CLASS_EDGES} edges.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  num: { fontFamily: fonts.mono, fontSize: 15, lineHeight: 22, color: colors.ink },
  coords: { fontFamily: fonts.mono, fontSize: 12, lineHeight: 18, color: colors.ink },
  note: { ...type.small, fontSize: 12, color: colors.inkFaint },
});
