// Homology of a finite bigraded cochain complex of free modules: H^{i,j} = ker d / im d with
// d: C^{i,j} -> C^{i+1,j}. Over Z the torsion of H^{i,j} is the Smith form of d^{i-1,j}; over
// a field only ranks matter.

import { rank } from '../linalg/eliminate';
import { Int } from '../linalg/int';
import { Ring } from '../linalg/ring';
import { smith } from '../linalg/smith';
import { Sparse, sparse } from '../linalg/sparse';

/** One nonzero bigraded group: Z^free + Z/t1 + Z/t2 + ... (or a vector space of dimension free). */
export interface KhGroup {
  readonly i: number;
  readonly j: number;
  readonly free: number;
  /** Orders of the cyclic torsion summands as prime powers, ascending; [] over a field. */
  readonly torsion: number[];
}

export interface Generator {
  readonly i: number;
  readonly j: number;
}

const key = (i: number, j: number): string => `${i},${j}`;

/**
 * The groups of a complex with the given basis and differential entries [from, to, value]
 * (indices into `gens`; each entry must raise i by one and keep j). Zero groups are omitted;
 * the rest are sorted by i, then j.
 */
export function homology<T>(ring: Ring<T>, gens: readonly Generator[], entries: Iterable<readonly [number, number, T]>): KhGroup[] {
  const blocks = new Map<string, { i: number; j: number; size: number }>();
  const position = gens.map(({ i, j }) => {
    const b = blocks.get(key(i, j)) ?? { i, j, size: 0 };
    blocks.set(key(i, j), b);
    return b.size++;
  });
  const triples = new Map<string, [number, number, T][]>();
  for (const [from, to, v] of entries) {
    const s = gens[from];
    const t = gens[to];
    if (t.i !== s.i + 1 || t.j !== s.j) throw new RangeError(`differential entry from (${s.i},${s.j}) to (${t.i},${t.j}) is not of bidegree (1,0)`);
    const list = triples.get(key(s.i, s.j)) ?? [];
    list.push([position[to], position[from], v]);
    triples.set(key(s.i, s.j), list);
  }
  // For each source block: rank of its outgoing map and, over Z, that map's torsion.
  const outgoing = new Map<string, { rank: number; torsion: number[] }>();
  for (const [k, list] of triples) {
    const [i, j] = k.split(',').map(Number);
    const m = sparse(blocks.get(key(i + 1, j))!.size, blocks.get(k)!.size, list, ring.add, ring.isZero);
    if (ring.isField) outgoing.set(k, { rank: rank(ring, m), torsion: [] });
    else {
      const s = smith(m as Sparse<Int>); // the only ring that is not a field is Z
      outgoing.set(k, { rank: s.rank, torsion: s.primary.map(toSafe) });
    }
  }
  const groups: KhGroup[] = [];
  for (const { i, j, size } of blocks.values()) {
    const out = outgoing.get(key(i, j));
    const inc = outgoing.get(key(i - 1, j));
    const free = size - (out?.rank ?? 0) - (inc?.rank ?? 0);
    const torsion = inc?.torsion ?? [];
    if (free > 0 || torsion.length > 0) groups.push({ i, j, free, torsion });
  }
  return groups.sort((a, b) => a.i - b.i || a.j - b.j);
}

function toSafe(n: Int): number {
  if (typeof n === 'number') return n;
  throw new RangeError(`torsion order ${n} exceeds 2^53`);
}
