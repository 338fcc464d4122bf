// The Readout's band certificate (components/readout/local-bands), computed off the gesture
// path like s: in a web worker on the web, for finger drawings up to BANDS_MAX_CROSSINGS.
import type { BandPresentation } from '@/shared/knot/bands';
import { computeBands } from '@/components/readout/computeBands';
import { BANDS_MAX_CROSSINGS, type BandsAnswer } from '@/components/readout/local-bands';
import { useDeviceComputation, type Computed } from './useDeviceComputation';

export type BandsState = { kind: 'none' } | { kind: 'large'; crossings: number } | ({ kind: 'bands' } & Computed<BandsAnswer>);

export function useBandCertificate(p: BandPresentation | null, paused: boolean): BandsState {
  const small = p && p.pd.length <= BANDS_MAX_CROSSINGS ? p : null;
  const r = useDeviceComputation(small, paused, computeBands);
  if (!p) return { kind: 'none' };
  if (!small) return { kind: 'large', crossings: p.pd.length };
  return { kind: 'bands', ...r, stale: r.stale || (r.value === undefined && r.error === undefined) };
}
