// Arcs of a diagram and the Wirtinger relation at each crossing (W. Wirtinger 1905; as in
// Lickorish, An Introduction to Knot Theory, ch. 6 and 11): an arc runs from one under-passing
// to the next, so the two over-edges b, d of X[a,b,c,d] lie on one arc.
import { labelClasses } from './label-classes';
import { slotsOf, type Oriented } from './pd';

export interface Relation {
  readonly over: number;
  /** Arc of the incoming under-edge a. */
  readonly into: number;
  /** Arc of the outgoing under-edge c. */
  readonly out: number;
  readonly sign: number;
}

export interface Arcs {
  readonly count: number;
  readonly relations: readonly Relation[];
}

export function arcsOf(o: Oriented): Arcs {
  const labels = [...slotsOf(o.pd).keys()];
  const { find, join } = labelClasses();
  for (const x of o.pd) join(x[1], x[3]);
  const index = new Map<number, number>();
  for (const l of labels) if (!index.has(find(l))) index.set(find(l), index.size);
  const arc = (l: number) => index.get(find(l))!;
  return {
    count: index.size,
    relations: o.pd.map((x, i) => ({ over: arc(x[1]), into: arc(x[0]), out: arc(x[2]), sign: o.signs[i] })),
  };
}
