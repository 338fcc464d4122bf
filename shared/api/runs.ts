// Runs: heavy computations on the group server (Khovanov homology of a diagram, a cable sweep
// of a framed link: Kh of every (r+, r-)-cable, each a sub-run, or the unlink check of a band
// presentation: Kh over Z of the diagram after the bands). The request and answer shapes,
// shared by the server routes and the app.
import { z } from 'zod';
import { isPrime } from '@/shared/linalg/ring';
import { diagramLimits, Framings, PdCode, RecordId, Label, Unknots } from './sketches';

export const runPaths = {
  runs: '/api/runs', // POST start, GET list (?mine=1 | ?sketchId= | ?groupId=)
  run: (id: string) => `/api/runs/${id}`, // GET one (with its sub-runs for a cable sweep)
  cancel: (id: string) => `/api/runs/${id}/cancel`, // POST
} as const;

/** The page a finished-run e-mail links to, under PUBLIC_URL. */
export const runPagePath = (id: string) => `/runs/${id}` as const;

export const runKinds = ['khovanov', 'cable-sweep', 'bands'] as const;
export const RunKind = z.enum(runKinds);
export type RunKind = z.infer<typeof RunKind>;

export const runStatuses = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export const RunStatus = z.enum(runStatuses);
export type RunStatus = z.infer<typeof RunStatus>;
export const isFinished = (s: RunStatus): boolean => s === 'done' || s === 'failed' || s === 'cancelled';

/** 'Z' (with torsion), 'Q', or 'F<p>' for a prime p. */
export const RunRing = z
  .string()
  .refine((r) => r === 'Z' || r === 'Q' || (/^F\d{1,5}$/.test(r) && isPrime(Number(r.slice(1)))), {
    message: "Ring must be Z, Q or F<p> for a prime p (e.g. F2)",
  });

/** Bands as saddles [a, b] between edges of the PD code, applied in order (shared/knot/bands, DEVELOPERS.md). */
export const RunBands = z.array(z.tuple([Label, Label])).min(1).max(diagramLimits.crossings);

/** A diagram given directly (pasted PD code, or a braid closure the app converted), in the limits of a sketch's. */
export const RunDiagram = z.object({
  pd: PdCode,
  unknots: Unknots.default(0),
  framings: Framings.optional(),
  /** A bands run's bands (kind 'bands' only). */
  bands: RunBands.optional(),
});
export type RunDiagram = z.infer<typeof RunDiagram>;

/** What a pasted diagram was written as: "braid <word>", "DT <code>" or "PD <code>", without a cut. */
export const RunSource = z.string().trim().min(1).max(20_000);

/** Cable sweep: every component takes each (r+, r-) with 1 <= r+ + r- <= maxStrands. */
export const CableSweep = z.object({ maxStrands: z.int().min(1).max(4) });
export type CableSweep = z.infer<typeof CableSweep>;

export const StartRunRequest = z
  .object({
    kind: RunKind.default('khovanov'),
    sketchId: RecordId.optional(),
    /** With sketchId: the sketch's diagram as the device has it (what the run computes). */
    diagram: RunDiagram.optional(),
    /** For a pasted diagram: share the run with this group (members and above). Omit: private. */
    groupId: z.string().min(1).max(100).optional(),
    ring: RunRing.default('Z'),
    reduced: z.boolean().default(false),
    sweep: CableSweep.optional(),
    /** Short description shown in the table, e.g. "braid 1 1 1"; default: the sketch title. */
    label: z.string().trim().max(120).optional(),
    /** The text the diagram came from, in full (e.g. "braid 1 1 -2 ..."): shown with the result and in its exports. */
    source: RunSource.optional(),
    /** Also compute the Rasmussen s-invariant over Q and F2 (a Khovanov run of a knot only). */
    computeS: z.boolean().default(false),
  })
  // Both: a run on the sketch that computes the diagram as the device shows it (the server's
  // copy may be older than the latest edit).
  .refine((r) => r.sketchId !== undefined || r.diagram !== undefined, {
    message: 'Give sketchId, diagram, or both',
    path: ['diagram'],
  })
  .refine((r) => (r.kind === 'cable-sweep') === (r.sweep !== undefined), {
    message: 'A cable sweep needs sweep: { maxStrands }, and only a cable sweep takes it',
    path: ['sweep'],
  })
  .refine((r) => r.sketchId === undefined || r.groupId === undefined, {
    message: "A run on a sketch belongs to the sketch's group; do not give groupId",
    path: ['groupId'],
  })
  .refine((r) => !r.computeS || r.kind === 'khovanov', {
    message: 's is computed on Khovanov runs of knots, not on a cable sweep or a bands run',
    path: ['computeS'],
  })
  .refine((r) => (r.kind === 'bands') === (r.diagram?.bands !== undefined), {
    message: 'A bands run needs diagram.bands: [[a, b], ...], and only a bands run takes them',
    path: ['diagram'],
  })
  .refine((r) => r.kind !== 'bands' || (r.ring === 'Z' && !r.reduced), {
    message: 'A bands run certifies the unlink by unreduced Khovanov homology over Z',
    path: ['ring'],
  });
/** What the app sends (defaults may be left out). */
export type StartRunRequest = z.input<typeof StartRunRequest>;
/** What the server works with, defaults filled in. */
export type StartRunParsed = z.output<typeof StartRunRequest>;

export const RunListQuery = z
  .object({
    mine: z.enum(['1', 'true']).optional(),
    sketchId: RecordId.optional(),
    groupId: z.string().min(1).max(100).optional(),
  })
  .refine((q) => [q.mine, q.sketchId, q.groupId].filter((v) => v !== undefined).length === 1, {
    message: 'Give exactly one of mine=1, sketchId or groupId',
  });

export const KhGroupJson = z.object({ i: z.int(), j: z.int(), free: z.int().min(0), torsion: z.array(z.int()) });
export type KhGroupJson = z.infer<typeof KhGroupJson>;

/** The Rasmussen s-invariant over Q and over F2 (signs of docs/conventions.md: the positive trefoil has s = 2). */
export const SValues = z.object({ Q: z.int(), F2: z.int() });
export type SValues = z.infer<typeof SValues>;

/** A bands run's certificate (shared/knot/bands/certificate.ts): no crossing limit on the unlink check. */
export const BandsResultJson = z.object({
  after: z.object({ pd: PdCode, unknots: z.int().min(0), components: z.int().min(0) }),
  components: z.int().min(0),
  bands: z.int().min(0),
  // 'too-large' never: the run checks at any size.
  unlink: z.enum(['crossingless', 'khovanov', 'none', 'too-large']),
  chi: z.int(),
  genusBound: z.int().nullable(),
  ribbon: z.boolean(),
});
export type BandsResultJson = z.infer<typeof BandsResultJson>;

/** What a finished Khovanov run stores: the engine's result as JSON (a bands run: of the diagram after the bands). */
export const KhResultJson = z.object({
  ring: z.string(),
  reduced: z.boolean(),
  /** Reduced: the marked component, from 0 (results stored before it was recorded: always 0). */
  component: z.int().min(0).optional(),
  groups: z.array(KhGroupJson),
  poincare: z.array(z.tuple([z.int(), z.int(), z.int()])),
  poincareText: z.string(),
  euler: z
    .object({
      computed: z.array(z.tuple([z.number(), z.string()])),
      expected: z.array(z.tuple([z.number(), z.string()])),
      ok: z.boolean(),
    })
    .optional(),
  width: z.number(),
  thin: z.boolean(),
  /** The program version that computed it (results stored before it was recorded have none). */
  version: z.string().optional(),
  /** When the run was asked to compute s (a knot). */
  s: SValues.optional(),
  /** A bands run: the certificate; the groups above are those of the diagram after the bands. */
  bands: BandsResultJson.optional(),
});
export type KhResultJson = z.infer<typeof KhResultJson>;

export const RunProgress = z.object({
  /** 0..1: crossings merged (a sweep: finished sub-runs plus the running ones' fractions). */
  fraction: z.number().min(0).max(1),
  /** Objects of the current complex (its size), 0 before the first step. */
  objects: z.int().min(0),
});
export type RunProgress = z.infer<typeof RunProgress>;

/** A sub-run's cable: (r+, r-) per component. */
export const CableCell = z.array(z.tuple([z.int(), z.int()]));
export type CableCell = z.infer<typeof CableCell>;

const IsoTime = z.string();

export const RunSummary = z.object({
  id: z.string(),
  kind: RunKind,
  status: RunStatus,
  label: z.string(),
  sketchId: z.string().nullable(),
  groupId: z.string().nullable(),
  crossings: z.int(),
  ring: z.string(),
  reduced: z.boolean(),
  progress: RunProgress,
  error: z.string().nullable(),
  createdAt: IsoTime,
  startedAt: IsoTime.nullable(),
  finishedAt: IsoTime.nullable(),
  startedBy: z.object({ id: z.string(), displayName: z.string() }),
  parentRunId: z.string().nullable(),
  /** The run whose stored result this one reused (same diagram up to relabelling, ring, reduced). */
  reusedFrom: z.string().nullable(),
  cable: CableCell.nullable(),
  sweep: CableSweep.nullable(),
  /** The text the diagram came from (a sweep cell: its sweep's), or null (a sketch's diagram). */
  source: RunSource.nullable(),
  /** Asked to compute s as well (the result then carries it). */
  computeS: z.boolean(),
  /** Who computed it (host and process), once a worker took it; null for reused and queued runs. */
  worker: z.string().nullable(),
});
export type RunSummary = z.infer<typeof RunSummary>;

export const RunDetail = RunSummary.extend({
  diagram: RunDiagram,
  result: KhResultJson.nullable(),
  /** A cable sweep's sub-runs, one per cell, in grid order. */
  children: z.array(RunSummary.extend({ result: KhResultJson.nullable() })),
});
export type RunDetail = z.infer<typeof RunDetail>;

export const RunList = z.array(RunSummary);
