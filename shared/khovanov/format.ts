// How a Khovanov table is written: one bigraded group as text ("Z^2 + (Z/2)^3") or TeX
// ("\mathbb{Z}^{2} \oplus (\mathbb{Z}/2)^{3}"), and the grid the groups sit in (i across,
// j down, top row the largest j as in Bar-Natan's 2002 tables, j in steps of 2).

export interface GroupLike {
  readonly i: number;
  readonly j: number;
  readonly free: number;
  readonly torsion: readonly number[];
}

export type Notation = 'text' | 'tex';

function ringSymbol(ring: string, n: Notation): string {
  if (n === 'text') return ring;
  if (ring === 'Z' || ring === 'Q') return `\\mathbb{${ring}}`;
  return `\\mathbb{F}_{${ring.slice(1)}}`;
}

const power = (base: string, k: number, n: Notation): string => (k === 1 ? base : n === 'tex' ? `${base}^{${k}}` : `${base}^${k}`);

/** "Z^2 + Z/2 + (Z/4)^2"; "0" for the zero group. Torsion orders are grouped and kept in order. */
export function groupText(g: GroupLike, ring: string, n: Notation = 'text'): string {
  const parts: string[] = [];
  if (g.free > 0) parts.push(power(ringSymbol(ring, n), g.free, n));
  const counts = new Map<number, number>();
  for (const t of g.torsion) counts.set(t, (counts.get(t) ?? 0) + 1);
  for (const [order, k] of counts) {
    const cyclic = `${ringSymbol('Z', n)}/${order}`;
    parts.push(k === 1 ? cyclic : power(`(${cyclic})`, k, n));
  }
  if (parts.length === 0) return '0';
  return parts.join(n === 'tex' ? ' \\oplus ' : ' + ');
}

export interface Grid {
  /** Column headings, ascending. */
  readonly is: number[];
  /** Row headings, descending (largest j on top). */
  readonly js: number[];
  /** The group at (i, j), or undefined where it is zero. */
  at(i: number, j: number): GroupLike | undefined;
}

/** Degenerate input: no groups gives an empty grid (no rows, no columns). */
export function grid(groups: readonly GroupLike[]): Grid {
  const byKey = new Map(groups.map((g) => [`${g.i},${g.j}`, g]));
  if (groups.length === 0) return { is: [], js: [], at: () => undefined };
  const iMin = Math.min(...groups.map((g) => g.i));
  const iMax = Math.max(...groups.map((g) => g.i));
  const jMin = Math.min(...groups.map((g) => g.j));
  const jMax = Math.max(...groups.map((g) => g.j));
  const is = Array.from({ length: iMax - iMin + 1 }, (_, k) => iMin + k);
  const js = Array.from({ length: (jMax - jMin) / 2 + 1 }, (_, k) => jMax - 2 * k);
  return { is, js, at: (i, j) => byKey.get(`${i},${j}`) };
}

const SUPERSCRIPT: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '-': '⁻' };

/** A power as each notation writes it; "unicode" is for places with neither TeX nor code (cards, notifications). */
function monomial(v: string, e: number, n: Notation | 'unicode'): string {
  if (e === 0) return '';
  if (e === 1) return v;
  if (n === 'tex') return `${v}^{${e}}`;
  if (n === 'unicode') return v + [...String(e)].map((c) => SUPERSCRIPT[c]).join('');
  return `${v}^${e}`;
}

/**
 * The Poincare polynomial sum rank h^i q^j from its [i, j, rank] terms: h is the homological
 * degree, never t, so it is not read as the t of V(t) (docs/conventions.md, Khovanov homology).
 * "q + q^3 + h^2 q^5", "q + q^{3} + h^{2}q^{5}" or "q + q³ + h²q⁵".
 */
export function poincareFormat(terms: readonly (readonly [number, number, number])[], n: Notation | 'unicode'): string {
  if (terms.length === 0) return '0';
  const gap = n === 'text' ? ' ' : '';
  return terms
    .map(([i, j, r]) => {
      const body = [monomial('h', i, n), monomial('q', j, n)].filter((m) => m !== '').join(gap);
      if (body === '') return String(r);
      return r === 1 ? body : `${r}${gap}${body}`;
    })
    .join(' + ');
}
