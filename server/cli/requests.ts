// One `overstrand` request: which diagram (PD code, braid word or DT code) and what to compute,
// validated with zod, answered as a plain JSON object. Shared by `batch` (one per line) and
// `invariants --json`, so both speak the same contract (DEVELOPERS.md, Command line).
import { z } from 'zod';
import { diagramLimits, Framings, PdCode, Unknots } from '@/shared/api/sketches';
import { cable, Diagram, diagram, fromBraid, fromDT, Laurent, orient, writhe } from '@/shared/knot';
import { alexander } from '@/shared/knot/alexander';
import { bracket, loopFactor } from '@/shared/knot/bracket';
import { bracketOfBraid } from '@/shared/knot/bracket-braid';
import { colourings } from '@/shared/knot/colourings';
import { linkDeterminant, linkSignature } from '@/shared/knot/goeritz';
import { homfly } from '@/shared/knot/homfly';
import { jonesFromBracket } from '@/shared/knot/jones';
import { linkingMatrix } from '@/shared/knot/linking';
import { guessName } from '@/shared/knot/names';
import type { PDCode } from '@/shared/knot/pd';
import { khovanov, KhRing } from '@/shared/khovanov';
import { rasmussenS } from '@/shared/rasmussen';
import { bandCertificate, compareOnDiagram, compareSurfaces, Saddle, surfaceClass, surfaceClassOn } from '@/shared/knot/bands';

export const computable = [
  'components',
  'crossings',
  'writhe',
  'bracket',
  'jones',
  'alexander',
  'homfly',
  'determinant',
  'signature',
  'linking',
  'colourings',
  'name',
  'kh',
  'pd',
  's',
  'bands',
  'surfaceClass',
] as const;
export type Computable = (typeof computable)[number];

/**
 * What is computed when a request names nothing: everything but the PD code itself and what can
 * be slow on large diagrams (Khovanov homology, s, HOMFLY-PT by its skein tree).
 */
export const defaultCompute: readonly Computable[] = computable.filter((c) => !['kh', 's', 'pd', 'homfly', 'bands', 'surfaceClass'].includes(c));

// The limits of the API and sync (shared/api/sketches.ts): a braid letter or DT entry is a crossing.
const code = {
  pd: PdCode.optional(),
  braid: z.array(z.number().int().refine((k) => k !== 0, 'braid letters are nonzero integers')).max(diagramLimits.crossings).optional(),
  dt: z.array(z.number().int()).max(diagramLimits.crossings).optional(),
  /** Crossingless unknot components beside the code (default 0; for an empty PD code 1). */
  unknots: Unknots.optional(),
};
const oneCode = (keys: string[]) => (r: Record<string, unknown>) => keys.filter((k) => r[k] !== undefined).length === 1;

// A band is a saddle between two edges of one face; a diagram has at most 2 * crossings edges.
const Saddles = z.array(z.tuple([z.number().int(), z.number().int()])).max(diagramLimits.crossings);
// Crossings of a presentation's code that its fingers made, numbered from 1.
const Fingered = z.array(z.number().int().min(1)).max(diagramLimits.crossings);

/** The diagram a cable is taken of: a code, with a framing per component (null = blackboard). */
const CableOf = z
  .object({ ...code, framings: Framings.optional() })
  .strict()
  .refine(oneCode(['pd', 'braid', 'dt']), { message: 'give exactly one of "pd", "braid" or "dt"' });
type CableOf = z.infer<typeof CableOf>;

export const Request = z
  .object({
    id: z.unknown().optional(),
    ...code,
    /** Instead of a code: the (rPlus, rMinus)-cable of one component of a framed diagram. */
    cable: z
      .object({ of: CableOf, component: z.number().int().min(0).optional(), rPlus: z.number().int().min(0), rMinus: z.number().int().min(0) })
      .strict()
      .optional(),
    compute: z.array(z.enum(computable)).optional(),
    /** For "kh": 'Z' (default), 'Q' or 'F<p>'; for "surfaceClass": 'F2' (default) or 'Z'. */
    ring: z.string().regex(/^(Z|Q|F\d+)$/, "ring must be 'Z', 'Q' or 'F<p>' (e.g. 'F2')").optional(),
    reduced: z.boolean().optional(),
    /** For "colourings": the modulus n (default 3). */
    n: z.number().int().min(2).optional(),
    /** Bands as saddles [a, b] between edges of the request's PD code (shared/knot/bands). */
    bands: Saddles.optional(),
    /** For "surfaceClass": a second presentation on the same code, to compare classes with. */
    compareBands: Saddles.optional(),
    /** For "surfaceClass": the knot's own diagram, the request's "pd" without the crossings "fingers" (numbered from 1); the class is carried there. */
    knot: PdCode.optional(),
    fingers: Fingered.optional(),
    /** With "knot": a second presentation on its own code over the same knot diagram, to compare classes with. */
    compareWith: z.object({ pd: PdCode, bands: Saddles, fingers: Fingered.optional() }).strict().optional(),
  })
  .strict()
  .refine(oneCode(['pd', 'braid', 'dt', 'cable']), { message: 'give exactly one of "pd", "braid", "dt" or "cable"' })
  .refine((r) => (r.bands === undefined && r.compareBands === undefined) || r.pd !== undefined, { message: '"bands" and "compareBands" name edges of the request\'s "pd" code' })
  .refine((r) => !r.compute?.some((c) => c === 'bands' || c === 'surfaceClass') || r.bands !== undefined, { message: '"bands" and "surfaceClass" need "bands": [[a, b], ...]' })
  .refine((r) => (r.fingers === undefined && r.compareWith === undefined) || r.knot !== undefined, { message: '"fingers" and "compareWith" need "knot", the diagram without the fingers' })
  .refine((r) => r.knot === undefined || (r.pd !== undefined && r.compareBands === undefined), { message: '"knot" goes with a "pd" code, and a second presentation is then "compareWith", not "compareBands"' })
  .refine((r) => !r.compute?.includes('surfaceClass') || r.ring === undefined || r.ring === 'F2' || r.ring === 'Z', { message: '"surfaceClass" is computed over "F2" (the default) or "Z"' });
export type Request = z.infer<typeof Request>;

export type Answer = Record<string, unknown>;

/** Numbers stay numbers while they are safe integers; beyond 2^53 they travel as decimal strings. */
export const jsonInteger = (x: bigint): number | string => (Number.isSafeInteger(Number(x)) ? Number(x) : x.toString());

/**
 * An empty PD code alone is the unknot (as for khovanov()); "unknots" adds free components to a
 * braid or DT code. A cable is built by the knot core's cable builder.
 */
export function diagramOf(r: Request | CableOf): Diagram {
  if ('cable' in r && r.cable) return cable(diagramOf(r.cable.of), r.cable.component ?? 0, r.cable.rPlus, r.cable.rMinus);
  const framings = 'framings' in r ? r.framings : undefined;
  if (r.pd) return diagram(r.pd, { unknots: r.unknots ?? (r.pd.length === 0 ? 1 : 0), framings });
  const base = r.braid ? fromBraid(r.braid) : fromDT(r.dt!);
  return r.unknots || framings ? diagram(base.pd, { unknots: base.unknots + (r.unknots ?? 0), framings }) : base;
}

/** Computes what the request asks; throws (PDError, RangeError, ...) when it cannot. */
export function answer(r: Request): Answer {
  const d = diagramOf(r);
  const wanted = new Set(r.compute ?? defaultCompute);
  const o = orient(d.pd);
  const out: Answer = {};
  let kauffman: Laurent | undefined;
  // A braid word goes to the Temperley-Lieb sweep (the same bracket, faster on wide braids).
  const bracketOnce = () => (kauffman ??= r.braid ? bracketOfBraid(r.braid).mul(loopFactor().pow(r.unknots ?? 0)) : bracket(d));
  // With "unknots" the answer reads back as a request for the same diagram.
  if (wanted.has('pd')) [out.pd, out.unknots] = [d.pd, d.unknots];
  if (wanted.has('crossings')) out.crossings = d.pd.length;
  if (wanted.has('components')) out.components = o.components.length + d.unknots;
  if (wanted.has('writhe')) out.writhe = writhe(o);
  if (wanted.has('bracket')) out.bracket = bracketOnce().toJSON();
  if (wanted.has('jones')) out.jones = jonesFromBracket(d, bracketOnce()).toJSON();
  if (wanted.has('alexander')) {
    const a = alexander(d);
    out.alexander = a.polynomial.toJSON();
    out.alexanderSign = a.conwaySign ? 'conway' : 'convention';
  }
  // [vExp, zExp, coefficient] in the convention of docs/conventions.md, sorted by v then z.
  if (wanted.has('homfly')) out.homfly = homfly(d).toTriples().map(([v, z, c]) => [v, z, jsonInteger(c)]);
  if (wanted.has('determinant')) out.determinant = jsonInteger(linkDeterminant(d));
  if (wanted.has('signature')) out.signature = linkSignature(d);
  if (wanted.has('linking')) out.linking = linkingMatrix(d);
  if (wanted.has('colourings')) {
    const n = r.n ?? 3;
    out.colourings = { n, count: jsonInteger(colourings(d, n)) };
  }
  if (wanted.has('name')) out.name = guessName(d)?.text ?? null;
  if (wanted.has('kh')) {
    const kh = khovanov(d.pd, { ring: (r.ring ?? 'Z') as KhRing, reduced: r.reduced ?? false, unknots: d.unknots });
    out.kh = { ring: kh.ring, reduced: kh.reduced, groups: kh.groups.map(({ i, j, free, torsion }) => ({ i, j, free, torsion })) };
  }
  // A link of several components throws "s is defined for knots here" (an {id, error} line).
  if (wanted.has('s')) out.s = { Q: rasmussenS(d.pd, 'Q', { unknots: d.unknots }), F2: rasmussenS(d.pd, 'F2', { unknots: d.unknots }) };
  const saddles = (list: [number, number][]): Saddle[] => list.map(([a, b]) => ({ a, b }));
  const presentation = { pd: d.pd, unknots: d.unknots, saddles: saddles(r.bands ?? []) };
  if (wanted.has('bands')) {
    const c = bandCertificate(presentation);
    out.bands = { after: c.after, components: c.components, bands: c.bands, unlink: c.unlink, chi: c.chi, genusBound: c.genusBound, ribbon: c.ribbon };
  }
  if (wanted.has('surfaceClass')) {
    // The limits are checked before any work (surfaceClass: CLASS_CROSSINGS, LOCAL_CLASS_CROSSINGS, LOCAL_CLASS_EDGES).
    const ring = r.ring === 'Z' ? 'Z' : 'F2';
    if (r.knot) {
      // The crossings that are not fingers are the knot's, in its order (carry.ts checks it).
      const knot = diagram(r.knot).pd;
      const placed = (pd: PDCode, fingers: number[] = []) => {
        const bad = fingers.find((f) => f > pd.length);
        if (bad !== undefined) throw new RangeError(`there is no crossing ${bad} among ${pd.length} to be a finger's`);
        let next = 0;
        return { common: knot, of: pd.map((_, i) => (fingers.includes(i + 1) ? -1 : next++)) };
      };
      const a = { presentation, fingers: placed(d.pd, r.fingers) };
      if (r.compareWith) {
        const other = r.compareWith;
        const cmp = compareOnDiagram(a, { presentation: { pd: other.pd, unknots: 0, saddles: saddles(other.bands) }, fingers: placed(other.pd, other.fingers) }, { ring });
        out.surfaceClass = { ...cmp.a, compare: { verdict: cmp.verdict, other: cmp.b } };
      } else out.surfaceClass = surfaceClassOn(presentation, a.fingers, { ring });
    } else if (r.compareBands) {
      const cmp = compareSurfaces(d.pd, d.unknots, presentation.saddles, saddles(r.compareBands), { ring });
      out.surfaceClass = { ...cmp.a, compare: { verdict: cmp.verdict, other: cmp.b } };
    } else out.surfaceClass = surfaceClass(presentation, { ring });
  }
  return out;
}

/** A readable message for a failed validation: "field: problem; field: problem". */
export function describeIssues(error: z.ZodError): string {
  return error.issues.map((i) => (i.path.length > 0 ? `${i.path.join('.')}: ${i.message}` : i.message)).join('; ');
}

/** One batch line in, one JSON line out; never throws. The id is kept whenever it can be read. */
export function answerLine(line: string): string {
  let value: unknown;
  try {
    value = JSON.parse(line);
  } catch {
    return JSON.stringify({ id: null, error: 'the line is not valid JSON' });
  }
  const id = typeof value === 'object' && value !== null && 'id' in value ? (value as { id: unknown }).id ?? null : null;
  const parsed = Request.safeParse(value);
  if (!parsed.success) return JSON.stringify({ id, error: describeIssues(parsed.error) });
  try {
    return JSON.stringify({ id, ...answer(parsed.data) });
  } catch (e) {
    return JSON.stringify({ id, error: e instanceof Error ? e.message : String(e) });
  }
}
