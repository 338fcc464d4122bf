// Leaving a group ends writing into it: a removed member's sketch shared there takes no edits
// and no photos from them, and an owner or admin takes it off the feed. Photos are read through
// groups the photo is shared to by its uploader, or by the uploader: knowing a hash is not enough.
import { createHash } from 'node:crypto';
import sharp from 'sharp';
import { feedPaths } from '@/shared/api/feed';
import { addMembership } from '@/server/groups/repository';
import type { RunningServer } from '@/server/server';
import { api, auth, cast, pngImage, sketchOf, type Account, type Cast } from './feed-fixtures';
import { groupWith, signUp, testServer } from './helpers';
import { mutation, push } from './sync-fixtures';

let server: RunningServer;
let c: Cast;
beforeAll(async () => {
  server = await testServer();
  c = await cast(server);
});
afterAll(() => server.stop());

let clock = 1000;
const edit = (who: Account, id: string, fields: Record<string, unknown>) => push(server, who.token, 'phone-1', [mutation('phone-1', clock++, id, 'update', fields, 1)]);
const addPhoto = (who: Account, id: string) => pngImage().then((png) => api(server).post(`/api/sketches/${id}/photos`).set(auth(who)).attach('file', png, 'board.png'));
const feedIds = async (who: Account) => (await api(server).get(feedPaths.feed(c.group)).set(auth(who))).body.items.map((i: { id: string }) => i.id);

describe('a member removed from the group', () => {
  it('can no longer edit their sketch shared there, nor add photos, but may take it out of the group', async () => {
    const leaver = await signUp(server, 'Leaving Lee');
    const lee = { token: leaver.token, id: leaver.user.id, name: 'Lee' };
    const group = await groupWith(server, [[c.as.owner.id, 'owner'], [lee.id, 'member']]);
    const id = await sketchOf(server, lee, { groupId: group, title: 'Before leaving' });
    expect((await edit(lee, id, { title: 'Still a member' }))[0].status).toBe('applied');
    expect((await addPhoto(lee, id)).status).toBe(201);

    await api(server).delete(`/api/groups/${group}/members/${lee.id}`).set(auth(c.as.owner)).expect(204);
    const [refused] = await edit(lee, id, { title: 'Written after removal' });
    expect(refused).toMatchObject({ status: 'rejected', reason: 'forbidden' });
    expect((await addPhoto(lee, id)).status).toBe(403);
    const page = await api(server).get(feedPaths.groupSketch(group, id)).set(auth(c.as.owner));
    expect(page.body.title).toBe('Still a member');

    // Taking it back out of the group is still theirs to do.
    expect((await edit(lee, id, { groupId: null }))[0].status).toBe('applied');
    expect((await api(server).get(feedPaths.groupSketch(group, id)).set(auth(c.as.owner))).status).toBe(404);
  });

  it('made a viewer, can no longer edit their shared sketch either', async () => {
    const id = await sketchOf(server, c.as.member, { groupId: c.group, title: 'Demoted' });
    await api(server).patch(`/api/groups/${c.group}/members/${c.as.member.id}`).set(auth(c.as.owner)).send({ role: 'viewer' }).expect(200);
    try {
      expect((await edit(c.as.member, id, { title: 'As a viewer' }))[0]).toMatchObject({ status: 'rejected', reason: 'forbidden' });
    } finally {
      await api(server).patch(`/api/groups/${c.group}/members/${c.as.member.id}`).set(auth(c.as.owner)).send({ role: 'member' }).expect(200);
    }
  });
});

describe('taking a sketch off the feed', () => {
  let sam: Account; // the sketches' owner, a second member
  beforeAll(async () => {
    const a = await signUp(server, 'Sam');
    sam = { token: a.token, id: a.user.id, name: 'Sam' };
    await addMembership(server.deps.db, c.group, sam.id, 'member');
  });

  it.each([
    ['owner', 200],
    ['admin', 200],
    ['member', 403],
    ['viewer', 403],
  ] as const)('the group %s: %i', async (who, status) => {
    const id = await sketchOf(server, sam, { groupId: c.group });
    const page = (await api(server).get(feedPaths.groupSketch(c.group, id)).set(auth(c.as[who]))).body;
    expect(page.can.unshare).toBe(status === 200);
    const res = await api(server).delete(feedPaths.share(id)).set(auth(c.as[who]));
    expect(res.status).toBe(status);
    expect((await feedIds(c.as.viewer)).includes(id)).toBe(status !== 200);
  });

  it("an admin takes a removed member's sketch off the feed; it stays the owner's, private", async () => {
    const leaver = await signUp(server, 'Removed Rae');
    const rae = { token: leaver.token, id: leaver.user.id, name: 'Rae' };
    const group = await groupWith(server, [[c.as.owner.id, 'owner'], [c.as.admin.id, 'admin'], [rae.id, 'member']]);
    const id = await sketchOf(server, rae, { groupId: group });
    await api(server).delete(`/api/groups/${group}/members/${rae.id}`).set(auth(c.as.owner)).expect(204);
    expect((await api(server).delete(feedPaths.share(id)).set(auth(c.as.admin))).status).toBe(200);
    expect((await api(server).get(feedPaths.groupSketch(group, id)).set(auth(c.as.admin))).status).toBe(404);
    const mine = await api(server).get(`/api/sketches/${id}`).set(auth(rae));
    expect(mine.body).toMatchObject({ ownerId: rae.id, groupId: null });
  });

  it('an outsider cannot, and is told nothing about the sketch', async () => {
    const id = await sketchOf(server, c.as.member, { groupId: c.group });
    expect((await api(server).delete(feedPaths.share(id)).set(auth(c.as.outsider))).status).toBe(404);
  });
});

describe('reading a device photo by its hash', () => {
  it('needs the uploader, or a group it is shared to by a sketch of the uploader; listing the hash in one own sketch shows nothing', async () => {
    const bytes = await sharp({ create: { width: 20, height: 10, channels: 3, background: '#884422' } }).png().toBuffer();
    const h = createHash('sha256').update(bytes).digest('hex');
    await api(server).post('/api/uploads').set(auth(c.as.member)).attach('file', bytes, 'board.png').expect(201);
    await sketchOf(server, c.as.member, { groupId: c.group, attachments: [h] });
    const read = (who: Account) => api(server).get(`/api/uploads/${h}`).set(auth(who));
    expect((await read(c.as.member)).status).toBe(200);
    expect((await read(c.as.viewer)).status).toBe(200); // through the group

    // The outsider lists the hash in a sketch of their own, shared to their own group.
    const stranger = await sketchOf(server, c.as.outsider, { groupId: c.otherGroup, attachments: [h] });
    expect((await read(c.as.outsider)).status).toBe(404);
    const page = (await api(server).get(feedPaths.groupSketch(c.otherGroup, stranger)).set(auth(c.as.outsider))).body;
    expect(page.photos).toEqual([]);
    const item = (await api(server).get(feedPaths.feed(c.otherGroup)).set(auth(c.as.outsider))).body.items.find((i: { id: string }) => i.id === stranger);
    expect(item.photoThumbUrl).toBeNull();
  });
});
