// The standard modules of the Temperley-Lieb algebra TL_n, the bracket's braid representation
// (Kauffman, "State models and the Jones polynomial", Topology 26, 1987) split into its cells
// (F. M. Goodman, P. de la Harpe and V. F. R. Jones, "Coxeter graphs and towers of algebras",
// 1989, ch. 2): for p through-strands, a basis of link states (n points, p of them on
// through-strands, the others joined in pairs by arcs that pass over none of them), and for
// every generator e_k the table "e_k on top of state u is state t, or u itself with a loop, or
// zero when it joins two through-strands". Built once per (n, p) from one state by e_k alone,
// which reaches the whole basis.

export interface StandardModule {
  strands: number;
  /** Through-strands p, of the parity of strands. */
  through: number;
  /** Number of link states, C(n, (n - p) / 2) - C(n, (n - p) / 2 - 1). */
  size: number;
  /** target[k * size + u]: e_k on top of u; u itself when that closes a loop, -1 when it is zero. */
  target: Int32Array;
  /**
   * 0 or 2: a planar braid's coefficient of state u in the image of state v has its exponents
   * in one class mod 4, cls[u] - cls[v] relative to v's own (Kauffman 1987). A step that
   * closes no loop changes it by 2.
   */
  cls: Uint8Array;
  /** image[k]: the states e_k fixes (closing a loop), in increasing order. */
  image: Int32Array[];
  /** The other states e_k sends to image[k][j]: sources[k][from[k][j] .. from[k][j + 1]). */
  from: Int32Array[];
  sources: Int32Array[];
}

const cache = new Map<number, StandardModule[]>();

/** Link states are coded in base 3 in 31-bit integers. */
const MAX_STRANDS = 15;

/** The standard modules of TL_n, most through-strands first, computed once per n. */
export function standardModules(n: number): StandardModule[] {
  const known = cache.get(n);
  if (known) return known;
  if (n > MAX_STRANDS) throw new RangeError(`Temperley-Lieb tables stop at ${MAX_STRANDS} strands`);
  const modules: StandardModule[] = [];
  for (let p = n; p >= 0; p -= 2) modules.push(standardModule(n, p));
  cache.set(n, modules);
  return modules;
}

/** Catalan(n), the dimension of TL_n: the squares of the modules' sizes add up to it. */
export function catalan(n: number): number {
  let c = 1;
  for (let i = 0; i < n; i++) c = (c * 2 * (2 * i + 1)) / (i + 2);
  return c;
}

/** The module of p through-strands, breadth first from arcs (0 1), (2 3), ... and p through-strands after them. */
function standardModule(n: number, p: number): StandardModule {
  // A state lists each point's partner, -1 on a through-strand.
  const first = Int8Array.from({ length: n }, (_, i) => (i < n - p ? i ^ 1 : -1));
  const states: Int8Array[] = [first];
  const index = new Map([[code(first), 0]]);
  const cls = [0];
  const targets: number[] = []; // targets[(n - 1) u + k]
  for (let u = 0; u < states.length; u++) {
    for (let k = 0; k + 1 < n; k++) {
      const next = onTop(states[u], k);
      let t = next === undefined ? -1 : next === states[u] ? u : index.get(code(next));
      if (t === undefined) {
        t = states.length;
        index.set(code(next!), t);
        states.push(next!);
        cls.push(cls[u] ^ 2);
      } else if (t >= 0 && t !== u && cls[t] !== (cls[u] ^ 2)) throw new Error('Temperley-Lieb classes disagree mod 4');
      targets.push(t);
    }
  }
  const size = states.length;
  const target = new Int32Array(Math.max(n - 1, 0) * size);
  for (let u = 0; u < size; u++) for (let k = 0; k + 1 < n; k++) target[k * size + u] = targets[(n - 1) * u + k];
  const m: StandardModule = { strands: n, through: p, size, target, cls: Uint8Array.from(cls), image: [], from: [], sources: [] };
  for (let k = 0; k + 1 < n; k++) group(m, k);
  return m;
}

/** e_k on top of the state: the same array when it closes a loop, undefined when it joins two through-strands. */
function onTop(state: Int8Array, k: number): Int8Array | undefined {
  const [a, b] = [state[k], state[k + 1]];
  if (a === k + 1) return state;
  if (a < 0 && b < 0) return undefined;
  const next = state.slice();
  next[k] = k + 1;
  next[k + 1] = k;
  // The two ends met by the cap are joined, or the one of them on an arc takes the through-strand.
  if (a >= 0) next[a] = b;
  if (b >= 0) next[b] = a;
  return next;
}

/** A state in base 3: 0 on a through-strand, 1 where an arc opens, 2 where it closes. */
function code(state: Int8Array): number {
  return state.reduce((c, partner, i) => 3 * c + (partner < 0 ? 0 : partner > i ? 1 : 2), 0);
}

/** Appends e_k's image to m, with each image state's sources grouped (a counting sort by target). */
function group(m: StandardModule, k: number): void {
  const { size, target } = m;
  const row = target.subarray(k * size, (k + 1) * size);
  const moves = (s: number) => row[s] >= 0 && row[s] !== s;
  const count = new Int32Array(size + 1);
  let fixed = 0;
  let moving = 0;
  for (let s = 0; s < size; s++) {
    if (row[s] === s) fixed++;
    else if (moves(s)) {
      count[row[s] + 1]++;
      moving++;
    }
  }
  for (let t = 0; t < size; t++) count[t + 1] += count[t];
  const image = new Int32Array(fixed);
  const from = new Int32Array(fixed + 1);
  const sources = new Int32Array(moving);
  const next = count.slice();
  for (let s = 0; s < size; s++) if (moves(s)) sources[next[row[s]]++] = s;
  for (let t = 0, j = 0; t < size; t++) {
    if (row[t] !== t) continue;
    image[j++] = t;
    from[j] = count[t + 1];
  }
  m.image.push(image);
  m.from.push(from);
  m.sources.push(sources);
}
