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
  /** image[k]: the matchings e_k fixes (closing a loop), in increasing order. */
  image: Int32Array[];
  /** The other matchings e_k sends to image[k][j]: sources[k][from[k][j] .. from[k][j + 1]). */
  from: Int32Array[];
  sources: Int32Array[];
}

const cache = new Map<number, TemperleyLieb>();

/** Matchings are coded in 31-bit integers, two bits a strand. */
const MAX_STRANDS = 15;

/** The tables of TL_n, computed once per n (Catalan(n) * (n - 1) entries). */
export function temperleyLieb(n: number): TemperleyLieb {
  const known = cache.get(n);
  if (known) return known;
  if (n > MAX_STRANDS) throw new RangeError(`Temperley-Lieb tables stop at ${MAX_STRANDS} strands`);
  const total = catalan(n);
  // Matching j lists each point's partner at points[2n j ..]: bottom i is point i, top i point
  // n + i. The slot after the last known matching takes each new candidate.
  const points = new Int8Array(2 * n * (total + 1));
  for (let p = 0; p < 2 * n; p++) points[p] = (p + n) % (2 * n);
  const index = new Map([[dyckWord(points, 0, n), 0]]);
  let size = 1;
  const target = new Int32Array(Math.max(n - 1, 0) * total);
  const cls = new Uint8Array(total);
  // Breadth first: each new matching is met first from a known one, which gives its class.
  for (let s = 0; s < size; s++) {
    for (let k = 0; k + 1 < n; k++) {
      stack(points, s * 2 * n, size * 2 * n, n, k);
      const word = dyckWord(points, size * 2 * n, n);
      let t = index.get(word);
      if (t === undefined) {
        t = size++;
        index.set(word, t);
        cls[t] = cls[s] ^ 2;
      } else if (t !== s && cls[t] !== (cls[s] ^ 2)) throw new Error('Temperley-Lieb classes disagree mod 4');
      target[k * total + s] = t;
    }
  }
  const tl = renumbered(points, n, target, cls);
  for (let k = 0; k + 1 < n; k++) group(tl, k);
  cache.set(n, tl);
  return tl;
}

/**
 * The tables with the matchings renumbered by their bottom halves (fewest arcs first, so the
 * identity stays 0), then their top halves. e_k on top changes the bottom half only when it
 * joins two through-strands, so most of a letter's sums stay within a block of rows that share
 * the bottom half, and the sweep's reads and writes stay near each other in memory.
 */
function renumbered(points: Int8Array, n: number, target: Int32Array, cls: Uint8Array): TemperleyLieb {
  const size = cls.length;
  const key = (s: number, side: number) => {
    let arcs = 0;
    let code = 0;
    for (let i = 0; i < n; i++) {
      const p = points[2 * n * s + side + i] - side;
      arcs += p >= 0 && p < n && p > i ? 1 : 0;
      code = 3 * code + (p < 0 || p >= n ? 0 : p > i ? 1 : 2);
    }
    return arcs * 3 ** n + code;
  };
  const bottom = Float64Array.from({ length: size }, (_, s) => key(s, 0));
  const top = Float64Array.from({ length: size }, (_, s) => key(s, n));
  const order = Array.from({ length: size }, (_, s) => s).sort((a, b) => bottom[a] - bottom[b] || top[a] - top[b]);
  const rank = new Int32Array(size);
  order.forEach((s, i) => (rank[s] = i));
  const moved = new Int32Array(target.length);
  for (let k = 0; k + 1 < n; k++) for (let s = 0; s < size; s++) moved[k * size + rank[s]] = rank[target[k * size + s]];
  return {
    strands: n,
    size,
    target: moved,
    cls: Uint8Array.from(order, (s) => cls[s]),
    closureLoops: Uint8Array.from(order, (s) => closureLoops(points, s * 2 * n, n)),
    image: [],
    from: [],
    sources: [],
  };
}

/** Catalan(n), the number of basis matchings of TL_n. */
export function catalan(n: number): number {
  let c = 1;
  for (let i = 0; i < n; i++) c = (c * 2 * (2 * i + 1)) / (i + 2);
  return c;
}

/** Appends e_k's image to tl, with each image matching's sources grouped (a counting sort by target). */
function group(tl: TemperleyLieb, k: number): void {
  const { size, target } = tl;
  const row = target.subarray(k * size, (k + 1) * size);
  const count = new Int32Array(size + 1);
  let fixed = 0;
  for (let s = 0; s < size; s++) {
    if (row[s] === s) fixed++;
    else count[row[s] + 1]++;
  }
  for (let t = 0; t < size; t++) count[t + 1] += count[t];
  const image = new Int32Array(fixed);
  const from = new Int32Array(fixed + 1);
  const sources = new Int32Array(size - fixed);
  const next = count.slice();
  for (let s = 0; s < size; s++) if (row[s] !== s) sources[next[row[s]]++] = s;
  for (let t = 0, j = 0; t < size; t++) {
    if (row[t] !== t) continue;
    image[j++] = t;
    from[j] = count[t + 1];
  }
  tl.image.push(image);
  tl.from.push(from);
  tl.sources.push(sources);
}

/**
 * A crossingless matching as a number: going round the disk (bottom 0..n-1, then top n-1..0),
 * bit j is set when the j-th point opens an arc, the standard Dyck-word code of the matching.
 */
function dyckWord(points: Int8Array, at: number, n: number): number {
  const place = (p: number) => (p < n ? p : 3 * n - 1 - p);
  let word = 0;
  for (let p = 0; p < 2 * n; p++) if (place(points[at + p]) > place(p)) word |= 1 << place(p);
  return word;
}

/** Matching m (at from) with e_k on top, written at to: top points k and k+1 capped together, and new ones cupped. */
function stack(points: Int8Array, from: number, to: number, n: number, k: number): void {
  points.copyWithin(to, from, from + 2 * n);
  const [a, b] = [n + k, n + k + 1];
  const [ma, mb] = [points[from + a], points[from + b]];
  if (ma === b) return; // the cap closes the cup already there: a loop
  points[to + ma] = mb;
  points[to + mb] = ma;
  points[to + a] = b;
  points[to + b] = a;
}

/** Loops when top point i is joined round the outside to bottom point i. */
function closureLoops(points: Int8Array, at: number, n: number): number {
  const done = new Uint8Array(2 * n);
  let loops = 0;
  for (let p = 0; p < 2 * n; p++) {
    if (done[p]) continue;
    loops++;
    let q = p;
    do {
      done[q] = 1;
      const r = points[at + q];
      done[r] = 1;
      q = (r + n) % (2 * n);
    } while (q !== p);
  }
  return loops;
}
