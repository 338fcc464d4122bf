// Freeze probes against a real server (in this process, in-memory database): /api/health p99
// while the requests of issue 13 are served (goal < 200 ms each). T(11, 12) is the issue's
// 120-crossing torus closure class (seconds of Jones by tangle contraction); the sweeps are the
// trefoil up to 4 strands with framing 80 and 160 (refused before any cable is built) and 30
// (accepted, 14 cables built in the job pool, cancelled at once).
import { randomUUID } from 'node:crypto';
import { AuthResponse } from '@/shared/api/auth';
import { RunDetail } from '@/shared/api/runs';
import { fromBraid } from '@/shared/knot/braid';
import { torusLink } from '@/shared/knot/families/torus';
import { insertGroup } from '@/server/groups/repository';
import { startServer } from '@/server/server';
import { probeHealth } from '../server/freeze-probe';
import type { Line } from './timing';

export async function freezeBench(): Promise<Line[]> {
  const server = await startServer({ config: { bcryptRounds: 4 } });
  try {
    const call = async (method: string, path: string, body?: unknown, token?: string) => {
      const res = await fetch(`${server.url}${path}`, {
        method,
        headers: { 'Content-Type': 'application/json', ...(token && { Authorization: `Bearer ${token}` }) },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return { status: res.status, body: await res.json() };
    };
    const { token, user } = AuthResponse.parse((await call('POST', '/api/auth/register', { email: 'bench@example.org', password: 'correct horse', displayName: 'Bench' })).body);
    const groupId = randomUUID();
    await insertGroup(server.deps.db, groupId, 'Bench group', user.id);
    const share = (title: string, pd: unknown, framings: null[]) => {
      const fields = { title, seenAt: '', notes: '', tags: [], diagram: { pd, unknots: 0, framings, strokes: [] }, attachments: [], createdAt: new Date().toISOString(), updatedAt: new Date().toISOString(), groupId, deleted: false };
      const mutation = { mutationId: randomUUID(), deviceId: 'bench', clock: Date.now(), recordId: randomUUID(), type: 'sketch', op: 'add', baseVersion: 0, fields };
      return call('POST', '/api/sync/push', { deviceId: 'bench', mutations: [mutation] }, token);
    };
    const feed = () => call('GET', `/api/groups/${groupId}/feed`, undefined, token);
    // Warm: the job thread started, the routes run once.
    await share('Trefoil', fromBraid([1, 1, 1]).pd, [null]);
    await feed();

    const lines: Line[] = [];
    const probe = async (name: string, work: () => Promise<unknown>) => {
      const { probe: p } = await probeHealth(server.url, work);
      lines.push({ name: `freeze: /api/health p99 while ${name}`, value: p.p99, unit: 'ms', goal: '< 200 ms' });
    };
    await probe('sharing T(11,12) (120 crossings) and reading the feed', async () => {
      await share('T(11,12)', torusLink(11, 12).pd, [null]);
      await feed();
    });
    const sweep = (framing: number) => call('POST', '/api/runs', { kind: 'cable-sweep', diagram: { pd: fromBraid([1, 1, 1]).pd, framings: [framing] }, sweep: { maxStrands: 4 } }, token);
    await probe('a sweep with framing 80 is refused', () => sweep(80));
    await probe('a sweep with framing 160 is refused', () => sweep(160));
    await probe('a sweep with framing 30 is accepted', async () => {
      const { id } = RunDetail.parse((await sweep(30)).body);
      await call('POST', `/api/runs/${id}/cancel`, {}, token);
    });
    return lines;
  } finally {
    await server.stop();
  }
}
