// The rules of runs: who may start, read and cancel them, what a request is checked against,
// and when a stored result is reused instead of computing again.
import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import type { Role } from '@/shared/api/groups';
import { isFinished, type CableCell, type RunDetail, type RunDiagram, type RunSummary, type StartRunParsed } from '@/shared/api/runs';
import { pdToText } from '@/shared/text/codes';
import { componentCount, diagram, type Diagram } from '@/shared/knot/diagram';
import { canSee } from '@/sync/scope';
import { Run } from '../db/entities';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { requireMember } from '../groups/access';
import { AppError, forbidden, notFound } from '../http/errors';
import { findSketch } from '../sketches/repository';
import { viewerOf } from '../sync/repository';
import { cableCrossings, compareCells, sweepCells, sweepSize } from './cables';
import { afterChange, finishRun, refreshSweep } from './lifecycle';
import { childrenOf, countLive, displayNames, findReusable, findRun, insertRun, listTopLevel, updateIf } from './repository';
import { schedulerOf } from './scheduler';

type Start = StartRunParsed;

const noSuchRun = () => notFound('No such run, or it is not shared with you');
const viewersCannot = () => forbidden('Viewers can read runs but not start or cancel them');
const badDiagram = (message: string) => new AppError('invalid_input', 400, message, { diagram: message });

function checked(d: RunDiagram): Diagram {
  if (d.pd.length === 0 && d.unknots === 0) throw badDiagram('The diagram is empty (no crossings, no unknots): draw or paste a link first');
  try {
    return diagram(d.pd, { unknots: d.unknots, framings: d.framings });
  } catch (err) {
    throw badDiagram(err instanceof Error ? err.message : 'The diagram is not valid');
  }
}

/** The diagram and group a request runs on, after the role checks. */
async function target(deps: Deps, user: User, req: Start): Promise<{ diagram: RunDiagram; groupId: string | null; sketchId: string | null; label: string; source: string | null }> {
  if (req.sketchId !== undefined) {
    const viewer = await viewerOf(deps.db, user.id);
    const s = await findSketch(deps.db, req.sketchId);
    if (!s || s.deleted || !canSee(viewer, s)) throw notFound('No such sketch, or it is not shared with you');
    if (s.ownerId !== user.id && viewer.groups.get(s.groupId!) === 'viewer') throw viewersCannot();
    const { pd, unknots, framings } = req.diagram ?? s.diagram;
    return { diagram: { pd, unknots, framings, bands: req.diagram?.bands }, groupId: s.groupId, sketchId: s.id, label: req.label || s.title || 'Untitled sketch', source: req.diagram ? (req.source ?? null) : null };
  }
  if (req.groupId !== undefined) {
    const role: Role = await requireMember(deps.db, req.groupId, user.id);
    if (role === 'viewer') throw viewersCannot();
  }
  const d = req.diagram!;
  return { diagram: { pd: d.pd, unknots: d.unknots ?? 0, framings: d.framings, bands: d.bands }, groupId: req.groupId ?? null, sketchId: null, label: req.label || `PD code, ${d.pd.length} crossings`, source: req.source ?? null };
}

interface NewRun {
  kind: Run['kind'];
  diagram: RunDiagram;
  label: string;
  source: string | null;
  sketchId: string | null;
  groupId: string | null;
  ring: string;
  reduced: boolean;
  computeS: boolean;
  parentRunId?: string;
  cable?: CableCell;
  sweep?: Run['sweep'];
  /** Place in the starter's line (Run.turn); a sweep's cells take consecutive turns. */
  turn?: number;
}

function row(deps: Deps, user: User, n: NewRun, key: string): Run {
  return Object.assign(new Run(), {
    id: randomUUID(),
    kind: n.kind,
    status: 'queued',
    label: n.label.slice(0, 120),
    sketchId: n.sketchId,
    groupId: n.groupId,
    startedBy: user.id,
    parentRunId: n.parentRunId ?? null,
    diagram: n.diagram,
    diagramKey: key,
    source: n.source,
    crossings: n.diagram.pd.length,
    ring: n.ring,
    reduced: n.reduced,
    computeS: n.computeS,
    sweep: n.sweep ?? null,
    cable: n.cable ?? null,
    progress: 0,
    complexSize: 0,
    result: null,
    error: null,
    reusedFrom: null,
    turn: n.turn ?? 1,
    worker: null,
    createdAt: deps.now().toISOString(),
    startedAt: null,
    finishedAt: null,
  } satisfies Run);
}

interface Planned {
  run: Run;
  settle: () => Promise<unknown>;
}

const overLimit = (what: string, crossings: number, max: number, fix = '') =>
  badDiagram(`${what} has ${crossings} crossings; this server computes at most ${max} per run.${fix}`);

/**
 * The fair-share quota: a person may have at most maxLivePerUser computations queued or running
 * (a sweep's cells count, checked on its size before any cable is built). Answers how many they
 * have, which also gives the turn of the next.
 */
async function withinQuota(deps: Deps, user: User, wanted: number): Promise<number> {
  const live = await countLive(deps.db, user.id);
  const max = deps.config.runs.maxLivePerUser;
  if (live + wanted > max) {
    const have = `${live} run${live === 1 ? '' : 's'} queued or running`;
    const what = wanted === 1 ? `You have ${have}` : `This sweep has ${wanted} cables and you have ${have}`;
    throw new AppError('run_quota', 429, `${what}; this server allows each person at most ${max} at once (sweep cells count). Wait for some to finish, or cancel some.`);
  }
  return live;
}

/**
 * A Khovanov computation's row (its diagram within the crossing limit, `key` its diagramKey),
 * and how it ends at once when it does: reused when a stored result fits; otherwise it stays
 * queued. Rows are inserted before any of them ends, so a sweep never sees some of its cells
 * missing.
 */
async function planComputation(deps: Deps, user: User, n: NewRun, key: string): Promise<Planned> {
  const run = row(deps, user, n, key);
  // A bands run's answer depends on its bands as well: it is never reused.
  const stored = n.kind === 'khovanov' ? await findReusable(deps.db, key, n.ring, n.reduced, n.computeS) : null;
  if (!stored) return { run, settle: async () => undefined };
  Object.assign(run, { status: 'running', startedAt: run.createdAt, reusedFrom: stored.reusedFrom ?? stored.id });
  return { run, settle: () => finishRun(deps, run.id, { status: 'done', result: stored.result! }) };
}

export async function startRun(deps: Deps, user: User, req: Start): Promise<RunDetail> {
  const t = await target(deps, user, req);
  const d = checked(t.diagram);
  const max = deps.config.runs.maxCrossings;
  // A cheap fact, checked before any work.
  if (req.computeS && componentCount(d) !== 1) {
    throw new AppError('invalid_input', 400, `s is defined for knots here; this link has ${componentCount(d)} components`, { computeS: 's is defined for knots here' });
  }
  const base = { ...t, ring: req.ring, reduced: req.reduced, computeS: req.computeS };
  let id: string;
  let queued: Run[];
  if (req.kind === 'khovanov' || req.kind === 'bands') {
    // Bands never add crossings (a band move exchanges two labels), so the diagram's count bounds the check's.
    if (d.pd.length > max) throw overLimit('The diagram', d.pd.length, max);
    const live = await withinQuota(deps, user, 1);
    if (req.kind === 'bands') await checkBands(deps, t.diagram);
    const key = await deps.jobs.run('runKey', { diagram: t.diagram, reduced: req.reduced });
    const { run, settle } = await planComputation(deps, user, { ...base, kind: req.kind, turn: live + 1 }, key);
    await insertRun(deps.db, run);
    await settle();
    [id, queued] = [run.id, [run]];
  } else {
    ({ id, queued } = await startSweep(deps, user, { ...base, kind: 'cable-sweep', sweep: req.sweep! }, d));
  }
  schedulerOf(deps).submit(queued.filter((r) => r.status === 'queued'));
  return getRun(deps, user, id);
}

/** A bands run's bands: labels of the code first (cheap), then the band moves in the job pool. */
async function checkBands(deps: Deps, d: RunDiagram): Promise<void> {
  const labels = new Set(d.pd.flat());
  const missing = d.bands!.flat().find((l) => !labels.has(l));
  const problem = missing !== undefined ? `there is no edge ${missing} in the PD code` : await deps.jobs.run('bandsProblem', d);
  if (problem) throw new AppError('invalid_input', 400, `The bands cannot be applied: ${problem}`, { bands: problem });
}

/**
 * A sweep: the cell count and every cable's crossing count (cableCrossings, from the base
 * diagram alone) are checked before anything is built; the cables and their keys are built in
 * the job pool; the sweep and its cells are inserted in one transaction.
 */
async function startSweep(deps: Deps, user: User, n: NewRun, d: Diagram): Promise<{ id: string; queued: Run[] }> {
  const components = componentCount(d);
  const { maxStrands } = n.sweep!;
  const size = sweepSize(components, maxStrands);
  const { maxSweepCells: maxCells, maxCrossings: max } = deps.config.runs;
  if (size > maxCells) {
    throw new AppError('invalid_input', 400, `A sweep up to ${maxStrands} strands per component of ${components === 1 ? 'a knot' : `a ${components}-component link`} has ${size} cables; this server allows at most ${maxCells}. Lower maxStrands.`, { sweep: `At most ${maxCells} cables` });
  }
  const live = await withinQuota(deps, user, size);
  const cells = sweepCells(components, maxStrands);
  const nameOf = (cell: CableCell) => `(${cell.map(([p, m]) => `${p},${m}`).join(' | ')})`;
  for (const cell of cells) {
    const crossings = cableCrossings(d, cell);
    if (crossings > max) throw overLimit(`The ${nameOf(cell)} cable`, crossings, max, ' Lower maxStrands, or the framing (each full twist of r strands adds r(r-1) crossings).');
  }
  const cables = await deps.jobs.run('cables', { diagram: d, cells, reduced: n.reduced });
  const sweep = row(deps, user, n, await deps.jobs.run('runKey', { diagram: n.diagram, reduced: false }));
  Object.assign(sweep, { status: 'running', startedAt: sweep.createdAt });
  const planned: Planned[] = [];
  for (const [k, cell] of cells.entries()) {
    const { key, ...diagram } = cables[k];
    // A cell's input is its cable, so its source names the cable and what it was taken of.
    const source = `${nameOf(cell)} cable of ${n.source ?? `PD ${pdToText(n.diagram.pd)}`}`;
    planned.push(await planComputation(deps, user, { ...n, kind: 'khovanov', sweep: null, label: `${n.label} ${nameOf(cell)}`, source, diagram, parentRunId: sweep.id, cable: cell, turn: live + k + 1 }, key));
  }
  await inTransaction(deps.db, async (m) => {
    await insertRun(m, sweep);
    for (const { run } of planned) await insertRun(m, run);
  });
  for (const { settle } of planned) await settle();
  await refreshSweep(deps, sweep.id);
  return { id: sweep.id, queued: planned.map((p) => p.run) };
}

async function visibleRun(deps: Deps, user: User, id: string): Promise<Run> {
  const run = await findRun(deps.db, id);
  if (!run) throw noSuchRun();
  const viewer = await viewerOf(deps.db, user.id);
  if (!canSee(viewer, { ownerId: run.startedBy, groupId: run.groupId })) throw noSuchRun();
  return run;
}

function summary(r: Run, names: Map<string, string>): RunSummary {
  return {
    id: r.id,
    kind: r.kind,
    status: r.status,
    label: r.label,
    sketchId: r.sketchId,
    groupId: r.groupId,
    crossings: r.crossings,
    ring: r.ring,
    reduced: r.reduced,
    computeS: r.computeS,
    progress: { fraction: r.progress, objects: r.complexSize },
    error: r.error,
    createdAt: r.createdAt,
    startedAt: r.startedAt,
    finishedAt: r.finishedAt,
    startedBy: { id: r.startedBy, displayName: names.get(r.startedBy) ?? 'Former member' },
    parentRunId: r.parentRunId,
    reusedFrom: r.reusedFrom,
    cable: r.cable,
    sweep: r.sweep,
    source: r.source,
    worker: r.worker,
  };
}

export async function getRun(deps: Deps, user: User, id: string): Promise<RunDetail> {
  const run = await visibleRun(deps, user, id);
  const children = run.kind === 'cable-sweep' ? (await childrenOf(deps.db, run.id)).sort((a, b) => compareCells(a.cable!, b.cable!)) : [];
  const names = await displayNames(deps.db, [run.startedBy]);
  return {
    ...summary(run, names),
    diagram: run.diagram,
    result: run.result,
    children: children.map((c) => ({ ...summary(c, names), result: c.result })),
  };
}

export async function listRuns(deps: Deps, user: User, q: { mine?: string; sketchId?: string; groupId?: string }): Promise<RunSummary[]> {
  let rows: Run[];
  if (q.groupId !== undefined) {
    await requireMember(deps.db, q.groupId, user.id);
    rows = await listTopLevel(deps.db, { groupId: q.groupId });
  } else if (q.sketchId !== undefined) {
    const viewer = await viewerOf(deps.db, user.id);
    rows = (await listTopLevel(deps.db, { sketchId: q.sketchId })).filter((r) => canSee(viewer, { ownerId: r.startedBy, groupId: r.groupId }));
  } else {
    rows = await listTopLevel(deps.db, { startedBy: user.id });
  }
  const names = await displayNames(deps.db, rows.map((r) => r.startedBy));
  return rows.map((r) => summary(r, names));
}

/** The starter, or a member and above of the run's group, may cancel; a sweep cancels its cells. */
export async function cancelRun(deps: Deps, user: User, id: string): Promise<RunDetail> {
  const run = await visibleRun(deps, user, id);
  if (run.startedBy !== user.id) {
    const viewer = await viewerOf(deps.db, user.id);
    if (viewer.groups.get(run.groupId!) === 'viewer') throw viewersCannot();
  }
  const ended = () => new AppError('run_finished', 409, `The run has already ended (${run.status}); there is nothing to cancel`);
  if (isFinished(run.status)) throw ended();
  const cells = run.kind === 'cable-sweep' ? (await childrenOf(deps.db, run.id)).filter((c) => !isFinished(c.status)) : [];
  const cancelled = { status: 'cancelled' as const, finishedAt: deps.now().toISOString(), error: `Cancelled by ${user.displayName}` };
  if (!(await updateIf(deps.db, run.id, ['queued', 'running'], cancelled))) throw ended();
  const scheduler = schedulerOf(deps);
  scheduler.cancel(run.id);
  for (const c of cells) if (await updateIf(deps.db, c.id, ['queued', 'running'], cancelled)) scheduler.cancel(c.id);
  await afterChange(deps, run.id);
  return getRun(deps, user, id);
}
