// Diagrams and helpers for the run tests.
import request from 'supertest';
import { RunDetail, type StartRunRequest } from '@/shared/api/runs';
import { fromBraid } from '@/shared/knot/braid';
import type { RunningServer } from '@/server/server';
import { bearer } from './helpers';

type PD = [number, number, number, number][];

/** The torus link T(p, q) as the closure of (sigma_1 ... sigma_{p-1})^q (common practice). */
export function torus(p: number, q: number): PD {
  const word: number[] = [];
  for (let k = 0; k < q; k++) for (let s = 1; s < p; s++) word.push(s);
  return fromBraid(word).pd.map((x) => [...x] as PD[number]);
}

// The positive trefoil over Z: Z at (0,1), (0,3), (2,5), (3,9) and Z/2 at (3,7)
// (Bar-Natan, "On Khovanov's categorification of the Jones polynomial", 2002, math/0201043).
export const TREFOIL_Z = [
  { i: 0, j: 1, free: 1, torsion: [] },
  { i: 0, j: 3, free: 1, torsion: [] },
  { i: 2, j: 5, free: 1, torsion: [] },
  { i: 3, j: 7, free: 0, torsion: [2] },
  { i: 3, j: 9, free: 1, torsion: [] },
];

/** The positive trefoil, closure of sigma_1^3 (docs/conventions.md). */
export const trefoil = (): PD => torus(2, 3);

/** Takes well over the test's patience on this machine (T(7,8) over Q: about 35 s alone). */
export const slow = (): PD => torus(7, 8);

export const start = (server: RunningServer, token: string, body: StartRunRequest) =>
  request(server.url).post('/api/runs').set(bearer(token)).send(body);

export async function read(server: RunningServer, token: string, id: string): Promise<RunDetail> {
  const res = await request(server.url).get(`/api/runs/${id}`).set(bearer(token));
  expect(res.status).toBe(200);
  return RunDetail.parse(res.body);
}

/** Polls the run until `until` holds (default: it has ended). */
export async function waitFor(server: RunningServer, token: string, id: string, until: (r: RunDetail) => boolean, timeoutMs = 60_000): Promise<RunDetail> {
  const t0 = Date.now();
  for (;;) {
    const run = await read(server, token, id);
    if (until(run)) return run;
    if (Date.now() - t0 > timeoutMs) throw new Error(`run ${id} still ${run.status} after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

export const ended = (r: RunDetail) => ['done', 'failed', 'cancelled'].includes(r.status);

/** Waits until the SMTP fake holds a message satisfying `match`. */
export async function mailFor(server: RunningServer, match: (m: { to: string[]; subject: string; text: string }) => boolean) {
  for (let k = 0; k < 200; k++) {
    const m = server.mailbox!.list().find(match);
    if (m) return m;
    await new Promise((r) => setTimeout(r, 25));
  }
  throw new Error('no such mail arrived');
}
