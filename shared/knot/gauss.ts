// Signed Gauss code: each component as its passes in order of travel, +i passing over crossing
// i and -i passing under it (crossings numbered from 1), with the sign of every crossing.
// An empty component is a crossingless unknot. The sign fixes the counterclockwise order at
// each crossing, so the code determines the PD code directly (no embedding search).

import { Diagram, diagram } from './diagram';
import { orient, PDError, WritablePD } from './pd';

export interface GaussCode {
  readonly components: readonly (readonly number[])[];
  /** signs[i - 1] is the sign (+1 or -1) of crossing i. */
  readonly signs: readonly number[];
}

export function fromGauss(code: GaussCode): Diagram {
  const n = code.signs.length;
  code.signs.forEach((s, i) => {
    if (s !== 1 && s !== -1) throw new PDError(`sign of crossing ${i + 1} must be 1 or -1, got ${s}`);
  });
  const over = new Array<number>(n).fill(0);
  const under = new Array<number>(n).fill(0);
  for (const component of code.components) {
    for (const pass of component) {
      const i = Math.abs(pass) - 1;
      if (!Number.isInteger(pass) || pass === 0 || i >= n) throw new PDError(`pass ${pass} does not name a crossing 1..${n}`);
      (pass > 0 ? over : under)[i]++;
    }
  }
  for (let i = 0; i < n; i++) {
    if (over[i] !== 1 || under[i] !== 1) throw new PDError(`crossing ${i + 1} must be passed once over and once under; it is passed ${over[i]} times over and ${under[i]} times under`);
  }
  const slots: WritablePD = Array.from({ length: n }, () => [0, 0, 0, 0]);
  let next = 1;
  for (const given of code.components) {
    // A two-edge loop passing only over reads "increasing" both ways; orient() leaves the
    // lower-numbered crossing along its smaller label, so start the loop there.
    const component = given.length === 2 && given.every((p) => p > 0) && given[1] > given[0] ? [given[1], given[0]] : given;
    const first = next;
    next += component.length;
    component.forEach((pass, j) => {
      const incoming = first + j; // edge j runs into pass j
      const outgoing = first + ((j + 1) % component.length);
      const x = slots[Math.abs(pass) - 1];
      const positive = code.signs[Math.abs(pass) - 1] === 1;
      // Under: a -> c. Over: d -> b when positive, b -> d when negative.
      const [inPos, outPos] = pass < 0 ? [0, 2] : positive ? [3, 1] : [1, 3];
      x[inPos] = incoming;
      x[outPos] = outgoing;
    });
  }
  const unknots = code.components.filter((c) => c.length === 0).length;
  return diagram(slots, { unknots });
}

/** The signed Gauss code of a diagram, components in the order orient() finds them. */
export function toGauss(d: Diagram): GaussCode {
  const o = orient(d.pd);
  const components = o.components.map((labels) =>
    labels.map((label) => {
      const h = o.head.get(label)!;
      return h.position === 0 ? -(h.crossing + 1) : h.crossing + 1;
    }),
  );
  return { components: [...components, ...new Array<number[]>(d.unknots).fill([])], signs: o.signs };
}
