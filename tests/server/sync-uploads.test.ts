// Attachments by content hash over real HTTP (sync/SPEC.md S25-S28).
import { createHash, randomUUID } from 'node:crypto';
import request from 'supertest';
import { UploadResponse } from '@/shared/api/sync';
import type { RunningServer } from '@/server/server';
import { bearer, groupWith, signUp, testServer } from './helpers';
import { Device } from './sync-device';
import { mutation, push, sketchFields } from './sync-fixtures';

let server: RunningServer;
let ann: { token: string; id: string };
let bob: { token: string; id: string };

// A PNG signature followed by arbitrary bytes: the server checks the declared type, not the image.
const png = (tag: string) => Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.from(tag)]);
const hashOf = (b: Buffer) => createHash('sha256').update(b).digest('hex');
const upload = (token: string, bytes: Buffer, type = 'image/png', sha256?: string) => {
  const r = request(server.url).post('/api/uploads').set(bearer(token));
  if (sha256) r.field('sha256', sha256);
  return r.attach('file', bytes, { filename: 'board.png', contentType: type });
};

beforeAll(async () => {
  server = await testServer();
  const a = await signUp(server, 'Ann');
  const b = await signUp(server, 'Bob');
  ann = { token: a.token, id: a.user.id };
  bob = { token: b.token, id: b.user.id };
});
afterAll(() => server.stop());

test('S25, S26: the server names bytes by their SHA-256 and stores a retried upload once', async () => {
  const bytes = png('board one');
  const first = await upload(ann.token, bytes);
  expect(first.status).toBe(201);
  expect(UploadResponse.parse(first.body)).toEqual({ sha256: hashOf(bytes), size: bytes.length, mimeType: 'image/png', created: true });
  const again = await upload(ann.token, bytes, 'image/png', hashOf(bytes));
  expect(again.status).toBe(200);
  expect(again.body.created).toBe(false);
  const rows = await server.deps.db.query('SELECT COUNT(*) AS n FROM attachments WHERE sha256 = ?', [hashOf(bytes)]);
  expect(rows[0].n).toBe(1);
  const back = await request(server.url).get(`/api/uploads/${hashOf(bytes)}`).set(bearer(ann.token)).buffer(true);
  expect(back.status).toBe(200);
  expect(Buffer.compare(back.body as Buffer, bytes)).toBe(0);
});

test('S26: resumable by hash: HEAD says missing, then present', async () => {
  const bytes = png('board two');
  expect((await request(server.url).head(`/api/uploads/${hashOf(bytes)}`).set(bearer(ann.token))).status).toBe(404);
  await upload(ann.token, bytes);
  expect((await request(server.url).head(`/api/uploads/${hashOf(bytes)}`).set(bearer(ann.token))).status).toBe(200);
});

test('S26: only images, at most 10 MB, and a claimed hash must match the bytes', async () => {
  expect((await upload(ann.token, Buffer.from('text'), 'text/plain')).status).toBe(400);
  const big = Buffer.alloc(10 * 1024 * 1024 + 1);
  const tooBig = await upload(ann.token, big);
  expect(tooBig.status).toBe(413);
  expect(tooBig.body.error.code).toBe('payload_too_large');
  const wrong = await upload(ann.token, png('three'), 'image/png', hashOf(png('not three')));
  expect(wrong.status).toBe(400);
  expect((await request(server.url).post('/api/uploads').attach('file', png('x'), 'x.png')).status).toBe(401);
});

test('S27: others read an attachment only through a sketch shared with them', async () => {
  const bytes = png('board four');
  const h = hashOf(bytes);
  await upload(ann.token, bytes);
  expect((await request(server.url).get(`/api/uploads/${h}`).set(bearer(bob.token))).status).toBe(404);
  const group = await groupWith(server, [[ann.id, 'owner'], [bob.id, 'viewer']]);
  await push(server, ann.token, 'ann', [mutation('ann', 1, randomUUID(), 'add', sketchFields({ groupId: group, attachments: [h] }))]);
  expect((await request(server.url).get(`/api/uploads/${h}`).set(bearer(bob.token))).status).toBe(200);
});

test('S26, S28: the engine uploads queued photos, skipping those the server already has', async () => {
  const d = new Device(() => server.url, ann.token);
  const bytes = png('board five');
  const h = await d.store.queueUpload(new Uint8Array(bytes), 'image/png');
  expect(h).toBe(hashOf(bytes));
  await d.store.create({ title: 'with photo', attachments: [h] });
  expect((await d.store.counts()).uploads).toBe(1);
  expect(await d.sync()).toBeNull();
  expect((await d.store.counts()).uploads).toBe(0);
  expect((await request(server.url).head(`/api/uploads/${h}`).set(bearer(ann.token))).status).toBe(200);
  // Queued again (e.g. picked twice): the engine asks first and stores nothing new.
  await d.store.queueUpload(new Uint8Array(bytes), 'image/png');
  expect(await d.sync()).toBeNull();
  const rows = await server.deps.db.query('SELECT COUNT(*) AS n FROM attachments WHERE sha256 = ?', [h]);
  expect(rows[0].n).toBe(1);
});
