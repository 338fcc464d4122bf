// The Temperley-Lieb algebra TL_n on its basis of crossingless matchings of 2n points (the
// bracket's braid representation: Kauffman, "State models and the Jones polynomial",
// Topology 26, 1987; V. F. R. Jones, Bull. AMS 12, 1985): for every generator e_k, the table
// "basis matching s with e_k stacked on top is matching t, closing a loop or not", and for
// every matching the loops of its braid-like closure (the Markov trace). Built once per n
// from the identity by e_k alone, which reaches the whole basis.

export interface TemperleyLieb {
  strands: number;
  /** Number of basis matchings (the Catalan number C(n)); matching 0 is the identity. */
  size: number;
  /** target[k * size + s]: s with e_k on top; equal to s exactly when that closes a loop. */
  target: Int32Array;
  /**
   * 0 or 2: the exponent class mod 4, relative to the identity's, that a planar braid gives
   * this matching's coefficient (Kauffman 1987: exponents of one state class agree mod 4).
   * A step that closes no loop changes it by 2.
   */
  cls: Uint8Array;
  /** Loops of the closure that joins top point i to bottom point i. */
  closureLoops: Uint8Array;
}

const cache = new Map<number, TemperleyLieb>();

/** The tables of TL_n, computed once per n (Catalan(n) * (n - 1) entries). */
export function temperleyLieb(n: number): TemperleyLieb {
  const known = cache.get(n);
  if (known) return known;
  // A matching of 2n points lists each point's partner: bottom i is point i, top i point n + i.
  const identity = Array.from({ length: 2 * n }, (_, p) => (p + n) % (2 * n));
  const key = (m: readonly number[]) => dyckWord(m, n);
  const index = new Map([[key(identity), 0]]);
  const matchings = [identity];
  const edges: [number, number, number][] = []; // [k, s, t]
  for (let s = 0; s < matchings.length; s++) {
    for (let k = 0; k + 1 < n; k++) {
      const t = stack(matchings[s], n, k);
      const id = index.get(key(t)) ?? matchings.push(t) - 1;
      index.set(key(t), id);
      edges.push([k, s, id]);
    }
  }
  const size = matchings.length;
  const target = new Int32Array(Math.max(n - 1, 0) * size);
  const cls = new Uint8Array(size);
  const seen = new Uint8Array(size);
  seen[0] = 1;
  // Breadth-first edges meet each new matching first from a known one, so one pass classes all.
  for (const [k, s, t] of edges) {
    target[k * size + s] = t;
    if (s === t) continue;
    if (!seen[t]) [cls[t], seen[t]] = [cls[s] ^ 2, 1];
    else if (cls[t] !== (cls[s] ^ 2)) throw new Error('Temperley-Lieb classes disagree mod 4');
  }
  const tl = { strands: n, size, target, cls, closureLoops: Uint8Array.from(matchings, (m) => closureLoops(m, n)) };
  cache.set(n, tl);
  return tl;
}

/**
 * A crossingless matching as a number: going round the disk (bottom 0..n-1, then top n-1..0),
 * bit j is set when the j-th point opens an arc, the standard Dyck-word code of the matching.
 */
function dyckWord(m: readonly number[], n: number): number {
  const place = (p: number) => (p < n ? p : 3 * n - 1 - p);
  let word = 0;
  for (let p = 0; p < 2 * n; p++) if (place(m[p]) > place(p)) word += 2 ** place(p);
  return word;
}

/** Matching m with e_k on top: top points k and k+1 are capped together, and new ones cupped. */
function stack(m: readonly number[], n: number, k: number): number[] {
  const [a, b] = [n + k, n + k + 1];
  if (m[a] === b) return [...m]; // the cap closes the cup already there: a loop
  const t = [...m];
  [t[m[a]], t[m[b]]] = [m[b], m[a]];
  [t[a], t[b]] = [b, a];
  return t;
}

/** Loops when top point i is joined round the outside to bottom point i. */
function closureLoops(m: readonly number[], n: number): number {
  const done = new Uint8Array(2 * n);
  let loops = 0;
  for (let p = 0; p < 2 * n; p++) {
    if (done[p]) continue;
    loops++;
    let q = p;
    do {
      done[q] = 1;
      const r = m[q];
      done[r] = 1;
      q = (r + n) % (2 * n);
    } while (q !== p);
  }
  return loops;
}
