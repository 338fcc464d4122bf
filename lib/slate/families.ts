// The Families builder's pure part: the families it offers, their parameters, and how a built
// diagram is combined with the sketch already on the Slate (replace, connected sum, disjoint
// union, each optionally mirrored).
import { cable, connectedSum, disjointUnion, mirror, pretzelLink, rationalLink, torusLink, twistKnot } from '@/shared/knot/families';
import { componentCount, type Diagram } from '@/shared/knot/diagram';
import type { Sketch } from '@/shared/drawing/sketch';
import { cableSketch, closedBraidSketch, layoutPD, pretzelSketch, sketchPicture, sumSketch, type Picture } from '@/shared/layout';
import type { Parsed } from './codes';

export type FamilyKind = 'torus' | 'twist' | 'pretzel' | 'rational' | 'cable';

export interface FamilyField {
  key: string;
  label: string;
  hint: string;
  initial: string;
}

export interface Family {
  kind: FamilyKind;
  label: string;
  /** Needs a diagram on the Slate (it transforms it). */
  fromSketch: boolean;
  fields: readonly FamilyField[];
}

export const familyList: readonly Family[] = [
  { kind: 'torus', label: 'Torus link', fromSketch: false, fields: [
    { key: 'p', label: 'p (strands)', hint: 'nonzero integer', initial: '2' },
    { key: 'q', label: 'q (turns)', hint: 'integer; T(2,3) is the trefoil', initial: '3' },
  ] },
  { kind: 'twist', label: 'Twist knot', fromSketch: false, fields: [
    { key: 'n', label: 'n (half-twists)', hint: 'integer; 2 gives the figure-eight', initial: '2' },
  ] },
  { kind: 'pretzel', label: 'Pretzel link', fromSketch: false, fields: [
    { key: 'a', label: 'Columns a1 a2 …', hint: 'integers; -2 3 7 is a classic', initial: '-2 3 7' },
  ] },
  { kind: 'rational', label: 'Rational knot', fromSketch: false, fields: [
    { key: 'a', label: 'Continued fraction a1 a2 …', hint: 'a1 + 1/(a2 + …); 2 2 is the figure-eight', initial: '2 2' },
  ] },
  { kind: 'cable', label: 'Cable of the sketch', fromSketch: true, fields: [
    { key: 'component', label: 'Component', hint: 'number as in the Readout', initial: '1' },
    { key: 'framing', label: 'Framing', hint: 'integer, or blank for its current framing', initial: '' },
    { key: 'rPlus', label: 'r+ (parallel copies)', hint: 'integer ≥ 0', initial: '2' },
    { key: 'rMinus', label: 'r- (reversed copies)', hint: 'integer ≥ 0', initial: '0' },
  ] },
];

// Component k given an explicit framing (the cable follows it).
const setFramingOf = (d: Diagram, k: number, framing: number): Diagram => ({
  ...d,
  framings: d.framings.map((f, i) => (i === k ? framing : f)),
});

export type Placement = 'replace' | 'sum' | 'union';

const integer = (label: string, text: string): number => {
  const t = text.trim();
  if (!/^-?\d+$/.test(t)) throw new Error(`Expected an integer for ${label}, got "${text}"`);
  return Number(t);
};

const integers = (label: string, text: string): number[] => {
  const parts = text.trim().split(/[\s,]+/).filter(Boolean);
  if (parts.length === 0) throw new Error(`Expected at least one integer for ${label}`);
  return parts.map((p) => integer(label, p));
};

function build(kind: FamilyKind, v: Record<string, string>, current: Diagram | null): Diagram {
  switch (kind) {
    case 'torus':
      return torusLink(integer('p', v.p), integer('q', v.q));
    case 'twist':
      return twistKnot(integer('n', v.n));
    case 'pretzel':
      return pretzelLink(integers('the columns', v.a));
    case 'rational':
      return rationalLink(integers('the continued fraction', v.a));
    case 'cable': {
      if (!current) throw new Error('Draw or paste a link first: the cable is taken of a component of the sketch');
      const k = integer('the component', v.component) - 1;
      if (k < 0 || k >= componentCount(current)) throw new Error(`There is no component ${k + 1}; the sketch has ${componentCount(current)}`);
      const framed = v.framing.trim() === '' ? current : setFramingOf(current, k, integer('the framing', v.framing));
      return cable(framed, k, integer('r+', v.rPlus), integer('r-', v.rMinus));
    }
  }
}

/** T(p, q)'s braid word as torusLink builds it (mirrored: the inverse letters), for its closed-braid picture. */
function torusBraid(v: Record<string, string>, mirrored: boolean): number[] {
  const [p, q] = [integer('p', v.p), integer('q', v.q)];
  const sign = Math.sign(p) * Math.sign(q) * (mirrored ? -1 : 1);
  return Array.from({ length: Math.abs(q) }, () => Array.from({ length: Math.abs(p) - 1 }, (_, k) => sign * (k + 1))).flat();
}

/** The pretzel's columns as entered, mirrored: the mirror image of P(a) is P(-a). */
const pretzelColumns = (v: Record<string, string>, mirrored: boolean) => integers('the columns', v.a).map((a) => (mirrored ? -a : a));

/** The member's standard picture, checked: a pretzel in columns, a torus link as a closed braid; null for the others. */
function standardSketch(kind: FamilyKind, v: Record<string, string>, mirrored: boolean): Sketch | null {
  if (kind === 'pretzel') return pretzelSketch(pretzelColumns(v, mirrored));
  return kind === 'torus' ? closedBraidSketch(torusBraid(v, mirrored)) : null;
}

/** A summand's picture: a knot's standard picture when it has one, anything else by the general layout (null if that is not faithful). */
function summandPicture(d: Diagram, standard: Sketch | null): Picture | null {
  const own = standard && componentCount(d) === 1 ? sketchPicture(standard) : null;
  if (own) return own;
  const layout = layoutPD(d.pd, d.unknots);
  return layout.faithful ? { ...layout, framings: d.framings } : null;
}

/** The cable's standard picture: parallel copies only (the picture draws no reversed copies). */
function cablePictureOf(v: Record<string, string>, current: Diagram, mirrored: boolean): Sketch | null {
  if (integer('r-', v.rMinus) !== 0 || integer('r+', v.rPlus) < 1) return null;
  const k = integer('the component', v.component) - 1;
  const framed = v.framing.trim() === '' ? current : setFramingOf(current, k, integer('the framing', v.framing));
  return cableSketch(mirrored ? mirror(framed) : framed, k, integer('r+', v.rPlus));
}

/**
 * The family member, placed against the current diagram (read from the drawing `drawn`), with
 * its standard picture where there is one; errors as readable messages.
 */
export function buildFamily(kind: FamilyKind, values: Record<string, string>, current: Diagram | null, placement: Placement, mirrored: boolean, drawn?: Sketch): Parsed {
  try {
    const made = build(kind, values, current);
    const m = mirrored ? mirror(made) : made;
    if (kind === 'torus' && placement === 'replace') return { ok: true, diagram: m, braid: torusBraid(values, mirrored) };
    if (kind === 'cable') return { ok: true, diagram: m, sketch: cablePictureOf(values, current!, mirrored) };
    if (placement === 'replace') return { ok: true, diagram: m, sketch: standardSketch(kind, values, mirrored) };
    if (!current) throw new Error('There is no sketch on the Slate to combine with; choose "Replace"');
    if (placement === 'union') return { ok: true, diagram: disjointUnion(current, m) };
    const sum = connectedSum(current, m);
    // The sketch on the Slate keeps its picture.
    const [left, right] = [(drawn && sketchPicture(drawn)) ?? summandPicture(current, null), summandPicture(m, standardSketch(kind, values, mirrored))];
    return { ok: true, diagram: sum, sketch: left && right && current.unknots === 0 && m.unknots === 0 ? sumSketch(left, right, sum) : null };
  } catch (e) {
    const text = e instanceof Error ? e.message : String(e);
    return { ok: false, error: text.charAt(0).toUpperCase() + text.slice(1) + (text.endsWith('.') ? '' : '.') };
  }
}
