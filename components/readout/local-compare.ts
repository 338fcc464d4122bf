// What the Readout's comparison worker (compare.worker.ts) computes: the classes over F2 of two
// sketches' band surfaces and whether they differ. Different classes in Kh(K; F2) mean the
// surfaces are not isotopic rel boundary; equal classes prove nothing. The classes live in Kh of
// the diagram they are computed on, so both are carried there first:
// - on the knot drawing without bands: each sketch's fingers taken back (shared/drawing/
//   band-fingers.ts, shared/knot/bands compareOnDiagram). The two knot drawings must read as the
//   same PD code, crossing for crossing (a fork, or the strands moved without changing the
//   diagram); other drawings, even of the same knot, are another diagram: no comparison;
// - where that drawing has a strand crossing nothing (the cube leaves such circles out, so the
//   fingers cannot be taken back), or a finger drawing is past the cube (the local route's basis
//   belongs to one code), on one drawing carrying both sets of bands, which needs the same
//   strands (shared/drawing/band-union.ts).
import { fingersOf } from '@/shared/drawing/band-fingers';
import { readBands } from '@/shared/drawing/band-read';
import { bandsOf } from '@/shared/drawing/bands';
import { bandUnion } from '@/shared/drawing/band-union';
import { analyse, type Analysis } from '@/shared/drawing/analyse';
import type { Sketch } from '@/shared/drawing/sketch';
import { CLASS_CROSSINGS, compareOnDiagram, compareSurfaces, type Placed, type SurfaceComparison } from '@/shared/knot/bands';
import { BANDS_KH_CROSSINGS, orRefusal } from './local-bands';

export interface CompareRequest {
  a: Sketch;
  b: Sketch;
}

/** `on`: where the classes were compared, the knot drawing or one drawing with both sets of bands. */
export type CompareAnswer = { kind: 'not-same' } | { kind: 'refused'; reason: string } | ({ kind: 'compared'; on: 'knot' | 'union' } & SurfaceComparison);

const opts = { unlinkCrossings: BANDS_KH_CROSSINGS };

// The sketch's presentation and its fingers over its knot drawing `base`.
function placed(s: Sketch, base: Analysis): Placed | { reason: string; flat: boolean } {
  const read = readBands(s);
  if (!read || 'reason' in read) return { reason: read ? read.reason : 'A sketch has no bands.', flat: false };
  const fingers = fingersOf(base, read);
  return 'reason' in fingers ? fingers : { presentation: { ...read.presentation, saddles: [...read.presentation.saddles] }, fingers };
}

function onUnion(a: Sketch, b: Sketch): CompareAnswer {
  const union = bandUnion(a, b);
  if (!union) return { kind: 'not-same' };
  const read = readBands(union);
  if (!read || 'reason' in read) return { kind: 'refused', reason: read ? read.reason : 'Neither sketch has bands.' };
  const { pd, unknots, saddles } = read.presentation;
  const n = bandsOf(a).length;
  const r = orRefusal(() => compareSurfaces(pd, unknots, saddles.slice(0, n), saddles.slice(n), opts));
  return 'reason' in r ? { kind: 'refused', reason: r.reason } : { kind: 'compared', on: 'union', ...r.value };
}

export function compareSketches({ a, b }: CompareRequest): CompareAnswer {
  const [ba, bb] = [analyse(a), analyse(b)];
  const code = (x: Analysis) => JSON.stringify(x.diagram ? [x.diagram.diagram.pd, x.diagram.diagram.unknots] : null);
  if (code(ba) !== code(bb)) return { kind: 'not-same' };
  const [pa, pb] = [placed(a, ba), placed(b, bb)];
  if ('reason' in pa || 'reason' in pb) {
    const refusal = 'reason' in pa ? pa : (pb as { reason: string; flat: boolean });
    return refusal.flat ? onUnion(a, b) : { kind: 'refused', reason: refusal.reason };
  }
  // Past the cube the local route's basis belongs to one code: both classes on the union then.
  if ([pa, pb].some((p) => p.presentation.pd.length > CLASS_CROSSINGS)) return onUnion(a, b);
  const r = orRefusal(() => compareOnDiagram(pa, pb, opts));
  return 'reason' in r ? { kind: 'refused', reason: r.reason } : { kind: 'compared', on: 'knot', ...r.value };
}
