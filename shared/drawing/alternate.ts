// Alternating and descending drawings. A passage is one strand's pass through a crossing; along
// every closed path the passages come in order of arc length.
// - alternate(): the crossings set so that over and under alternate along every component. Over
//   (0) / under (1) is a 2-colouring of the passages in which a crossing's two passages differ
//   and so do consecutive passages along a path; every link projection has one (the classical
//   fact that any projection can be made alternating: Lickorish, An Introduction to Knot Theory,
//   ch. 1), unique up to swapping colours on each connected piece of the projection; of the two
//   we keep the one that flips fewer crossings.
// - isDescending(): some base point and direction on each component, and some order of the
//   components, meets every crossing first as over (a descending diagram is an unlink).

import type { Analysis, DrawnCrossing } from './analyse';
import { analyse } from './analyse';
import type { DrawingOptions } from './options';
import { flipCrossing, type Sketch } from './sketch';

interface Pass {
  readonly crossing: number;
  readonly over: boolean;
}

/** The passages of each path with crossings, in order along it (path id -> passages). */
function passagesAlong(crossings: readonly DrawnCrossing[]): Map<string, Pass[]> {
  const along = new Map<string, { pass: Pass; arc: number }[]>();
  const put = (id: string, pass: Pass, arc: number) => along.set(id, [...(along.get(id) ?? []), { pass, arc }]);
  crossings.forEach((c, crossing) => {
    put(c.over, { crossing, over: true }, c.overArc);
    put(c.under, { crossing, over: false }, c.underArc);
  });
  return new Map([...along].map(([id, list]) => [id, list.sort((p, q) => p.arc - q.arc).map((p) => p.pass)]));
}

/**
 * For every crossing, whether its over-strand must go under to alternate; null when the
 * passages admit no alternating choice (never for a drawn projection, but checked).
 */
export function alternatingFlips(a: Analysis): boolean[] | null {
  // Node 2i: crossing i's over passage, 2i + 1: its under passage; colour 1 = goes under.
  const links: number[][] = a.crossings.flatMap((_, i) => [[2 * i + 1], [2 * i]]);
  for (const list of passagesAlong(a.crossings).values()) {
    list.forEach((p, k) => {
      const q = list[(k + 1) % list.length];
      const [u, v] = [2 * p.crossing + (p.over ? 0 : 1), 2 * q.crossing + (q.over ? 0 : 1)];
      if (u === v) return;
      links[u].push(v);
      links[v].push(u);
    });
  }
  const colour = new Array<number>(links.length).fill(-1);
  const flip = new Array<boolean>(a.crossings.length).fill(false);
  for (let root = 0; root < links.length; root++) {
    if (colour[root] >= 0) continue;
    colour[root] = 0;
    const piece = [root];
    for (let k = 0; k < piece.length; k++) {
      for (const v of links[piece[k]]) {
        if (colour[v] === colour[piece[k]]) return null;
        if (colour[v] >= 0) continue;
        colour[v] = 1 - colour[piece[k]];
        piece.push(v);
      }
    }
    const overs = piece.filter((u) => u % 2 === 0);
    const swap = overs.filter((u) => colour[u] === 1).length * 2 > overs.length;
    for (const u of overs) flip[u / 2] = (colour[u] === 1) !== swap;
  }
  return flip;
}

/** The sketch with its crossings flipped so that every component alternates (unchanged when there is no diagram). */
export function alternate(s: Sketch, options: Partial<DrawingOptions> = {}): Sketch {
  const a = analyse(s, options);
  const flips = a.diagram ? alternatingFlips(a) : null;
  if (!flips) return s;
  return a.crossings.reduce((acc, c, i) => (flips[i] ? flipCrossing(acc, { a: c.over, b: c.under, at: c.at }, options) : acc), s);
}

// Some base point and direction meets every self-crossing of the path first as over.
function descendingPath(list: readonly Pass[], self: (crossing: number) => boolean): boolean {
  const n = list.length;
  for (const step of [1, -1]) {
    for (let start = 0; start < n; start++) {
      const seen = new Set<number>();
      let ok = true;
      for (let k = 0; k < n && ok; k++) {
        const p = list[(((start + step * k) % n) + n) % n];
        if (!self(p.crossing) || seen.has(p.crossing)) continue;
        seen.add(p.crossing);
        ok = p.over;
      }
      if (ok) return true;
    }
  }
  return false;
}

/** Whether the drawing has crossings and is descending (so it is an unlink, whatever it looks like). */
export function isDescending(a: Analysis): boolean {
  if (!a.diagram || a.crossings.length === 0) return false;
  const self = (i: number) => a.crossings[i].over === a.crossings[i].under;
  for (const list of passagesAlong(a.crossings).values()) if (!descendingPath(list, self)) return false;
  // Between components: one lies wholly above the other, and "above" has no cycle.
  const above = new Map<string, Set<string>>();
  for (const c of a.crossings.filter((x) => x.over !== x.under)) {
    if (above.get(c.under)?.has(c.over)) return false;
    above.set(c.over, (above.get(c.over) ?? new Set()).add(c.under));
  }
  const done = new Set<string>();
  const onPath = new Set<string>();
  const acyclic = (id: string): boolean => {
    if (onPath.has(id)) return false;
    if (done.has(id)) return true;
    onPath.add(id);
    const ok = [...(above.get(id) ?? [])].every(acyclic);
    onPath.delete(id);
    done.add(id);
    return ok;
  };
  return [...above.keys()].every(acyclic);
}
