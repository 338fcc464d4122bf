// Heavy runs on the server: lifecycle (queue, progress, cancel, limits, restart), reuse of
// stored results, the finished-run e-mail, and who may start, read and cancel.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { threadId } from 'node:worker_threads';
import request from 'supertest';
import { RunList } from '@/shared/api/runs';
import { fromBraid } from '@/shared/knot/braid';
import { mirror } from '@/shared/knot/families';
import { createRunPool } from '@/server/runs/pool';
import { defaultRunLimits, type RunLimits } from '@/server/runs/limits';
import type { RunningServer } from '@/server/server';
import { bearer, groupWith, signUp, testServer } from './helpers';
import { pdToText } from '@/shared/text/codes';
import { TREFOIL_Z, ended, mailFor, read, slow, start, torus, trefoil, waitFor } from './runs-fixtures';

const limits = (l: Partial<RunLimits>): RunLimits => ({ ...defaultRunLimits(), threads: 1, progressEveryMs: 20, ...l });

let server: RunningServer | undefined;
afterEach(async () => {
  await server?.stop();
  server = undefined;
});

describe('the worker pool', () => {
  it('computes in a worker thread (the .mjs shim loads the TypeScript worker under tsx)', async () => {
    const pool = createRunPool(limits({}));
    const seen: number[] = [];
    try {
      const out = await pool.run({ diagram: { pd: trefoil(), unknots: 0 }, ring: 'Z', reduced: false, computeS: false, onProgress: (p) => seen.push(p.fraction), signal: new AbortController().signal });
      expect(out.threadId).not.toBe(threadId);
      expect(out.threadId).toBeGreaterThan(0);
      expect(out.result.groups).toEqual(TREFOIL_Z);
      expect(seen.at(-1)).toBe(1);
    } finally {
      await pool.destroy();
    }
  });
});

describe('a run from start to end', () => {
  it('is queued, computed, stored, and its starter is mailed a link to the result', async () => {
    server = await testServer({ config: { runs: limits({}) } });
    const { token, user } = await signUp(server, 'Runner Rae');
    const res = await start(server, token, { diagram: { pd: trefoil() }, ring: 'Z', label: 'braid 1 1 1', source: 'braid 1 1 1' });
    expect(res.status).toBe(201);
    expect(['queued', 'running', 'done']).toContain(res.body.status);
    const run = await waitFor(server, token, res.body.id, ended);
    expect(run).toMatchObject({ status: 'done', kind: 'khovanov', ring: 'Z', reduced: false, crossings: 3, label: 'braid 1 1 1', source: 'braid 1 1 1', error: null, reusedFrom: null });
    expect(run.progress.fraction).toBe(1);
    expect(run.result!.groups).toEqual(TREFOIL_Z);
    expect(run.result!.euler!.ok).toBe(true);
    expect(run.startedAt! <= run.finishedAt!).toBe(true);
    expect(run.startedBy).toEqual({ id: user.id, displayName: 'Runner Rae' });

    // The mail names the diagram and ring, gives the full input and, over Z, the torsion:
    // Z/2 at (3, 7) for T(2,3), the positive trefoil (Bar-Natan 2002, math/0201043).
    const mail = await mailFor(server, (m) => m.to.includes(user.email));
    expect(mail.subject).toBe('Run succeeded: "braid 1 1 1", Khovanov homology over Z');
    expect(mail.text).toContain('Given as: braid 1 1 1');
    expect(mail.text).toContain(`PD code: ${pdToText(trefoil())}`);
    expect(mail.text).toContain('Torsion: Z/2 at (3, 7)');
    expect(mail.text).toContain(`Poincaré polynomial: ${run.result!.poincareText}`);
    expect(mail.text).toContain(`${server.deps.config.publicUrl}/runs/${run.id}`);

    const mine = RunList.parse((await request(server.url).get('/api/runs?mine=1').set(bearer(token))).body);
    expect(mine.map((r) => r.id)).toEqual([run.id]);
  });

  it('rejects an invalid PD code with the reason', async () => {
    server = await testServer({ config: { runs: limits({}) } });
    const { token } = await signUp(server);
    const res = await start(server, token, { diagram: { pd: [[1, 2, 3, 4]] } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/label 1 appears 1 time/);
  });
});

describe('the queue', () => {
  it('runs one at a time on one thread, reports progress, keeps the API answering, and cancels', async () => {
    server = await testServer({ config: { runs: limits({}) } });
    const { token, user } = await signUp(server);
    const a = (await start(server, token, { diagram: { pd: slow() }, ring: 'Q' })).body;
    const b = (await start(server, token, { diagram: { pd: torus(2, 5) }, ring: 'Z' })).body;
    const running = await waitFor(server, token, a.id, (r) => r.status === 'running' && r.progress.fraction > 0);
    expect(running.progress.fraction).toBeLessThan(1);
    expect(running.progress.objects).toBeGreaterThan(0);
    expect((await read(server, token, b.id)).status).toBe('queued');

    // The computation is in another thread: the API answers while the run is still running
    // (were it on the request thread, the answer would wait until the run had ended).
    await request(server.url).get('/api/health').expect(200);
    expect((await read(server, token, a.id)).status).toBe('running');

    const cancelled = await request(server.url).post(`/api/runs/${a.id}/cancel`).set(bearer(token));
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe('cancelled');
    const second = await waitFor(server, token, b.id, ended);
    expect(second.status).toBe('done');
    expect((await read(server, token, a.id)).status).toBe('cancelled');
    const again = await request(server.url).post(`/api/runs/${a.id}/cancel`).set(bearer(token));
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('run_finished');
    const mail = await mailFor(server, (m) => m.to.includes(user.email) && /cancelled/.test(m.subject));
    expect(mail.text).toContain(`/runs/${a.id}`);
  }, 60_000);
});

describe('limits', () => {
  it('refuses a diagram over the crossing limit', async () => {
    server = await testServer({ config: { runs: limits({ maxCrossings: 5 }) } });
    const { token } = await signUp(server);
    const res = await start(server, token, { diagram: { pd: torus(2, 7) } });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('The diagram has 7 crossings; this server computes at most 5 per run.');
  });

  it('fails a run that runs past the time limit', async () => {
    server = await testServer({ config: { runs: limits({ maxWallMs: 1500 }) } });
    const { token } = await signUp(server);
    const { id } = (await start(server, token, { diagram: { pd: slow() }, ring: 'Q' })).body;
    const run = await waitFor(server, token, id, ended);
    expect(run.status).toBe('failed');
    expect(run.error).toMatch(/^Stopped after the time limit of 1.5 s per run/);
  });

  it('fails a run that needs more memory than the limit', async () => {
    server = await testServer({ config: { runs: limits({ maxMemoryMb: 48 }) } });
    const { token } = await signUp(server);
    const { id } = (await start(server, token, { diagram: { pd: slow() }, ring: 'Z' })).body;
    const run = await waitFor(server, token, id, ended, 100_000);
    expect(run.status).toBe('failed');
    expect(run.error).toBe('Ran out of memory: the computation needed more than the limit of 48 MB per run.');
  }, 120_000);

  it('refuses runs past the per-person quota with a 429 that says why, sweeps counting their cells, others unaffected', async () => {
    server = await testServer({ config: { runs: limits({ maxLivePerUser: 2 }) } });
    const a = await signUp(server, 'Quota Quin');
    const b = await signUp(server, 'Other Oz');
    const first = (await start(server, a.token, { diagram: { pd: slow() }, ring: 'Q' })).body.id;
    expect((await start(server, a.token, { diagram: { pd: slow() }, ring: 'Q' })).status).toBe(201);
    const third = await start(server, a.token, { diagram: { pd: trefoil() } });
    expect(third.status).toBe(429);
    expect(third.body.error).toEqual({
      code: 'run_quota',
      message: 'You have 2 runs queued or running; this server allows each person at most 2 at once (sweep cells count). Wait for some to finish, or cancel some.',
    });
    expect((await start(server, b.token, { kind: 'cable-sweep', diagram: { pd: trefoil() }, sweep: { maxStrands: 1 } })).status).toBe(201);
    const sweep = await start(server, b.token, { kind: 'cable-sweep', diagram: { pd: trefoil() }, sweep: { maxStrands: 2 } });
    expect(sweep.status).toBe(429);
    expect(sweep.body.error.message).toMatch(/^This sweep has 5 cables and you have 2 runs queued or running;/);

    await request(server.url).post(`/api/runs/${first}/cancel`).set(bearer(a.token));
    expect((await start(server, a.token, { diagram: { pd: trefoil() } })).status).toBe(201);
  });
});

describe('a restart', () => {
  let dir: string;
  beforeEach(() => {
    dir = mkdtempSync(join(tmpdir(), 'overstrand-runs-'));
  });
  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it('picks up interrupted and queued runs again', async () => {
    const dbPath = join(dir, 'runs.sqlite');
    const first = await testServer({ dbPath, config: { runs: limits({}) } });
    const { token } = await signUp(first);
    const a = (await start(first, token, { diagram: { pd: torus(6, 7) }, ring: 'Q' })).body;
    const b = (await start(first, token, { diagram: { pd: torus(2, 5) } })).body;
    await waitFor(first, token, a.id, (r) => r.status === 'running');
    await first.stop();

    server = await testServer({ dbPath, config: { runs: limits({}) } });
    const [ra, rb] = [await waitFor(server, token, a.id, ended, 120_000), await waitFor(server, token, b.id, ended)];
    expect([ra.status, rb.status]).toEqual(['done', 'done']);
    // T(6,7) is a positive braid knot: Kh^{0,*} is Z at j = s - 1 and s + 1 (from memory: a
    // result of Stosic on positive braid knots) with s = (p-1)(q-1) = 30, Rasmussen's invariant
    // of the torus knot (Rasmussen, "Khovanov homology and the slice genus", 2004, math/0402131).
    expect(ra.result!.groups.filter((g) => g.i === 0)).toEqual([
      { i: 0, j: 29, free: 1, torsion: [] },
      { i: 0, j: 31, free: 1, torsion: [] },
    ]);
  }, 180_000);
});

describe('reuse of stored results', () => {
  /** The same diagram: labels renamed by a bijection and crossings listed in another order. */
  const relabelled = (pd: number[][]) => {
    const labels = [...new Set(pd.flat())];
    const rename = new Map(labels.map((l, k) => [l, 100 + ((k * 7) % labels.length) * 3]));
    return pd.map((x) => x.map((l) => rename.get(l)!) as [number, number, number, number]).reverse();
  };

  it('answers an identical request at once, up to relabelling, and only for the same ring and reduced flag', async () => {
    server = await testServer({ config: { runs: limits({}) } });
    const { token } = await signUp(server);
    const first = await waitFor(server, token, (await start(server, token, { diagram: { pd: trefoil() } })).body.id, ended);
    const again = (await start(server, token, { diagram: { pd: relabelled(trefoil()) } })).body;
    expect(again).toMatchObject({ status: 'done', reusedFrom: first.id });
    expect(again.result.groups).toEqual(TREFOIL_Z);

    for (const other of [
      { diagram: { pd: trefoil() }, ring: 'Q' },
      { diagram: { pd: trefoil() }, reduced: true },
      { diagram: { pd: mirror(fromBraid([1, 1, 1])).pd.map((x) => [...x] as [number, number, number, number]) } },
    ]) {
      const res = (await start(server, token, other)).body;
      expect(res.reusedFrom).toBeNull();
      expect((await waitFor(server, token, res.id, ended)).status).toBe('done');
    }
  });
});

describe('a cable sweep', () => {
  it('computes every cell as a sub-run, with overall progress and a mail at the end', async () => {
    server = await testServer({ config: { runs: limits({}) } });
    const { token, user } = await signUp(server);
    // Computed first, so the (1,0) cell reuses it at once: the sweep must still wait for the rest.
    await waitFor(server, token, (await start(server, token, { diagram: { pd: trefoil() } })).body.id, ended);
    const res = await start(server, token, { kind: 'cable-sweep', diagram: { pd: trefoil() }, sweep: { maxStrands: 2 }, label: 'trefoil' });
    expect(res.body.status).toBe('running');
    expect(res.status).toBe(201);
    const sweep = await waitFor(server, token, res.body.id, ended, 60_000);
    expect(sweep).toMatchObject({ kind: 'cable-sweep', status: 'done', result: null, error: null });
    expect(sweep.progress.fraction).toBe(1);
    expect(sweep.children.map((c) => c.cable)).toEqual([[[1, 0]], [[0, 1]], [[2, 0]], [[1, 1]], [[0, 2]]]);
    for (const cell of sweep.children) {
      expect(cell).toMatchObject({ status: 'done', parentRunId: sweep.id });
      expect(cell.result!.euler!.ok).toBe(true); // (q + q^-1) V, Bar-Natan 2002 (math/0201043)
    }
    // The (1,0)-cable in the blackboard framing is the knot itself, and reversing a knot does not
    // change Kh (Khovanov 2000, math/9908171: Kh is an invariant of oriented links; a knot's
    // orientation reversal is a global reversal, which Kh does not see).
    expect(sweep.children[0].result!.groups).toEqual(TREFOIL_Z);
    expect(sweep.children[1].result!.groups).toEqual(TREFOIL_Z);
    // The 2-cable (12 crossings: each crossing becomes 2 x 2) has two components, so its
    // rational Kh (= free ranks over Z) has rank >= 2^2 (Lee, "An endomorphism of the Khovanov
    // invariant", 2005, math/0210213).
    expect(sweep.children[2].crossings).toBe(12);
    expect(sweep.children[2].result!.groups.reduce((s, g) => s + g.free, 0)).toBeGreaterThanOrEqual(4);
    const mails = server.mailbox!.list().filter((m) => m.to.includes(user.email));
    await mailFor(server, (m) => m.to.includes(user.email) && m.text.includes(`/runs/${sweep.id}`));
    expect(mails.every((m) => !m.text.includes(`/runs/${sweep.children[0].id}`))).toBe(true); // one mail per sweep, none per cell
    expect(sweep.children[0].reusedFrom).not.toBeNull();
    const listed = RunList.parse((await request(server.url).get('/api/runs?mine=1').set(bearer(token))).body);
    expect(listed.map((r) => r.kind)).toEqual(['cable-sweep', 'khovanov']); // cells are not listed
  }, 90_000);

  it('cancels with all its unfinished cells', async () => {
    server = await testServer({ config: { runs: limits({}) } });
    const { token, user } = await signUp(server);
    const { id } = (await start(server, token, { kind: 'cable-sweep', diagram: { pd: torus(3, 4) }, ring: 'Q', sweep: { maxStrands: 3 } })).body;
    const res = await request(server.url).post(`/api/runs/${id}/cancel`).set(bearer(token));
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('cancelled');
    const sweep = await read(server, token, id);
    expect(sweep.children.length).toBe(9);
    expect(sweep.children.every((c) => c.status === 'cancelled' || c.status === 'done')).toBe(true);
    expect(sweep.children.some((c) => c.status === 'cancelled')).toBe(true);
    await mailFor(server, (m) => m.to.includes(user.email) && m.text.includes(`/runs/${id}`) && /cancelled/.test(m.subject));
  });

  it('sweeps every component of a link, and refuses sweeps over the cell limit', async () => {
    server = await testServer({ config: { runs: limits({ maxSweepCells: 5 }) } });
    const { token } = await signUp(server);
    const hopf = torus(2, 2);
    const direct = await waitFor(server, token, (await start(server, token, { diagram: { pd: hopf } })).body.id, ended);
    const res = await start(server, token, { kind: 'cable-sweep', diagram: { pd: hopf }, sweep: { maxStrands: 1 } });
    expect(res.status).toBe(201);
    const sweep = await waitFor(server, token, res.body.id, ended, 60_000);
    expect(sweep.status).toBe('done');
    expect(sweep.children.map((c) => c.cable)).toEqual([[[1, 0], [1, 0]], [[1, 0], [0, 1]], [[0, 1], [1, 0]], [[0, 1], [0, 1]]]);
    for (const cell of sweep.children) {
      expect(cell.crossings).toBe(2);
      expect(cell.result!.euler!.ok).toBe(true); // (q + q^-1) V, Bar-Natan 2002 (math/0201043)
    }
    // (1,0) on both components is the link itself; reversing both is a global reversal, which Kh
    // does not see (from memory; Khovanov 2000, math/9908171, defines Kh for oriented links
    // through crossing signs, which a global reversal keeps).
    expect(sweep.children[0].reusedFrom).toBe(direct.id);
    expect(sweep.children[3].result!.groups).toEqual(direct.result!.groups);
    // Reversing one component of the Hopf link changes the linking number, hence the Jones
    // polynomial and Kh (from memory: Lickorish 1997, ch. 3, V changes by t^(-3 lk) on reversal).
    expect(sweep.children[1].result!.groups).not.toEqual(direct.result!.groups);

    const tooMany = await start(server, token, { kind: 'cable-sweep', diagram: { pd: trefoil() }, sweep: { maxStrands: 3 } });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.message).toBe('A sweep up to 3 strands per component of a knot has 9 cables; this server allows at most 5. Lower maxStrands.');
  }, 90_000);
});

describe('roles', () => {
  /** A fresh server (stopped by afterEach) and a group of an owner, a member and a viewer. */
  async function serverWithGroup() {
    const s = (server = await testServer({ config: { runs: limits({}) } }));
    const [owner, member, viewer] = [await signUp(s, 'Owner'), await signUp(s, 'Member'), await signUp(s, 'Viewer')];
    const groupId = await groupWith(s, [[owner.user.id, 'owner'], [member.user.id, 'member'], [viewer.user.id, 'viewer']]);
    return { server: s, owner, member, viewer, groupId };
  }

  it('lets members start and cancel in their group, viewers only read, outsiders nothing', async () => {
    const { server, owner, member, viewer, groupId } = await serverWithGroup();
    const outsider = await signUp(server, 'Outsider');
    const body = { diagram: { pd: slow() }, ring: 'Q', groupId };

    expect((await start(server, viewer.token, body)).status).toBe(403);
    expect((await start(server, outsider.token, body)).status).toBe(404);
    const run = (await start(server, member.token, body)).body;
    expect(run.groupId).toBe(groupId);

    expect((await request(server.url).get(`/api/runs/${run.id}`).set(bearer(viewer.token))).status).toBe(200);
    expect((await request(server.url).get(`/api/runs/${run.id}`).set(bearer(outsider.token))).status).toBe(404);
    const listed = RunList.parse((await request(server.url).get(`/api/runs?groupId=${groupId}`).set(bearer(viewer.token))).body);
    expect(listed.map((r) => r.id)).toEqual([run.id]);
    expect((await request(server.url).get(`/api/runs?groupId=${groupId}`).set(bearer(outsider.token))).status).toBe(404);

    expect((await request(server.url).post(`/api/runs/${run.id}/cancel`).set(bearer(viewer.token))).status).toBe(403);
    expect((await request(server.url).post(`/api/runs/${run.id}/cancel`).set(bearer(outsider.token))).status).toBe(404);
    const byOwner = await request(server.url).post(`/api/runs/${run.id}/cancel`).set(bearer(owner.token));
    expect(byOwner.body).toMatchObject({ status: 'cancelled', error: 'Cancelled by Owner' });
    expect((await request(server.url).post('/api/runs').send(body)).status).toBe(401);
  });

  it("on a sketch: its owner and the group's members may start runs, its group's viewers may not", async () => {
    const { server, owner, member, viewer, groupId } = await serverWithGroup();
    const { Sketch } = await import('@/server/db/entities');
    const now = new Date().toISOString();
    await server.deps.db.getRepository(Sketch).save({
      id: 'sketch-1', ownerId: owner.user.id, groupId, title: 'Board trefoil', seenAt: '', notes: '', tags: [], attachments: [],
      diagram: { pd: trefoil(), unknots: 0, framings: [null], strokes: [] }, createdAt: now, updatedAt: now, deleted: false, version: 1, writers: {},
    });
    expect((await start(server, viewer.token, { sketchId: 'sketch-1' })).status).toBe(403);
    const byMember = await start(server, member.token, { sketchId: 'sketch-1' });
    expect(byMember.status).toBe(201);
    expect(byMember.body).toMatchObject({ sketchId: 'sketch-1', groupId, label: 'Board trefoil' });
    expect((await start(server, owner.token, { sketchId: 'sketch-1', ring: 'F2' })).status).toBe(201);
    expect((await start(server, owner.token, { sketchId: 'nope' })).status).toBe(404);
    const ofSketch = RunList.parse((await request(server.url).get('/api/runs?sketchId=sketch-1').set(bearer(viewer.token))).body);
    expect(ofSketch).toHaveLength(2);
  });
});
