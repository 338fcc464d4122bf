// A canonical form of a PD code up to relabelling of its edges and reordering of its crossings
// (the standard "minimum over all starting edges" canonical labelling of a rooted planar map):
// two PD codes get the same form exactly when one is the other relabelled. Orientation and
// mirror image are kept, so a reversed or mirrored diagram is a different diagram here.
//
// From a starting edge, labels 1, 2, ... run along its component in the direction of travel;
// then, taking the labelled edges in label order, every unlabelled edge at the crossing each
// one enters starts the next component. That reaches every crossing of the connected piece.
// The crossings, relabelled, are sorted; the least result over all starting edges is the form.
// Split diagrams: each piece separately, pieces sorted (a marked piece first).

import { connectedPieces, Crossing, mapLabels, orient, Oriented, PDCode } from './pd';

type Form = Crossing[];

function compare(a: Form, b: Form): number {
  for (let k = 0; k < Math.min(a.length, b.length); k++) {
    for (let p = 0; p < 4; p++) if (a[k][p] !== b[k][p]) return a[k][p] - b[k][p];
  }
  return a.length - b.length;
}

/** Relabels the piece made of `crossings`, starting at edge `start`, labels from 1. */
function formFrom(o: Oriented, crossings: readonly number[], start: number): Form {
  const fresh = new Map<number, number>();
  const order: number[] = [];
  const labelComponent = (edge: number): void => {
    const c = o.components[o.componentOf.get(edge)!];
    const k = c.indexOf(edge);
    for (let t = 0; t < c.length; t++) {
      const label = c[(k + t) % c.length];
      fresh.set(label, fresh.size + 1);
      order.push(label);
    }
  };
  labelComponent(start);
  for (let n = 0; n < order.length; n++) {
    const x = o.pd[o.head.get(order[n])!.crossing];
    for (const label of x) if (!fresh.has(label)) labelComponent(label);
  }
  return crossings.map((k) => mapLabels(o.pd[k], (l) => fresh.get(l)!)).sort((a, b) => compare([a], [b]));
}

function pieceForm(o: Oriented, crossings: readonly number[], starts: readonly number[]): Form {
  let best: Form | null = null;
  for (const s of starts) {
    const f = formFrom(o, crossings, s);
    if (best === null || compare(f, best) < 0) best = f;
  }
  return best ?? [];
}

/**
 * The canonical PD code of `pd`. With `marked` (a component index as orient() numbers them),
 * that component is labelled first (1, 2, ...), so reduced homology at it can be keyed too.
 * Degenerate input: the empty code gives the empty code. Throws PDError on an invalid code.
 * Cost: (number of edges) x (sorting the crossings) per piece.
 */
export function canonicalPD(pd: PDCode, marked?: number): PDCode {
  const o = orient(pd);
  const markedEdges = marked === undefined ? undefined : o.components[marked];
  const pieces = connectedPieces(pd).map((crossings) => {
    const edges = [...new Set(crossings.flatMap((k) => [...pd[k]]))];
    const hasMark = markedEdges !== undefined && edges.includes(markedEdges[0]);
    return { form: pieceForm(o, crossings, hasMark ? markedEdges : edges), hasMark };
  });
  pieces.sort((a, b) => Number(b.hasMark) - Number(a.hasMark) || compare(a.form, b.form));
  let offset = 0;
  const out: Crossing[] = [];
  for (const { form } of pieces) {
    const top = Math.max(...form.flat());
    out.push(...form.map((x) => mapLabels(x, (l) => l + offset)));
    offset += top;
  }
  return out;
}
