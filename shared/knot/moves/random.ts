// Seeded random Reidemeister moves, for property tests and for shuffling a diagram's drawing.
// The generator is mulberry32 (Tommy Ettinger's public-domain 32-bit PRNG; common practice).

import { Diagram } from '../diagram';
import { addKink, kinks, removeKink } from './r1';
import { faces } from './faces';
import { bigons, pushAcross, removeBigon } from './r2';
import { applyR3, triangles } from './r3';

export type Rng = () => number;

/** Uniform numbers in [0, 1) from a 32-bit seed. */
export function seededRng(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const pick = <T>(rng: Rng, list: readonly T[]): T => list[Math.floor(rng() * list.length)];

export type MoveKind = 'R1+' | 'R1-' | 'R2+' | 'R2-' | 'R3';

/**
 * One random move among those that apply. A diagram with no crossings gets none (there is no
 * edge to put a kink on); it is returned unchanged with kind undefined.
 */
export function randomMove(d: Diagram, rng: Rng): { diagram: Diagram; kind?: MoveKind } {
  if (d.pd.length === 0) return { diagram: d };
  const options: MoveKind[] = ['R1+', 'R2+'];
  const ks = kinks(d);
  const bs = bigons(d);
  const ts = triangles(d);
  if (ks.length) options.push('R1-');
  if (bs.length) options.push('R2-');
  if (ts.length) options.push('R3', 'R3');
  const kind = pick(rng, options);
  switch (kind) {
    case 'R1+':
      return { kind, diagram: addKink(d, pick(rng, d.pd.flat()), { sign: rng() < 0.5 ? 1 : -1, overFirst: rng() < 0.5 }) };
    case 'R1-':
      return { kind, diagram: removeKink(d, pick(rng, ks)) };
    case 'R2+': {
      // Two different edges of one face; every diagram with a crossing has such a face.
      const pairs = faces(d.pd).flatMap((face) =>
        face.flatMap((c, i) => face.map((e, j) => [face, i, j] as const).filter(([, , j]) => d.pd[face[j].crossing][face[j].arrive] !== d.pd[c.crossing][c.arrive])),
      );
      const [face, i, j] = pick(rng, pairs);
      return { kind, diagram: pushAcross(d, face, i, j, rng() < 0.5) };
    }
    case 'R2-':
      return { kind, diagram: removeBigon(d, pick(rng, bs)) };
    case 'R3':
      return { kind, diagram: applyR3(d, pick(rng, ts)) };
  }
}

/** `count` random moves from `seed`. */
export function randomMoves(d: Diagram, count: number, seed: number): Diagram {
  const rng = seededRng(seed);
  let current = d;
  for (let i = 0; i < count; i++) current = randomMove(current, rng).diagram;
  return current;
}
