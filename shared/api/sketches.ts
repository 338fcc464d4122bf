// Sketches: the record a user draws on the Slate. Its writable fields (what a sync mutation may
// carry, sync/SPEC.md S5, S24) and the REST read shapes. The diagram is stored as data (PD code,
// unknot count, framings, the drawn strokes); invariants are derived from it, never stored here.
import { z } from 'zod';

export const sketchPaths = {
  sketches: '/api/sketches', // GET list of visible sketches (own + shared to my groups)
  sketch: (id: string) => `/api/sketches/${id}`, // GET one visible sketch
} as const;

export const RecordId = z.string().min(1).max(100);
export const Sha256 = z.string().regex(/^[0-9a-f]{64}$/, 'Expected a SHA-256 hash in lowercase hex');

export const Label = z.int().min(-1_000_000).max(1_000_000);

/**
 * The one set of diagram limits of the API, sync and the command line. Unknots: the homology of
 * 50 split circles has ranks up to C(50, 25) < 2^53, still counted exactly; framings: a cable of
 * an r-strand component with framing f carries |f - writhe| r (r - 1) twist crossings, so beyond
 * +-200 a cable is far over any run's crossing limit.
 */
export const diagramLimits = { crossings: 2_000, unknots: 50, framing: 200 } as const;
export const PdCode = z.array(z.tuple([Label, Label, Label, Label])).max(diagramLimits.crossings);
export const Unknots = z.int().min(0).max(diagramLimits.unknots);
/** One per component (components in `orient()` order, unknots after them); null = blackboard. */
export const Framings = z
  .array(z.int().min(-diagramLimits.framing).max(diagramLimits.framing).nullable())
  .max(2 * diagramLimits.crossings + diagramLimits.unknots);

const Point = z.tuple([z.number(), z.number()]);

export const Stroke = z.object({
  points: z.array(Point).max(20_000),
  closed: z.boolean().optional(),
});
export type Stroke = z.infer<typeof Stroke>;

/** The Slate's geometry is a few levels deep (components, strokes, points); a device sends no more. */
export const geometryLimits = { depth: 32, values: 500_000 } as const;

/**
 * Why `value` is beyond geometryLimits, or null. A loop with an explicit stack rather than
 * recursion, so a value nested thousands deep is measured, not a stack overflow.
 */
function geometryTooBig(value: unknown): string | null {
  const stack: [unknown, number][] = [[value, 1]];
  for (let seen = 0; stack.length; seen++) {
    if (seen > geometryLimits.values) return `more than ${geometryLimits.values} values`;
    const [v, depth] = stack.pop()!;
    if (v === null || typeof v !== 'object') continue;
    if (depth > geometryLimits.depth) return `nested more than ${geometryLimits.depth} deep`;
    for (const child of Object.values(v)) stack.push([child, depth + 1]);
  }
  return null;
}

/**
 * The link diagram: PD code (docs/conventions.md), unknotted circles with no crossings that
 * the PD code cannot show, one framing per component (components in `orient()` order, unknots
 * after them; null = blackboard framing), the drawn strokes, and in `geometry` the Slate's
 * own drawing state as JSON (shared/drawing's Sketch: components, flips, nextSeq), so the
 * drawing reopens exactly as it was left.
 */
export const Diagram = z.object({
  pd: PdCode,
  unknots: Unknots,
  framings: Framings,
  strokes: z.array(Stroke).max(2_000),
  // Not z.json(): its recursive check costs ~1 ms per drawing, and the value always arrives
  // from JSON (request body, device store) so it is JSON by construction.
  geometry: z
    .unknown()
    .superRefine((g, ctx) => {
      const why = geometryTooBig(g);
      if (why) ctx.addIssue({ code: 'custom', message: `The drawing's geometry is ${why}` });
    })
    .optional(),
});
export type Diagram = z.infer<typeof Diagram>;

const XY = z.object({ x: z.number(), y: z.number() });

/** What `geometry` holds when the Slate wrote it (shared/drawing's Sketch plus hand-picked colours). */
export const SlateGeometry = z.object({
  components: z.array(z.object({
    id: z.string(),
    seq: z.number(),
    points: z.array(XY),
    closed: z.boolean(),
    reversed: z.boolean(),
    framing: z.number().int().nullable(),
  })),
  flips: z.array(z.object({ a: z.string(), b: z.string(), at: XY })),
  nextSeq: z.number(),
  colours: z.record(z.string(), z.number().int()).optional(),
  /** Bands (shared/drawing/bands.ts); drawings saved before bands existed have none. */
  bands: z.array(z.object({
    id: z.string(),
    from: z.string(),
    to: z.string(),
    core: z.array(XY).max(5_000),
    twists: z.number().int().min(-diagramLimits.framing).max(diagramLimits.framing),
    unders: z.array(z.object({ component: z.string(), at: XY })),
  })).max(100).optional(),
});
export type SlateGeometry = z.infer<typeof SlateGeometry>;

export const emptyDiagram = (): Diagram => ({ pd: [], unknots: 0, framings: [], strokes: [] });

const IsoTime = z.iso.datetime({ offset: true });

/** Every field a device writes. `ownerId` is not among them: the server sets it (S23). */
export const SketchFields = z.object({
  title: z.string().max(200),
  seenAt: z.string().max(300), // where it was seen, free text ("Topology seminar, room 2")
  notes: z.string().max(20_000),
  tags: z.array(z.string().trim().min(1).max(50)).max(50),
  diagram: Diagram,
  attachments: z.array(Sha256).max(20),
  createdAt: IsoTime,
  updatedAt: IsoTime,
  groupId: z.string().nullable(), // shared to this group; null = private
  deleted: z.boolean(),
});
export type SketchFields = z.infer<typeof SketchFields>;
export const sketchFieldNames = Object.keys(SketchFields.shape) as (keyof SketchFields)[];

/** A mutation carries any subset of the fields (S5). */
export const SketchFieldsPatch = SketchFields.partial().strict();
export type SketchFieldsPatch = z.infer<typeof SketchFieldsPatch>;

/** The defaults a record starts from when an update arrives before its add (S13). */
export const sketchDefaults = (now: string): SketchFields => ({
  title: '',
  seenAt: '',
  notes: '',
  tags: [],
  diagram: emptyDiagram(),
  attachments: [],
  createdAt: now,
  updatedAt: now,
  groupId: null,
  deleted: false,
});

export const Sketch = SketchFields.extend({
  id: RecordId,
  ownerId: z.string(),
  version: z.int().min(0),
});
export type Sketch = z.infer<typeof Sketch>;
export const SketchList = z.array(Sketch);

export const SketchListQuery = z.object({
  groupId: z.string().optional(), // only those shared to this group
  includeDeleted: z.enum(['true', 'false']).optional(),
});
