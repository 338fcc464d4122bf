// The class of the band surface in Kh^{0,chi}(K; F2) as the Readout shows it (typeset as its
// other values are): its bidegree, zero or not, and its coordinates in the basis of
// shared/knot/bands/class.ts (enhanced states of the band drawing's PD code: a 0/1 resolution per
// crossing, the x-labelled circles named by their smallest edge label) or, past the cube's limit,
// of class-local.ts (numbered generators of the simplified complex), or why it was not computed
// (the crossing limits).
import { Fragment } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { SurfaceClass } from '@/shared/knot/bands';
import { CLASS_CROSSINGS, LOCAL_CLASS_CROSSINGS, LOCAL_CLASS_EDGES } from '@/shared/knot/bands';
import { minus, subscript } from '@/shared/text/integers';
import { TeX } from '@/components/ui/Math';
import { colors, fonts, type } from '@/constants/theme';
import type { ClassAnswer } from './local-bands';

/** Basis states listed before "… and n more". */
const shown = 6;

export const bidegree = (c: SurfaceClass) => `(h, q) = (0, ${minus(c.q)})`;

type Piece = { tex: string; text: string };

/** One basis element as TeX and as plain text (screen readers, native): g_12, or a resolution and its x-labelled circles. */
export function element(s: SurfaceClass['support'][number]): Piece {
  if ('generator' in s) return { tex: `g_{${s.generator}}`, text: `g${subscript(String(s.generator))}` };
  const parts: Piece[] = [];
  if (s.smoothing) parts.push({ tex: `\\mathtt{${s.smoothing}}`, text: s.smoothing });
  if (s.x.length) parts.push({ tex: `x_{${s.x.join(',')}}`, text: `x${subscript(s.x.join(','))}` });
  if (!parts.length) return { tex: '\\varnothing', text: '∅' };
  return { tex: parts.map((p) => p.tex).join('\\cdot '), text: parts.map((p) => p.text).join('·') };
}

/** Each but the last element carries its comma, so a line never starts with one (and none breaks inside an element). */
const listed = (pieces: Piece[]): Piece[] => pieces.map((p, i) => (i < pieces.length - 1 ? { tex: `${p.tex},`, text: `${p.text},` } : p));

const F2: Piece = { tex: '\\mathbb{F}_2', text: '𝔽₂' };

export function SurfaceClassText({ surface }: { surface: ClassAnswer }) {
  if (surface === null) return null;
  if ('reason' in surface) return <Text style={styles.note} testID="readout-bands-class">Class in Khovanov homology not computed: {surface.reason}.</Text>;
  const c = surface.value;
  return (
    <View testID="readout-bands-class">
      <Text style={styles.num}>Class over <TeX {...F2} />: {c.zero ? 'zero' : 'nonzero'} at {bidegree(c)}</Text>
      <Text style={styles.coords} selectable>
        Coordinates:{' '}
        {c.zero
          ? `all 0 (a basis of ${c.basisSize})`
          : <>1 at {listed(c.support.slice(0, shown).map(element)).map((e, i) => <Fragment key={i}>{i ? ' ' : ''}<TeX {...e} nowrap /></Fragment>)}
            {c.support.length > shown ? ` … and ${c.support.length - shown} more` : ''} (of a basis of {c.basisSize})</>}
      </Text>
      <Text style={styles.note}>
        {c.basis === 'cube'
          ? "Basis: enhanced states of the band drawing's code (resolution per crossing; x-circles by smallest edge label)."
          : <>Basis: generators <TeX tex="g_0, g_1, \ldots" text="g₀, g₁, …" /> of the code's complex simplified by the local algorithm (numbered in its order, for this drawing's bands only).</>}{' '}
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
