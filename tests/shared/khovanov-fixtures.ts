// Diagrams for the Khovanov tests: torus links and random braids as PD codes (through the knot
// core's braid closure), random braid words, and small helpers to compare tables.

import { fromBraid } from '@/shared/knot/braid';
import { PDCode } from '@/shared/knot/pd';
import { KhGroup } from '@/shared/khovanov/homology';
import type { KhRing } from '@/shared/khovanov';
import { integers, primeField, rationals, Ring } from '@/shared/linalg/ring';

/** (sigma_1 ... sigma_{p-1})^q closes to the positive torus link T(p, q). */
export function torusWord(p: number, q: number): number[] {
  return Array.from({ length: q }, () => Array.from({ length: p - 1 }, (_, k) => k + 1)).flat();
}

export function pdOf(word: readonly number[]): PDCode {
  const d = fromBraid(word);
  if (d.unknots !== 0) throw new Error(`braid ${word} leaves a strand untouched`);
  return d.pd;
}

/** A random braid word on `strands` strands using every generator (so no strand is left out). */
export function randomWord(rnd: () => number, strands: number, length: number, alternating = false): number[] {
  const word = Array.from({ length: strands - 1 }, (_, k) => k + 1);
  while (word.length < length) word.push(1 + Math.floor(rnd() * (strands - 1)));
  for (let k = word.length - 1; k > 0; k--) {
    const j = Math.floor(rnd() * (k + 1));
    [word[k], word[j]] = [word[j], word[k]];
  }
  // Alternating closure: sigma_i always with sign (-1)^(i+1).
  return word.map((g) => (alternating ? (g % 2 ? g : -g) : rnd() < 0.5 ? g : -g));
}

/** A table as text "i,j:free+torsion" for readable comparisons in failure messages. */
export function table(of: readonly KhGroup[] | { readonly groups: readonly KhGroup[] }): string[] {
  const groups = 'groups' in of ? of.groups : of;
  return groups.map((g) => `${g.i},${g.j}:${g.free}${g.torsion.map((t) => `+Z/${t}`).join('')}`);
}

/** The table of the mirror image: free (i,j) -> (-i,-j), torsion (i,j) -> (1-i,-j) (Khovanov 2000, arXiv math/9908171, Sect. 7, from memory). */
export function mirrorDual(groups: readonly KhGroup[]): KhGroup[] {
  const dual = new Map<string, { free: number; torsion: number[] }>();
  const cell = (i: number, j: number) => dual.get(`${i},${j}`) ?? dual.set(`${i},${j}`, { free: 0, torsion: [] }).get(`${i},${j}`)!;
  for (const g of groups) {
    cell(-g.i, -g.j).free += g.free;
    cell(1 - g.i, -g.j).torsion.push(...g.torsion);
  }
  return [...dual]
    .map(([k, v]) => ({ i: Number(k.split(',')[0]), j: Number(k.split(',')[1]), free: v.free, torsion: v.torsion.sort((a, b) => a - b) }))
    .filter((g) => g.free > 0 || g.torsion.length > 0)
    .sort((a, b) => a.i - b.i || a.j - b.j);
}

/** The rings the engine is checked over against the reference cube, by name and as rings. */
export const cubeRings: [KhRing, Ring<unknown>][] = [
  ['Z', integers as Ring<unknown>],
  ['Q', rationals as Ring<unknown>],
  ['F2', primeField(2) as Ring<unknown>],
  ['F3', primeField(3) as Ring<unknown>],
];
