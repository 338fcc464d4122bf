// What the Readout's comparison worker (compare.worker.ts) computes: the classes over F2 of two
// sketches' band surfaces, read on one drawing with both sets of bands (shared/drawing/band-union.ts),
// and whether they differ (shared/knot/bands compareSurfaces). Different classes in Kh(K; F2)
// mean the surfaces are not isotopic rel boundary; equal classes prove nothing.
import { bandsOf } from '@/shared/drawing/bands';
import { readBands } from '@/shared/drawing/band-read';
import { bandUnion } from '@/shared/drawing/band-union';
import type { Sketch } from '@/shared/drawing/sketch';
import { compareSurfaces, type SurfaceComparison } from '@/shared/knot/bands';
import { BANDS_KH_CROSSINGS, orRefusal } from './local-bands';

export interface CompareRequest {
  a: Sketch;
  b: Sketch;
}

export type CompareAnswer = { kind: 'not-same' } | { kind: 'refused'; reason: string } | ({ kind: 'compared' } & SurfaceComparison);

export function compareSketches({ a, b }: CompareRequest): CompareAnswer {
  const union = bandUnion(a, b);
  if (!union) return { kind: 'not-same' };
  const read = readBands(union);
  if (!read || 'reason' in read) return { kind: 'refused', reason: read ? read.reason : 'Neither sketch has bands.' };
  const { pd, unknots, saddles } = read.presentation;
  const n = bandsOf(a).length;
  const r = orRefusal(() => compareSurfaces(pd, unknots, saddles.slice(0, n), saddles.slice(n), { unlinkCrossings: BANDS_KH_CROSSINGS }));
  return 'reason' in r ? { kind: 'refused', reason: r.reason } : { kind: 'compared', ...r.value };
}
