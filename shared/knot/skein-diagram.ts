// The oriented link diagram as a skein computation rewrites it: a signed Gauss code. Each
// component is the cyclic list of its passes through crossings in the direction of travel, a pass
// being one number 4 x + 2 (sign > 0) + (over), so the orientation, the crossing signs and the
// over/under information travel together through every change. For a planar diagram the signed
// Gauss code of each connected piece fixes the piece up to isotopy of the sphere, and switching a
// crossing, smoothing it the oriented way, or undoing a Reidemeister I or II move keeps it planar.

import { Diagram } from './diagram';
import { orient } from './pd';

export interface SkeinLink {
  /** Components with crossings, each a cyclic list of passes. */
  readonly components: readonly (readonly number[])[];
  /** Crossingless components. */
  readonly circles: number;
}

export const crossingOf = (pass: number): number => pass >> 2;
export const isOver = (pass: number): boolean => (pass & 1) === 1;
export const signOf = (pass: number): 1 | -1 => (pass & 2 ? 1 : -1);

export function fromDiagram(d: Diagram): SkeinLink {
  const o = orient(d.pd);
  const components = o.components.map((labels) =>
    labels.map((l) => {
      // An edge enters its crossing as the under-strand at slot a, as the over-strand at b or d.
      const { crossing, position } = o.head.get(l)!;
      return 4 * crossing + (o.signs[crossing] > 0 ? 2 : 0) + (position % 2);
    }),
  );
  return { components, circles: d.unknots };
}

/** Where each crossing's two passes sit: [component, index] twice (over pass first). */
function places(link: SkeinLink): Map<number, [number, number][]> {
  const at = new Map<number, [number, number][]>();
  link.components.forEach((c, k) =>
    c.forEach((p, i) => {
      const list = at.get(crossingOf(p)) ?? [];
      if (isOver(p)) list.unshift([k, i]);
      else list.push([k, i]);
      at.set(crossingOf(p), list);
    }),
  );
  return at;
}

/** The crossing changed: over and under swap, so the sign flips. */
export function switchCrossing(link: SkeinLink, x: number): SkeinLink {
  return { ...link, components: link.components.map((c) => c.map((p) => (crossingOf(p) === x ? p ^ 3 : p))) };
}

/**
 * The oriented smoothing at x: the strand arriving at x leaves along the other strand's exit. On
 * one component it splits into two, two components merge into one; an empty list becomes a circle.
 */
export function smoothCrossing(link: SkeinLink, x: number): SkeinLink {
  const [[ka, i], [kb, j]] = places(link).get(x)!;
  const a = link.components[ka];
  const after = (c: readonly number[], from: number, to: number): number[] => {
    const out: number[] = [];
    for (let t = (from + 1) % c.length; t !== to; t = (t + 1) % c.length) out.push(c[t]);
    return out;
  };
  const rest = link.components.filter((_, k) => k !== ka && k !== kb);
  const made = ka === kb ? [after(a, j, i), after(a, i, j)] : [[...after(link.components[kb], j, j), ...after(a, i, i)]];
  return {
    components: [...rest, ...made.filter((c) => c.length > 0)],
    circles: link.circles + made.filter((c) => c.length === 0).length,
  };
}

/** Removes the passes through the given crossings; components left without passes become circles. */
function removeCrossings(link: SkeinLink, gone: readonly number[]): SkeinLink {
  const kept = link.components.map((c) => c.filter((p) => !gone.includes(crossingOf(p))));
  return { components: kept.filter((c) => c.length > 0), circles: link.circles + kept.filter((c) => c.length === 0).length };
}

const next = (c: readonly number[], i: number): number => (i + 1) % c.length;

/**
 * Undoes Reidemeister I moves (a crossing met twice in a row) and II moves (two crossings of
 * opposite sign met in a row by an over-strand and, in either order, by an under-strand) until
 * none is left. In a planar diagram such a pair always bounds a bigon, up to pieces of the
 * diagram that lie inside it and are split from the rest.
 */
export function simplifyLink(link: SkeinLink): SkeinLink {
  for (;;) {
    const found = reducible(link);
    if (!found) return link;
    link = removeCrossings(link, found);
  }
}

function reducible(link: SkeinLink): number[] | undefined {
  for (const c of link.components) {
    for (let i = 0; i < c.length; i++) if (crossingOf(c[i]) === crossingOf(c[next(c, i)])) return [crossingOf(c[i])];
  }
  const at = places(link);
  for (const c of link.components) {
    for (let i = 0; i < c.length; i++) {
      const [p, q] = [c[i], c[next(c, i)]];
      if (!isOver(p) || !isOver(q) || signOf(p) === signOf(q)) continue;
      const [kp, ip] = at.get(crossingOf(p))![1];
      const [kq, iq] = at.get(crossingOf(q))![1];
      const under = link.components[kp];
      if (kp === kq && (next(under, ip) === iq || next(under, iq) === ip)) return [crossingOf(p), crossingOf(q)];
    }
  }
  return undefined;
}

/** The connected pieces: sets of components joined through crossings. */
export function pieces(link: SkeinLink): SkeinLink[] {
  const parent = link.components.map((_, k) => k);
  const find = (k: number): number => (parent[k] === k ? k : (parent[k] = find(parent[k])));
  for (const list of places(link).values()) parent[find(list[0][0])] = find(list[1][0]);
  const groups = new Map<number, (readonly number[])[]>();
  link.components.forEach((c, k) => groups.set(find(k), [...(groups.get(find(k)) ?? []), c]));
  return [...groups.values()].map((components) => ({ components, circles: 0 }));
}

/**
 * A key equal for two connected pieces exactly when one is the other with its crossings renamed,
 * its components reordered or started elsewhere, or every orientation reversed (which changes
 * neither the signs nor the link's HOMFLY-PT polynomial): the least code over all starts. From a
 * start, crossings are numbered as first met; the next component is entered at the pass of the
 * lowest-numbered crossing not yet walked through twice. A code is abandoned as soon as it is
 * larger than the best so far, which leaves few starts walked to the end.
 */
export function pieceKey(piece: SkeinLink): string {
  const size = piece.components.reduce((s, c) => s + c.length + 1, 0);
  const crossings = 1 + Math.max(...piece.components.flat().map(crossingOf));
  const buffers: Buffers = {
    best: new Int32Array(size).fill(0x7fffffff),
    code: new Int32Array(size),
    fresh: new Int32Array(crossings),
    labelled: new Int32Array(crossings),
    walked: new Uint8Array(piece.components.length),
  };
  for (const components of [piece.components, piece.components.map((c) => [...c].reverse())]) {
    // Where the two passes of each crossing sit, as component * 2^16 + index.
    const at = Array.from({ length: crossings }, () => [] as number[]);
    components.forEach((c, k) => c.forEach((p, i) => at[crossingOf(p)].push(k * 65536 + i)));
    for (let k = 0; k < components.length; k++) {
      for (let i = 0; i < components[k].length; i++) if (codeFrom(components, at, k, i, buffers)) buffers.best.set(buffers.code);
    }
  }
  return String.fromCharCode(...buffers.best);
}

interface Buffers {
  best: Int32Array;
  code: Int32Array;
  /** New number of each crossing, -1 while unmet. */
  fresh: Int32Array;
  /** Crossings in the order they were numbered. */
  labelled: Int32Array;
  walked: Uint8Array;
}

/** Writes the code from pass i of component k into buffers.code; true if it is less than buffers.best. */
function codeFrom(components: readonly (readonly number[])[], at: number[][], k0: number, i0: number, b: Buffers): boolean {
  const { best, code, fresh, labelled, walked } = b;
  fresh.fill(-1);
  walked.fill(0);
  let labels = 0;
  let length = 0;
  let smaller = false;
  let k = k0;
  let i = i0;
  for (let n = 0; ; ) {
    walked[k] = 1;
    const c = components[k];
    for (let t = 0; t <= c.length; t++) {
      let token = 0; // 0 ends a component
      if (t < c.length) {
        const p = c[(i + t) % c.length];
        const x = crossingOf(p);
        if (fresh[x] < 0) {
          fresh[x] = labels;
          labelled[labels++] = x;
        }
        token = 4 * fresh[x] + (p & 3) + 1;
      }
      if (!smaller && token !== best[length]) {
        if (token > best[length]) return false;
        smaller = true;
      }
      code[length++] = token;
    }
    // The next component: through the lowest-numbered crossing with a pass not yet walked.
    let found = false;
    for (; n < labels && !found; n++) {
      for (const place of at[labelled[n]]) {
        if (walked[place >> 16]) continue;
        [k, i, found] = [place >> 16, place & 65535, true];
        n--; // its other pass may lead to yet another component
        break;
      }
    }
    if (!found) return smaller;
  }
}
