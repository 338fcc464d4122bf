// What a run is started on and how it may end: the empty diagram is refused with a reason, the
// diagram the device shows is what is computed, a result failing the engine's self-check fails
// the run, and one set of diagram limits holds for the API, sync and the command line.
import { randomUUID } from 'node:crypto';
import { RunDiagram } from '@/shared/api/runs';
import { Diagram, diagramLimits } from '@/shared/api/sketches';
import { Request } from '@/server/cli/requests';
import { Run } from '@/server/db/entities';
import { finishRun } from '@/server/runs/lifecycle';
import { defaultRunLimits } from '@/server/runs/limits';
import type { RunningServer } from '@/server/server';
import { signUp, testServer } from './helpers';
import { sketchOf } from './feed-fixtures';
import { ended, read, start, trefoil, waitFor } from './runs-fixtures';

let server: RunningServer;
beforeAll(async () => {
  server = await testServer({ config: { runs: { ...defaultRunLimits(), threads: 1 } } });
});
afterAll(() => server.stop());

async function account() {
  const a = await signUp(server);
  return { token: a.token, id: a.user.id, name: a.user.displayName };
}

describe('starting a run', () => {
  it('refuses the empty diagram (no crossings, no unknots) with a reason, pasted or as a sketch', async () => {
    const me = await account();
    const pasted = await start(server, me.token, { diagram: { pd: [], unknots: 0 } });
    expect(pasted.status).toBe(400);
    expect(pasted.body.error.message).toMatch(/empty/);
    const sketchId = await sketchOf(server, me, { diagram: { pd: [], unknots: 0, framings: [], strokes: [] } });
    const onSketch = await start(server, me.token, { sketchId });
    expect(onSketch.status).toBe(400);
    expect(onSketch.body.error.message).toMatch(/empty/);
  });

  it('on a sketch with the diagram the device shows: computes and stores that diagram, not the older copy', async () => {
    const me = await account();
    // The server's copy is still empty; the device has drawn a trefoil since.
    const sketchId = await sketchOf(server, me, { title: 'Fresh drawing', diagram: { pd: [], unknots: 0, framings: [], strokes: [] } });
    const res = await start(server, me.token, { sketchId, diagram: { pd: trefoil() } });
    expect(res.status).toBe(201);
    const run = await waitFor(server, me.token, res.body.id, ended);
    expect(run).toMatchObject({ status: 'done', sketchId, label: 'Fresh drawing', crossings: 3 });
    expect(run.diagram.pd).toEqual(trefoil());
    // Kh of the positive trefoil has free rank 4 over Z (Bar-Natan 2002, math/0201043, its table).
    expect(run.result!.groups.reduce((n, g) => n + g.free, 0)).toBe(4);
  });
});

describe('the self-check', () => {
  it('fails a run whose homology disagrees with the Jones polynomial, keeping no result', async () => {
    const me = await account();
    const { body } = await start(server, me.token, { diagram: { pd: trefoil() } });
    const done = await waitFor(server, me.token, body.id, ended);
    // The same row ending again with a tampered result: the Euler check says it is wrong.
    const id = randomUUID();
    const row = await server.deps.db.getRepository(Run).findOneByOrFail({ id: body.id });
    await server.deps.db.getRepository(Run).insert({ ...row, id, status: 'running', result: null, finishedAt: null, diagramKey: `tampered-${id}` });
    const wrong = { ...done.result!, euler: { ...done.result!.euler!, ok: false } };
    expect(await finishRun(server.deps, id, { status: 'done', result: wrong })).toBe(true);
    const failed = await read(server, me.token, id);
    expect(failed).toMatchObject({ status: 'failed', result: null });
    expect(failed.error).toMatch(/self-check/);
  });
});

describe('one set of diagram limits', () => {
  const at = diagramLimits.unknots;
  const stored = (unknots: number) => Diagram.safeParse({ pd: [], unknots, framings: [], strokes: [] }).success;
  const run = (unknots: number) => RunDiagram.safeParse({ pd: [], unknots }).success;
  const cli = (unknots: number) => Request.safeParse({ pd: [], unknots }).success;

  it('sync, the API and the command line accept the same number of unknots and refuse one more', () => {
    expect([stored(at), run(at), cli(at)]).toEqual([true, true, true]);
    expect([stored(at + 1), run(at + 1), cli(at + 1)]).toEqual([false, false, false]);
  });

  it('and the same framing bound', () => {
    const f = diagramLimits.framing;
    const framed = (framing: number) => [
      Diagram.safeParse({ pd: [], unknots: 1, framings: [framing], strokes: [] }).success,
      RunDiagram.safeParse({ pd: [], unknots: 1, framings: [framing] }).success,
      Request.safeParse({ cable: { of: { pd: [], unknots: 1, framings: [framing] }, rPlus: 2, rMinus: 0 } }).success,
    ];
    expect(framed(-f)).toEqual([true, true, true]);
    expect(framed(f + 1)).toEqual([false, false, false]);
  });
});
