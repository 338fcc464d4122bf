// The whole cube complex of a small PD code over Z (Khovanov 2000, arXiv math/9908171, gradings
// of Bar-Natan 2002, arXiv math/0201043; docs/conventions.md), maps on it given generator by
// generator, and the checks the Reidemeister-map tests make: commuting with d, and inducing
// +-1 on homology over Z or 1 over F2.
import { popcount } from '@/shared/khovanov/cobordism';
import { edgeMap, resolve } from '@/shared/khovanov/cube';
import { cubeLabels, CubeGenerator, Term } from '@/shared/knot/bands/reidemeister-maps';
import { F2Echelon, kernel as f2Kernel, parity } from '@/shared/linalg/f2';
import { kernel, ZEchelon } from '@/shared/linalg/lattice';
import { orient, PDCode } from '@/shared/knot/pd';

export type Vector = Map<number, number>;
export type GeneratorMap = (g: CubeGenerator) => Term[];

export interface Complex {
  gens: CubeGenerator[];
  h: number[];
  q: number[];
  index: Map<string, number>;
  d: (i: number) => Vector;
}

const key = (g: CubeGenerator): string => `${g.state}:${g.mask}`;

export function cubeComplex(pd: PDCode): Complex {
  const n = pd.length;
  const nMinus = orient(pd).signs.filter((s) => s < 0).length;
  const labels = cubeLabels(pd);
  const at = (l: number): number => labels.get(l)!;
  const states = Array.from({ length: 1 << n }, (_, s) => resolve(pd, s, labels));
  const gens: CubeGenerator[] = [];
  const [h, q] = [[] as number[], [] as number[]];
  states.forEach((st, s) => {
    // Crossingless circles are left out (resolve counts one for the empty code).
    const count = n === 0 ? 0 : st.count;
    for (let mask = 0; mask < 1 << count; mask++) {
      gens.push({ state: s, mask });
      h.push(popcount(s) - nMinus);
      q.push(count - 2 * popcount(mask) + popcount(s) + n - 3 * nMinus);
    }
  });
  const index = new Map(gens.map((g, i) => [key(g), i]));
  const d = (i: number): Vector => {
    const { state, mask } = gens[i];
    const out: Vector = new Map();
    pd.forEach((x, k) => {
      if ((state >> k) & 1) return;
      const t = state | (1 << k);
      const sign = popcount(state & ((1 << k) - 1)) % 2 ? -1 : 1;
      for (const m of edgeMap(states[state], states[t], x, mask, at)) add(out, index.get(key({ state: t, mask: m }))!, sign);
    });
    return out;
  };
  return { gens, h, q, index, d };
}

function add(v: Vector, i: number, c: number): void {
  const s = (v.get(i) ?? 0) + c;
  if (s === 0) v.delete(i);
  else v.set(i, s);
}

/** f applied to a chain of `from`, as a chain of `to`. */
export function apply(f: GeneratorMap, from: Complex, to: Complex, v: Vector): Vector {
  const out: Vector = new Map();
  for (const [i, c] of v) for (const [g, x] of f(from.gens[i])) add(out, to.index.get(key(g))!, c * x);
  return out;
}

/** The maps in turn through the complexes (complexes[k] to complexes[k + 1]). */
export function compose(maps: readonly GeneratorMap[], complexes: readonly Complex[]): (v: Vector) => Vector {
  return (v) => maps.reduce((w, f, k) => apply(f, complexes[k], complexes[k + 1], w), v);
}

const unit = (i: number): Vector => new Map([[i, 1]]);
const same = (u: Vector, v: Vector): boolean => u.size === v.size && [...u].every(([i, c]) => v.get(i) === c);

/** Generators where f fails d f = f d or moves the bidegree by other than (0, qShift). */
export function chainMapFailures(f: GeneratorMap, from: Complex, to: Complex, qShift = 0): number[] {
  return from.gens.flatMap((_, i) => {
    const image = apply(f, from, to, unit(i));
    const graded = [...image.keys()].every((j) => to.h[j] === from.h[i] && to.q[j] === from.q[i] + qShift);
    const dImage: Vector = new Map();
    for (const [j, c] of image) for (const [k, x] of to.d(j)) add(dImage, k, c * x);
    return graded && same(dImage, apply(f, from, to, from.d(i))) ? [] : [i];
  });
}

/** Generators where g - 1 = d h + h d fails on C. */
export function homotopyFailures(g: (v: Vector) => Vector, h: GeneratorMap, c: Complex): number[] {
  const d = (v: Vector): Vector => {
    const out: Vector = new Map();
    for (const [j, x] of v) for (const [k, y] of c.d(j)) add(out, k, x * y);
    return out;
  };
  return c.gens.flatMap((_, i) => {
    const left = g(unit(i));
    add(left, i, -1);
    const right = d(apply(h, c, c, unit(i)));
    for (const [k, y] of apply(h, c, c, c.d(i))) add(right, k, y);
    return same(left, right) ? [] : [i];
  });
}

const bidegrees = (c: Complex): [number, number][] => [...new Set(c.gens.map((_, i) => `${c.h[i]},${c.q[i]}`))].map((s) => s.split(',').map(Number) as [number, number]);
const at = (c: Complex, h: number, q: number): number[] => c.gens.map((_, i) => i).filter((i) => c.h[i] === h && c.q[i] === q);

/**
 * The signs sigma (+1, -1) with g - sigma = 0 on Kh(C; Z): every integer cycle k has g(k) - sigma k
 * in the boundaries. Also the rank of the free part met (how many levels have a cycle not a boundary).
 */
export function identityOnZ(c: Complex, g: (v: Vector) => Vector): { signs: number[]; nontrivial: number } {
  let nontrivial = 0;
  const fails = new Set<number>();
  for (const [h, q] of bidegrees(c)) {
    const here = at(c, h, q);
    const boundaries = new ZEchelon();
    for (const j of at(c, h - 1, q)) boundaries.add(c.d(j));
    const cycles = [...kernel(here.length, (i) => c.d(here[i]))].map((k) => new Map([...k].map(([i, x]) => [here[i], Number(x)])));
    if (cycles.some((k) => boundaries.reduce(k).size > 0)) nontrivial++;
    for (const k of cycles) {
      const gk = g(k);
      for (const sigma of [1, -1]) {
        const diff = new Map(gk);
        for (const [i, x] of k) add(diff, i, -sigma * x);
        if (boundaries.reduce(diff).size > 0) fails.add(sigma);
      }
    }
  }
  return { signs: [1, -1].filter((s) => !fails.has(s)), nontrivial };
}

const odd = (v: Vector): number[] => parity([...v].flatMap(([i, x]) => (x % 2 ? [i] : [])));

/** Over F2: whether g = 1 on Kh(C; F2), and the total rank of Kh(C; F2). */
export function identityOnF2(c: Complex, g: (v: Vector) => Vector): { identity: boolean; rank: number } {
  let rank = 0;
  let identity = true;
  const dOdd = (i: number): number[] => odd(c.d(i));
  for (const [h, q] of bidegrees(c)) {
    const here = at(c, h, q);
    const boundaries = new F2Echelon();
    for (const j of at(c, h - 1, q)) boundaries.add(dOdd(j));
    const cycles = [...f2Kernel(here.length, (i) => dOdd(here[i]))].map((k) => k.map((i) => here[i]));
    rank += cycles.length - boundaries.rank;
    for (const k of cycles) {
      const image = odd(g(new Map(k.map((i) => [i, 1]))));
      if (boundaries.reduce(parity([...image, ...k])).length > 0) identity = false;
    }
  }
  return { identity, rank };
}
