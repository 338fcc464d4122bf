// Board photos over HTTP: the role x action matrix, content checks (not names), EXIF (and so
// GPS) stripped, thumbnails, signed URLs, nothing stored on refusal; and the S3 path against a
// local S3 fake (s3rver) on a free port: the real @aws-sdk/client-s3 code, no mock.
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import S3rver from 's3rver';
import { GroupSketch } from '@/shared/api/feed';
import { Photo, PhotoList } from '@/shared/api/photos';
import type { RunningServer } from '@/server/server';
import { bearer, testServer } from './helpers';
import { Device } from './sync-device';
import { api, auth, cameraJpeg, cast, everyone, gifImage, memberWrite, pngImage, sketchOf, webpImage, type Cast, type Who } from './feed-fixtures';

const files = (dir: string): string[] => readdirSync(dir, { recursive: true, withFileTypes: true }).filter((d) => d.isFile()).map((d) => d.name);
const photoRows = async (s: RunningServer) => (await s.deps.db.query('SELECT COUNT(*) AS n FROM photos'))[0].n as number;

function uploadTo(server: RunningServer, who: { token: string }, sketchId: string, bytes: Buffer, filename = 'board.jpg', contentType = 'image/jpeg') {
  return api(server).post(`/api/sketches/${sketchId}/photos`).set(auth(who as never)).attach('file', bytes, { filename, contentType });
}

describe('photos on local disk', () => {
  let server: RunningServer;
  let c: Cast;
  let dir: string;
  let clock = Date.parse('2026-12-01T12:00:00Z');
  let shared: string;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'overstrand-photos-'));
    server = await testServer({ config: { photos: { kind: 'disk', dir } }, now: () => new Date(clock) });
    c = await cast(server);
    shared = await sketchOf(server, c.as.member, { title: 'On the board', groupId: c.group });
  });
  afterAll(async () => {
    await server.stop();
    rmSync(dir, { recursive: true, force: true });
  });
  const upload = (who: Who, bytes: Buffer, sketchId = shared, filename?: string, type?: string) => uploadTo(server, c.as[who], sketchId, bytes, filename, type);

  it.each(memberWrite(201))('%s adds a photo to a shared sketch -> %d', async (who, status) => {
    const before = files(dir).length;
    const res = await upload(who, await cameraJpeg());
    expect(res.status).toBe(status);
    expect(files(dir).length).toBe(before + (status === 201 ? 2 : 0)); // full + thumbnail, or nothing
    if (status === 201) expect(Photo.parse(res.body)).toMatchObject({ sketchId: shared, uploader: { id: c.as[who].id }, width: 640, height: 480 });
  });

  it('a viewer may add photos to their own private sketch', async () => {
    const mine = await sketchOf(server, c.as.viewer, { title: 'Mine' });
    expect((await upload('viewer', await pngImage(), mine, 'x.png', 'image/png')).status).toBe(201);
  });

  it.each(everyone.map((w) => [w, w === 'outsider' ? 404 : 200] as [Who, number]))('%s lists the photos -> %d', async (who, status) => {
    const res = await api(server).get(`/api/sketches/${shared}/photos`).set(auth(c.as[who]));
    expect(res.status).toBe(status);
    if (status === 200) expect(PhotoList.parse(res.body).length).toBe(3);
  });

  it('re-encodes as JPEG with no EXIF (no GPS), keeps orientation and size, and makes a thumbnail', async () => {
    const input = await cameraJpeg(1600, 1200);
    expect((await sharp(input).metadata()).exif).toBeDefined(); // the camera's EXIF with GPS is there going in
    const p = Photo.parse((await upload('member', input)).body);
    for (const url of [p.url, p.thumbUrl]) {
      const res = await api(server).get(url).buffer(true); // no Bearer: the URL is signed
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('image/jpeg');
      const meta = await sharp(res.body).metadata();
      expect(meta.format).toBe('jpeg');
      expect(meta.exif).toBeUndefined();
      expect(Buffer.from(res.body).includes(Buffer.from('TestCam'))).toBe(false);
      if (url === p.url) expect([meta.width, meta.height]).toEqual([1600, 1200]);
      else expect(Math.max(meta.width!, meta.height!)).toBe(480);
    }
  });

  it('accepts PNG and WebP by content, whatever the name says', async () => {
    expect((await upload('member', await pngImage(), shared, 'photo.jpg', 'image/jpeg')).status).toBe(201);
    expect((await upload('member', await webpImage(), shared, 'noext', 'application/octet-stream')).status).toBe(201);
  });

  it.each([
    ['a GIF (wrong type)', () => gifImage(), 'board.gif', 'image/gif', 415, /not a JPEG, PNG or WebP/],
    ['text named board.jpg', async () => Buffer.from('definitely not a photo'), 'board.jpg', 'image/jpeg', 415, /not a JPEG, PNG or WebP/],
    ['a truncated JPEG', async () => (await cameraJpeg()).subarray(0, 400), 'board.jpg', 'image/jpeg', 415, /could not be read|not a JPEG/],
    ['a file over 10 MB', async () => Buffer.alloc(10 * 1024 * 1024 + 1, 1), 'big.jpg', 'image/jpeg', 413, /at most 10 MB/],
  ] as [string, () => Promise<Buffer>, string, string, number, RegExp][])('refuses %s with a clear message and stores nothing', async (_what, make, name, type, status, message) => {
    const [rows, stored] = [await photoRows(server), files(dir).length];
    const res = await upload('member', await make(), shared, name, type);
    expect(res.status).toBe(status);
    expect(res.body.error.message).toMatch(message);
    expect(await photoRows(server)).toBe(rows);
    expect(files(dir).length).toBe(stored);
  });

  it('refuses an upload with no file', async () => {
    const res = await api(server).post(`/api/sketches/${shared}/photos`).set(auth(c.as.member)).field('x', '1');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.file).toMatch(/JPEG, PNG or WebP/);
  });

  it('signed URLs: tampered or expired links are refused', async () => {
    const p = Photo.parse((await upload('member', await pngImage(), shared, 'a.png', 'image/png')).body);
    // flip the signature's first character to a different one (a fixed 'A' would match 1 time in 64)
    const tampered = p.thumbUrl.replace(/sig=(.)/, (_m, ch: string) => `sig=${ch === 'A' ? 'B' : 'A'}`);
    expect((await api(server).get(tampered)).status).toBe(403);
    expect((await api(server).get(p.thumbUrl.replace('/thumb', '/full'))).status).toBe(403); // the signature names the variant
    clock += 3 * 3600_000;
    expect((await api(server).get(p.thumbUrl)).status).toBe(403);
  });

  it.each([
    ['member', 'member', 204], // own
    ['admin', 'member', 204], // moderation
    ['owner', 'member', 204],
    ['member', 'admin', 403],
    ['viewer', 'member', 403],
    ['outsider', 'member', 404],
  ] as [Who, Who, number][])('%s removes a photo added by %s -> %d', async (who, uploader, status) => {
    const p = Photo.parse((await upload(uploader, await pngImage(), shared, 'a.png', 'image/png')).body);
    const stored = files(dir).length;
    expect((await api(server).delete(`/api/photos/${p.id}`).set(auth(c.as[who]))).status).toBe(status);
    expect(files(dir).length).toBe(stored - (status === 204 ? 2 : 0));
  });

  it('the feed shows the first photo as the thumbnail', async () => {
    const item = (await api(server).get(`/api/groups/${c.group}/feed`).set(auth(c.as.viewer))).body.items.find((i: { id: string }) => i.id === shared);
    expect(item.photoThumbUrl).toMatch(/^\/api\/photos\/[0-9a-f-]{36}\/thumb\?exp=\d+&sig=/);
    expect((await api(server).get(item.photoThumbUrl)).status).toBe(200);
  });
});

describe('photos in an S3-compatible bucket (s3rver)', () => {
  let s3: S3rver;
  let s3dir: string;
  let server: RunningServer;
  let c: Cast;
  beforeAll(async () => {
    s3dir = mkdtempSync(join(tmpdir(), 'overstrand-s3-'));
    s3 = new S3rver({ port: 0, address: '127.0.0.1', silent: true, directory: s3dir, configureBuckets: [{ name: 'board-photos', configs: [] }] });
    const { port } = await s3.run();
    server = await testServer({
      config: {
        photos: { kind: 's3', bucket: 'board-photos', endpoint: `http://127.0.0.1:${port}`, region: 'us-east-1', accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER', forcePathStyle: true },
      },
    });
    c = await cast(server);
  });
  afterAll(async () => {
    await server.stop();
    await s3.close();
    rmSync(s3dir, { recursive: true, force: true });
  });

  it('puts, gets and deletes through the AWS SDK', async () => {
    const sketch = await sketchOf(server, c.as.member, { groupId: c.group });
    const res = await uploadTo(server, c.as.member, sketch, await cameraJpeg());
    expect(res.status).toBe(201);
    const p = Photo.parse(res.body);
    const objects = files(s3dir).filter((f) => !f.startsWith('.'));
    expect(objects.length).toBeGreaterThanOrEqual(2); // the bucket holds the full image and the thumbnail
    const full = await api(server).get(p.url).buffer(true);
    expect(full.status).toBe(200);
    expect((await sharp(full.body).metadata()).exif).toBeUndefined();
    expect((await api(server).delete(`/api/photos/${p.id}`).set(auth(c.as.member))).status).toBe(204);
    expect((await api(server).get(p.url)).status).toBe(404);
    const { photoStoreFor } = await import('@/server/photos/store');
    expect(await photoStoreFor(server.deps.config.photos).get(`${p.id}/thumb`)).toBeNull();
  });

  it('a device attachment (/api/uploads) goes to the same bucket, re-encoded', async () => {
    const before = files(s3dir).filter((f) => !f.startsWith('.')).length;
    const res = await api(server).post('/api/uploads').set(auth(c.as.member)).attach('file', await cameraJpeg(), { filename: 'b.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(201);
    expect(files(s3dir).filter((f) => !f.startsWith('.')).length).toBeGreaterThanOrEqual(before + 2);
    const back = await api(server).get(`/api/uploads/${res.body.sha256}`).set(auth(c.as.member)).buffer(true);
    expect(back.status).toBe(200);
    expect((await sharp(back.body).metadata()).exif).toBeUndefined();
  });

  it('refuses a bad upload before anything reaches the bucket', async () => {
    const sketch = await sketchOf(server, c.as.member, { groupId: c.group });
    const before = files(s3dir).length;
    expect((await uploadTo(server, c.as.member, sketch, Buffer.from('GIF89a nope'), 'x.png', 'image/png')).status).toBe(415);
    expect(files(s3dir).length).toBe(before);
  });
});

describe('a board photo attached on a device is a photo of the shared sketch (S25, S26, one pipeline)', () => {
  let server: RunningServer;
  let c: Cast;
  let dir: string;
  beforeAll(async () => {
    dir = mkdtempSync(join(tmpdir(), 'overstrand-device-photos-'));
    server = await testServer({ config: { photos: { kind: 'disk', dir } } });
    c = await cast(server);
  });
  afterAll(async () => {
    await server.stop();
    rmSync(dir, { recursive: true, force: true });
  });

  it('attached offline and synced, it shows on the group feed item and the sketch page, with no EXIF GPS in any served bytes', async () => {
    const d = new Device(() => server.url, c.as.member.token);
    d.faults.offline = true;
    const input = await cameraJpeg(1600, 1200);
    expect((await sharp(input).metadata()).exif).toBeDefined(); // the camera's EXIF with GPS is there going in
    const h = await d.store.queueUpload(new Uint8Array(input), 'image/jpeg');
    const s = await d.store.create({ title: 'From the seminar board', groupId: c.group, attachments: [h] });
    expect(await d.sync()).toMatchObject({ message: 'offline (test)' }); // offline: nothing left the device
    d.faults.offline = false;
    expect(await d.sync()).toBeNull();
    expect((await d.store.counts()).uploads).toBe(0);

    const item = (await api(server).get(`/api/groups/${c.group}/feed`).set(auth(c.as.viewer))).body.items.find((i: { id: string }) => i.id === s.id);
    expect(item.photoThumbUrl).toMatch(new RegExp(`^/api/photos/${h}/thumb\\?exp=\\d+&sig=`));
    const page = GroupSketch.parse((await api(server).get(`/api/groups/${c.group}/feed/${s.id}`).set(auth(c.as.viewer))).body);
    expect(page.photos).toHaveLength(1);
    expect(page.photos[0]).toMatchObject({ id: h, sketchId: s.id, uploader: { id: c.as.member.id }, width: 1600, height: 1200 });
    expect(files(dir)).toHaveLength(2); // full + thumbnail in the PhotoStore, as for feed photos

    const served = [
      api(server).get(item.photoThumbUrl),
      api(server).get(page.photos[0].url),
      api(server).get(page.photos[0].thumbUrl),
      api(server).get(`/api/uploads/${h}`).set(bearer(c.as.viewer.token)), // S27, read through the shared sketch
    ];
    for (const res of await Promise.all(served.map((r) => r.buffer(true)))) {
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('image/jpeg');
      const meta = await sharp(res.body).metadata();
      expect(meta.format).toBe('jpeg');
      expect(meta.exif).toBeUndefined(); // no EXIF block, so no GPS IFD
      expect(Buffer.from(res.body).includes(Buffer.from('TestCam'))).toBe(false);
    }
    expect(await sharp((await api(server).get(page.photos[0].url).buffer(true)).body).metadata()).toMatchObject({ width: 1600, height: 1200 });
  });

  it('a device photo is removed from its sketch by the owner on the device; the feed route says so and keeps it', async () => {
    const d = new Device(() => server.url, c.as.member.token);
    const h = await d.store.queueUpload(new Uint8Array(await pngImage()), 'image/png');
    const s = await d.store.create({ title: 'Two photos', groupId: c.group, attachments: [h] });
    expect(await d.sync()).toBeNull();
    const res = await api(server).delete(`/api/photos/${h}`).set(auth(c.as.member));
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/removes it from the sketch/);
    await d.store.update(s.id, { attachments: [] });
    expect(await d.sync()).toBeNull();
    const page = GroupSketch.parse((await api(server).get(`/api/groups/${c.group}/feed/${s.id}`).set(auth(c.as.viewer))).body);
    expect(page.photos).toEqual([]);
  });
});
