// Building blocks of the sync tests: sketch fields, mutations and raw push/pull calls.
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { SketchFields } from '@/shared/api/sketches';
import { PullResponse, PushResponse, type Mutation, type Op } from '@/shared/api/sync';
import type { RunningServer } from '@/server/server';
import { bearer } from './helpers';

export const sketchFields = (over: Partial<SketchFields> = {}): SketchFields => ({
  title: 'Trefoil on the board',
  seenAt: 'Topology seminar',
  notes: '',
  tags: ['knot'],
  // The positive trefoil's PD code as written in docs/conventions.md (from memory).
  diagram: { pd: [[1, 5, 2, 4], [3, 1, 4, 6], [5, 3, 6, 2]], unknots: 0, framings: [null], strokes: [] },
  attachments: [],
  createdAt: '2026-12-01T10:00:00.000Z',
  updatedAt: '2026-12-01T10:00:00.000Z',
  groupId: null,
  deleted: false,
  ...over,
});

export function mutation(deviceId: string, clock: number, recordId: string, op: Op, fields: Record<string, unknown>, baseVersion = 0): Mutation {
  return { mutationId: randomUUID(), deviceId, clock, recordId, type: 'sketch', op, baseVersion, fields: { ...fields, deleted: op === 'delete' } };
}

export async function push(server: RunningServer, token: string, deviceId: string, mutations: Mutation[]) {
  const res = await request(server.url).post('/api/sync/push').set(bearer(token)).send({ deviceId, mutations });
  expect(res.status).toBe(200);
  return PushResponse.parse(res.body).results;
}

export async function pullAll(server: RunningServer, token: string, limit = 500) {
  const changes: PullResponse['changes'] = [];
  let cursor = 0;
  for (;;) {
    const res = await request(server.url).get(`/api/sync/pull?cursor=${cursor}&limit=${limit}`).set(bearer(token));
    expect(res.status).toBe(200);
    const page = PullResponse.parse(res.body);
    changes.push(...page.changes);
    cursor = page.cursor;
    if (!page.hasMore) return { changes, cursor };
  }
}
