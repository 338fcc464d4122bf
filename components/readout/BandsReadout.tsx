// The Readout's band certificates: b bands from the drawn link to the c-component unlink
// (certified when simplification removes every crossing, or by Khovanov homology), the
// surface's Euler characteristic chi = c - b, the genus bound it gives, "ribbon" when every
// component of the surface is a disk, and beside it the lower bounds |s|/2 and |sigma|/2 with
// "g4 = n" when they meet (shared/knot/bands/certificate.ts says why each holds); then the
// surface's class over F2 and the comparison with another sketch's surface.
import { StyleSheet, Text, View } from 'react-native';
import type { BandPresentation } from '@/shared/knot/bands';
import type { BandsState } from '@/hooks/useBandCertificate';
import type { SState } from '@/hooks/useSInvariant';
import { BANDS_KH_CROSSINGS, BANDS_MAX_CROSSINGS, type BandsAnswer } from './local-bands';
import { minus } from '@/shared/text/integers';
import { colors, fonts, space, type } from '@/constants/theme';
import { BandsCompare } from './BandsCompare';
import { BandsServerCheck } from './BandsServerCheck';
import { SurfaceClassText } from './SurfaceClassText';
const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

function unlinkText(c: BandsAnswer): string {
  const target = `${c.components}-component unlink`;
  const b = plural(c.bands, 'band');
  if (c.unlink === 'crossingless') return `${b} → ${target} (certified: crossingless)`;
  if (c.unlink === 'khovanov') return `${b} → ${target} (certified by Khovanov homology)`;
  if (c.unlink === 'too-large') return `${b} → ${plural(c.components, 'component')}; not certified: ${c.afterCrossings} crossings after simplification, the device checks up to ${BANDS_KH_CROSSINGS}`;
  return `${b} → ${plural(c.components, 'component')}, not an unlink (its Khovanov homology is not the unlink's)`;
}

function lowerBound(s: SState, signature: number | undefined): number | null {
  if (s.kind !== 'knot' || s.s === undefined || signature === undefined) return null;
  return Math.max(Math.abs(s.s) / 2, Math.abs(signature) / 2);
}

type Props = { state: BandsState; presentation: BandPresentation | null; refused: string | null; s: SState; signature?: number };

export function BandsReadout({ state, presentation, refused, s, signature }: Props) {
  if (refused) {
    return (
      <View style={styles.box} testID="readout-bands">
        <Text style={styles.label}>Bands</Text>
        <Text style={styles.error} role="alert">{refused}</Text>
      </View>
    );
  }
  if (state.kind === 'none') return null;
  if (state.kind === 'large') {
    return (
      <View style={styles.box} testID="readout-bands">
        <Text style={styles.label}>Bands</Text>
        <Text style={styles.note}>Certified on the device up to {BANDS_MAX_CROSSINGS} crossings of the band drawing (this has {state.crossings}).</Text>
        {presentation ? <BandsServerCheck presentation={presentation} /> : null}
      </View>
    );
  }
  const c = state.value;
  const knot = c?.knotComponents === 1;
  const lower = knot ? lowerBound(s, signature) : null;
  return (
    <View style={[styles.box, state.stale && styles.stale]} aria-busy={state.stale} testID="readout-bands">
      <View style={styles.labelRow}>
        <Text style={styles.label}>Bands</Text>
        {state.stale ? <Text style={styles.updating}>updating…</Text> : null}
      </View>
      {state.error ? <Text style={styles.error}>Could not certify: {state.error}</Text> : null}
      {state.error && presentation && !state.stale ? <BandsServerCheck presentation={presentation} /> : null}
      {c ? (
        <>
          <Text style={styles.line} testID="readout-bands-unlink">{unlinkText(c)}</Text>
          <Text style={styles.num}>χ = c − b = {minus(c.chi)}</Text>
          {c.genusBound !== null ? (
            <Text style={styles.num} testID="readout-bands-genus">{knot ? `g4 ≤ ${c.genusBound}` : `a surface of genus ${c.genusBound} bounds the link`}</Text>
          ) : null}
          {c.ribbon ? (
            <Text style={styles.ribbon} testID="readout-bands-ribbon">
              {knot ? 'Ribbon disk: the knot is ribbon, hence slice' : 'Ribbon disks: every component bounds a disk of the surface'}
            </Text>
          ) : null}
          {knot && lower !== null ? <Text style={styles.note}>Lower bounds: |s|/2 and |σ|/2 give g4 ≥ {lower}</Text> : null}
          {knot && lower !== null && c.genusBound === lower ? <Text style={styles.num} testID="readout-bands-g4">g4 = {lower}</Text> : null}
          {c.unlink === 'too-large' && presentation && !state.stale ? <BandsServerCheck presentation={presentation} /> : null}
          <SurfaceClassText surface={c.surface} />
          <BandsCompare />
        </>
      ) : null}
      <Text style={styles.note}>On the device up to {BANDS_MAX_CROSSINGS} crossings of the band drawing; the Khovanov check up to {BANDS_KH_CROSSINGS} after simplification.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: 2 },
  stale: { opacity: 0.5 },
  labelRow: { flexDirection: 'row', alignItems: 'baseline', justifyContent: 'space-between' },
  label: { ...type.label, color: colors.inkMuted },
  updating: { ...type.label, fontSize: 12, color: colors.accent },
  line: { ...type.small, color: colors.ink },
  num: { fontFamily: fonts.mono, fontSize: 15, lineHeight: 22, color: colors.ink },
  ribbon: { ...type.heading, color: colors.success, marginTop: space.xs },
  note: { ...type.small, fontSize: 12, color: colors.inkFaint },
  error: { ...type.small, color: colors.danger },
});
