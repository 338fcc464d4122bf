// Attachments by content hash over real HTTP (sync/SPEC.md S25-S28).
import { createHash, randomUUID } from 'node:crypto';
import sharp from 'sharp';
import request from 'supertest';
import { UploadResponse } from '@/shared/api/sync';
import type { RunningServer } from '@/server/server';
import { cameraJpeg } from './feed-fixtures';
import { bearer, groupWith, signUp, testServer } from './helpers';
import { Device } from './sync-device';
import { mutation, push, sketchFields } from './sync-fixtures';

let server: RunningServer;
let ann: { token: string; id: string };
let bob: { token: string; id: string };

const hashOf = (b: Buffer) => createHash('sha256').update(b).digest('hex');
/** A real PNG, different for every tag (its colour comes from the tag's hash). */
const png = (tag: string) => {
  const [r, g, b] = createHash('sha256').update(tag).digest();
  return sharp({ create: { width: 24, height: 16, channels: 3, background: { r, g, b } } }).png().toBuffer();
};
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
  const bytes = await png('board one');
  const first = await upload(ann.token, bytes);
  expect(first.status).toBe(201);
  // S26: kept as the photo pipeline re-encodes it (a JPEG), under the hash of the bytes sent.
  expect(UploadResponse.parse(first.body)).toEqual({ sha256: hashOf(bytes), size: expect.any(Number), mimeType: 'image/jpeg', created: true });
  const again = await upload(ann.token, bytes, 'image/png', hashOf(bytes));
  expect(again.status).toBe(200);
  expect(again.body.created).toBe(false);
  const rows = await server.deps.db.query('SELECT COUNT(*) AS n FROM attachments WHERE sha256 = ?', [hashOf(bytes)]);
  expect(rows[0].n).toBe(1);
  const back = await request(server.url).get(`/api/uploads/${hashOf(bytes)}`).set(bearer(ann.token)).buffer(true);
  expect(back.status).toBe(200);
  expect(back.headers['content-type']).toBe('image/jpeg');
  expect(await sharp(back.body as Buffer).metadata()).toMatchObject({ format: 'jpeg', width: 24, height: 16 });
  expect((back.body as Buffer).length).toBe(first.body.size);
});

test('S26: resumable by hash: HEAD says missing, then present', async () => {
  const bytes = await png('board two');
  expect((await request(server.url).head(`/api/uploads/${hashOf(bytes)}`).set(bearer(ann.token))).status).toBe(404);
  await upload(ann.token, bytes);
  expect((await request(server.url).head(`/api/uploads/${hashOf(bytes)}`).set(bearer(ann.token))).status).toBe(200);
});

test('S26: only images (by type and by content), at most 10 MB, and a claimed hash must match the bytes', async () => {
  expect((await upload(ann.token, Buffer.from('text'), 'text/plain')).status).toBe(400);
  // A PNG signature followed by junk: the declared type is right, the content is not an image.
  const fake = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), Buffer.from('not really')]);
  const refused = await upload(ann.token, fake);
  expect(refused.status).toBe(415);
  expect(refused.body.error.code).toBe('unsupported_type');
  expect((await server.deps.db.query('SELECT COUNT(*) AS n FROM attachments WHERE sha256 = ?', [hashOf(fake)]))[0].n).toBe(0);
  const big = Buffer.alloc(10 * 1024 * 1024 + 1);
  const tooBig = await upload(ann.token, big);
  expect(tooBig.status).toBe(413);
  expect(tooBig.body.error.code).toBe('payload_too_large');
  const wrong = await upload(ann.token, await png('three'), 'image/png', hashOf(await png('not three')));
  expect(wrong.status).toBe(400);
  expect((await request(server.url).post('/api/uploads').attach('file', await png('x'), 'x.png')).status).toBe(401);
});

test('S27: others read an attachment only through a sketch shared with them', async () => {
  const bytes = await png('board four');
  const h = hashOf(bytes);
  await upload(ann.token, bytes);
  expect((await request(server.url).get(`/api/uploads/${h}`).set(bearer(bob.token))).status).toBe(404);
  const group = await groupWith(server, [[ann.id, 'owner'], [bob.id, 'viewer']]);
  await push(server, ann.token, 'ann', [mutation('ann', 1, randomUUID(), 'add', sketchFields({ groupId: group, attachments: [h] }))]);
  expect((await request(server.url).get(`/api/uploads/${h}`).set(bearer(bob.token))).status).toBe(200);
});

test('S26, S28: the engine uploads queued photos, skipping those the server already has', async () => {
  const d = new Device(() => server.url, ann.token);
  const bytes = await png('board five');
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

test('S27: a row stored before the photo pipeline (bytes as sent) is re-encoded on first use, EXIF gone', async () => {
  const raw = await cameraJpeg(320, 240);
  const h = hashOf(raw);
  await server.deps.db.query('INSERT INTO attachments (sha256, size, "mimeType", data) VALUES (?, ?, ?, ?)', [h, raw.length, 'image/jpeg', raw]);
  await server.deps.db.query('INSERT INTO attachment_uploaders (sha256, "userId") VALUES (?, ?)', [h, ann.id]);
  const back = await request(server.url).get(`/api/uploads/${h}`).set(bearer(ann.token)).buffer(true);
  expect(back.status).toBe(200);
  const meta = await sharp(back.body as Buffer).metadata();
  expect(meta).toMatchObject({ format: 'jpeg', width: 320, height: 240 });
  expect(meta.exif).toBeUndefined();
  const [row] = await server.deps.db.query('SELECT data, width, height FROM attachments WHERE sha256 = ?', [h]);
  expect(row).toEqual({ data: null, width: 320, height: 240 });
});
