// The (r+, r-)-cable of a framed component: r+ parallel and r- reversed copies of it, side by
// side in the plane (the blackboard framing), every crossing replaced by the grid of crossings
// of the copies, then (framing - blackboard framing) full twists of the copies inserted on one
// edge so that the copies follow the component's framing (common practice; e.g. Gompf and
// Stipsicz, "4-Manifolds and Kirby Calculus", 1999, ch. 5 on framed pushoffs).

import { assemble, Framed } from '../assemble';
import { blackboardFramings, Diagram, framingsOf } from '../diagram';
import { Crossing, mapLabels, orient, PDError, Slot } from '../pd';

export function cable(d: Diagram, component: number, rPlus: number, rMinus: number): Diagram {
  const o = orient(d.pd);
  const count = o.components.length + d.unknots;
  if (!Number.isInteger(component) || component < 0 || component >= count) throw new PDError(`there is no component ${component + 1}`);
  if (!Number.isInteger(rPlus) || !Number.isInteger(rMinus) || rPlus < 0 || rMinus < 0 || rPlus + rMinus < 1) {
    throw new PDError(`a cable needs r+ >= 0, r- >= 0 and r+ + r- >= 1, got (${rPlus}, ${rMinus})`);
  }
  const r = rPlus + rMinus;
  const reversed = (copy: number) => copy >= rPlus;
  const twists = framingsOf(d, o)[component] - blackboardFramings(d, o)[component];

  const ids = new Map<string, number>();
  const id = (key: string) => {
    if (!ids.has(key)) ids.set(key, ids.size + 1);
    return ids.get(key)!;
  };
  const pd: Crossing[] = [];
  const heads = new Map<number, Slot>();
  const push = (x: Crossing, incoming: [number, number][]) => {
    for (const [label, position] of incoming) heads.set(label, { crossing: pd.length, position });
    pd.push(x);
  };

  // Twist region on the copies of the component's first edge, strands upward along it, copy j
  // at braid position r-1-j (copies are numbered leftwards). Returns the copies' labels on top.
  const twistRegion = (bottom: number[]): number[] => {
    const cur = [...bottom].reverse();
    const copyAt = Array.from({ length: r }, (_, p) => r - 1 - p);
    let fresh = 0;
    for (let t = 0; t < Math.abs(twists) * r; t++) {
      for (let k = 1; k < r; k++) {
        const l = k - 1;
        const [BL, BR] = [cur[l], cur[l + 1]];
        const [TL, TR] = [id(`twist:${fresh++}`), id(`twist:${fresh++}`)];
        const upRight = !reversed(copyAt[l + 1]); // the strand BR-TL
        const upLeft = !reversed(copyAt[l]); // the strand BL-TR
        if (twists > 0) {
          // sigma_k: BR-TL under.
          if (upRight) push([BR, TR, TL, BL], [[BR, 0], upLeft ? [BL, 3] : [TR, 1]]);
          else push([TL, BL, BR, TR], [[TL, 0], upLeft ? [BL, 1] : [TR, 3]]);
        } else if (upLeft) push([BL, BR, TR, TL], [[BL, 0], upRight ? [BR, 1] : [TL, 3]]);
        else push([TR, TL, BL, BR], [[TR, 0], upRight ? [BR, 3] : [TL, 1]]);
        cur[l] = TL;
        cur[l + 1] = TR;
        [copyAt[l], copyAt[l + 1]] = [copyAt[l + 1], copyAt[l]];
      }
    }
    return Array.from({ length: r }, (_, j) => cur[r - 1 - j]);
  };

  const framed: Framed[] = [];
  const unknotFramings = d.framings.slice(o.components.length);
  if (component >= o.components.length) {
    // A crossingless unknot: the twist region closed up on itself.
    unknotFramings.splice(component - o.components.length, 1);
    if (twists === 0 || r === 1) unknotFramings.push(...new Array<null>(r).fill(null));
    else {
      const bottom = Array.from({ length: r }, (_, j) => id(`loop:${j}`));
      const top = twistRegion(bottom);
      const close = new Map(top.map((t, j) => [t, bottom[j]]));
      for (let i = 0; i < pd.length; i++) pd[i] = mapLabels(pd[i], (l) => close.get(l) ?? l);
      for (const [t, b] of close) {
        heads.set(b, heads.get(t) ?? heads.get(b)!);
        heads.delete(t);
      }
    }
  }

  const isCabled = (label: number) => o.componentOf.get(label) === component;
  const first = component < o.components.length ? o.components[component][0] : undefined;
  const firstHead = first === undefined ? undefined : o.head.get(first)!;
  const topOfFirst = first !== undefined && twists !== 0 ? twistRegion(Array.from({ length: r }, (_, j) => id(`${first}:${j}`))) : undefined;
  // Label of copy j of the edge at (crossing, position); the first edge's head end meets the twists.
  const name = (crossing: number, position: number, copy: number): number => {
    const label = d.pd[crossing][position];
    if (topOfFirst && label === first && firstHead!.crossing === crossing && firstHead!.position === position) return topOfFirst[copy];
    return id(`${label}:${copy}`);
  };

  d.pd.forEach((x, crossing) => {
    const [underCabled, overCabled] = [isCabled(x[0]), isCabled(x[1])];
    const ru = underCabled ? r : 1;
    const ro = overCabled ? r : 1;
    const positive = o.signs[crossing] > 0;
    const underRev = (i: number) => underCabled && reversed(i);
    // Frame: under-strand along +x (a west, c east), b south, d north; under copy i at y = i.
    // Over copy j sits at x = j when the over-strand runs south (positive crossing), at x = -j
    // when north; columns are numbered west to east.
    const copyInColumn = (c: number) => (positive ? c : ro - 1 - c);
    const overNorth = (j: number) => !positive !== (overCabled && reversed(j));
    const H = (i: number, s: number) => (s === 0 ? name(crossing, 0, i) : s === ro ? name(crossing, 2, i) : id(`h:${crossing}:${i}:${s}`));
    const V = (j: number, s: number) => (s === 0 ? name(crossing, 1, j) : s === ru ? name(crossing, 3, j) : id(`v:${crossing}:${j}:${s}`));
    for (let i = 0; i < ru; i++) {
      for (let c = 0; c < ro; c++) {
        const j = copyInColumn(c);
        const [W, E, S, N] = [H(i, c), H(i, c + 1), V(j, i), V(j, i + 1)];
        const cell: Crossing = underRev(i) ? [E, N, W, S] : [W, S, E, N];
        // The over copy enters from the south when it runs north; S sits at 1 in [W,S,E,N], 3 in [E,N,W,S].
        const southPosition = underRev(i) ? 3 : 1;
        push(cell, [[cell[0], 0], overNorth(j) ? [S, southPosition] : [N, 4 - southPosition]]);
      }
    }
  });

  o.components.forEach((labels, c) => {
    if (c !== component) framed.push({ label: id(`${labels[0]}:0`), framing: d.framings[c] });
  });
  return assemble(pd, heads, framed, unknotFramings);
}
