// The group feed over HTTP: share / stop sharing (through sync, so devices see it), the paged
// feed with filters and Readout summary, the sketch page, forks, "same invariants as", and the
// role x action matrix with a non-member who never sees the group's data.
import { FeedPage, ForkResponse, GroupSketch, ShareResponse } from '@/shared/api/feed';
import type { RunningServer } from '@/server/server';
import { api, auth, castServer, everyone, memberWrite, sketchOf, summarisedFeed, type Cast, type Who } from './feed-fixtures';
import { pullAll } from './sync-fixtures';
import { fromBraid } from '@/shared/knot/braid';
import { SAME_INVARIANTS_SHOWN } from '@/server/feed/use-cases';

let server: RunningServer;
let c: Cast;
beforeAll(async () => ({ server, c } = await castServer()));
afterAll(() => server.stop());

// Positive trefoil (docs/conventions.md; PD from tests/server/sync-fixtures.ts, from memory)
// and the same knot with every label shifted by 10: a relabelling changes no invariant.
const trefoil = { pd: [[1, 5, 2, 4], [3, 1, 4, 6], [5, 3, 6, 2]] as [number, number, number, number][], unknots: 0, framings: [null], strokes: [] };
const trefoilShifted = { ...trefoil, pd: trefoil.pd.map((x) => x.map((l) => l + 10) as [number, number, number, number]) };
// Figure-eight knot, a 4-crossing PD code (from memory).
const figureEight = { pd: [[4, 2, 5, 1], [8, 6, 1, 5], [6, 3, 7, 4], [2, 7, 3, 8]] as [number, number, number, number][], unknots: 0, framings: [null], strokes: [] };

const feedOf = (who: Who, query = '', group = c.group) => api(server).get(`/api/groups/${group}/feed${query}`).set(auth(c.as[who]));
const share = (who: Who, sketchId: string, groupId = c.group) => api(server).put(`/api/sketches/${sketchId}/share`).set(auth(c.as[who])).send({ groupId });
const unshare = (who: Who, sketchId: string) => api(server).delete(`/api/sketches/${sketchId}/share`).set(auth(c.as[who]));

describe('share and stop sharing', () => {
  it.each(memberWrite(200))('%s shares their own private sketch to the group -> %d', async (who, status) => {
    const id = await sketchOf(server, c.as[who], { title: `${who}'s sketch` });
    const res = await share(who, id);
    expect(res.status).toBe(status);
    const stored = await server.deps.db.query('SELECT groupId FROM sketches WHERE id = ?', [id]);
    expect(stored[0].groupId).toBe(status === 200 ? c.group : null);
    if (status === 200) expect(ShareResponse.parse(res.body)).toMatchObject({ id, groupId: c.group });
    else expect(res.body.error.code).toBe(status === 403 ? 'forbidden' : 'not_found');
  });

  it("nobody shares another person's sketch, only owners and admins unshare it (group-write-access.test.ts); a non-member cannot even tell it exists", async () => {
    const id = await sketchOf(server, c.as.member, { groupId: c.group });
    for (const who of ['owner', 'admin', 'viewer'] as Who[]) expect((await share(who, id, c.group)).status).toBe(403);
    expect((await unshare('viewer', id)).status).toBe(403);
    expect((await share('outsider', id, c.otherGroup)).status).toBe(404);
    expect((await unshare('outsider', id)).status).toBe(404);
    const stored = await server.deps.db.query('SELECT groupId FROM sketches WHERE id = ?', [id]);
    expect(stored[0].groupId).toBe(c.group);
  });

  it('a share reaches the other members by sync pull, and stopping it revokes it there (S22)', async () => {
    const id = await sketchOf(server, c.as.member, { title: 'Pulled' });
    const before = (await pullAll(server, c.as.viewer.token)).changes.filter((ch) => 'record' in ch && ch.record.id === id);
    expect(before).toHaveLength(0);
    expect((await share('member', id)).status).toBe(200);
    const seen = (await pullAll(server, c.as.viewer.token)).changes.filter((ch) => 'record' in ch && ch.record.id === id);
    expect(seen).toHaveLength(1);
    expect((await unshare('member', id)).status).toBe(200);
    const after = await pullAll(server, c.as.viewer.token);
    expect(after.changes.some((ch) => 'revoked' in ch && ch.revoked.id === id)).toBe(true);
    expect((await feedOf('viewer')).body.items.map((i: { id: string }) => i.id)).not.toContain(id);
  });

  it('sharing to a group I am not in is 404, to one where I am a viewer 403', async () => {
    const id = await sketchOf(server, c.as.viewer);
    expect((await share('viewer', id, c.otherGroup)).status).toBe(404);
    expect((await share('viewer', id, c.group)).status).toBe(403);
  });
});

describe('the feed', () => {
  let ids: string[];
  let elsewhere: string;
  beforeAll(async () => {
    ids = [];
    ids.push(await sketchOf(server, c.as.owner, { title: 'Trefoil A', tags: ['knot', 'torus'], diagram: trefoil, groupId: c.group }));
    ids.push(await sketchOf(server, c.as.member, { title: 'Trefoil B', tags: ['knot'], diagram: trefoilShifted, groupId: c.group }));
    ids.push(await sketchOf(server, c.as.member, { title: 'Figure eight', tags: ['amphichiral'], diagram: figureEight, groupId: c.group }));
    elsewhere = await sketchOf(server, c.as.outsider, { title: 'Elsewhere', diagram: trefoil, groupId: c.otherGroup });
  });

  it.each(everyone.map((w) => [w, w === 'outsider' ? 404 : 200] as [Who, number]))('%s reads the feed -> %d', async (who, status) => {
    const res = await feedOf(who);
    expect(res.status).toBe(status);
    if (status === 200) expect(FeedPage.parse(res.body).items.length).toBeGreaterThanOrEqual(3);
  });

  it('is newest first with the Readout summary, owner and comment count', async () => {
    const page = await summarisedFeed(server, c.as.viewer, c.group);
    const mine = page.items.filter((i) => ids.includes(i.id));
    expect(mine.map((i) => i.title)).toEqual(['Figure eight', 'Trefoil B', 'Trefoil A']);
    const a = mine.find((i) => i.title === 'Trefoil A')!;
    expect(a.owner).toEqual({ id: c.as.owner.id, displayName: c.as.owner.name });
    expect(a.commentCount).toBe(0);
    expect(a.latestRun).toBeNull();
    // Jones of the positive trefoil: t + t^3 - t^4 (docs/conventions.md).
    expect(a.invariants).toMatchObject({ crossings: 3, components: 1, jones: [[1, 1], [3, 1], [4, -1]] });
    // Figure-eight: t^-2 - t^-1 + 1 - t + t^2 (from memory; amphichiral, so symmetric in t <-> 1/t).
    expect(mine[0].invariants.jones).toEqual([[-2, 1], [-1, -1], [0, 1], [1, -1], [2, 1]]);
    expect(page.items.map((i) => i.title)).not.toContain('Elsewhere');
  });

  it('pages with a cursor, never repeating or skipping an item', async () => {
    const all = FeedPage.parse((await feedOf('member', '?limit=50')).body).items.map((i) => i.id);
    const paged: string[] = [];
    let cursor: number | null = null;
    do {
      const page: FeedPage = FeedPage.parse((await feedOf('member', `?limit=2${cursor ? `&cursor=${cursor}` : ''}`)).body);
      expect(page.items.length).toBeLessThanOrEqual(2);
      paged.push(...page.items.map((i) => i.id));
      cursor = page.nextCursor;
    } while (cursor);
    expect(paged).toEqual(all);
  });

  it('filters by tag, by person and by "has results" (no runs yet: none has results)', async () => {
    const titles = async (q: string) => FeedPage.parse((await feedOf('member', q)).body).items.map((i) => i.title);
    expect(await titles('?tag=knot')).toEqual(expect.arrayContaining(['Trefoil A', 'Trefoil B']));
    expect(await titles('?tag=knot')).not.toContain('Figure eight');
    expect(await titles('?tag=kno')).toEqual([]); // whole tags only
    // Tags match without case, a leading '#' or doubled spaces (shared/api/tags.ts), also for a
    // tag stored with capitals by a device that did not normalise it.
    const torus = await sketchOf(server, c.as.owner, { title: 'Torus knot T(2,5)', tags: ['Torus Knot'], groupId: c.group });
    expect(await titles(`?tag=${encodeURIComponent('#Torus Knot')}`)).toEqual(['Torus knot T(2,5)']);
    expect(await titles('?tag=TORUS')).toEqual(['Trefoil A']);
    await unshare('owner', torus);
    const byOwner = await titles(`?person=${c.as.owner.id}`);
    expect(byOwner).toContain('Trefoil A');
    expect(byOwner).not.toContain('Trefoil B');
    expect(await titles(`?person=${c.as.outsider.id}`)).toEqual([]);
    expect(await titles('?hasResults=true')).toEqual([]);
    expect(await titles('?hasResults=false')).toEqual(expect.arrayContaining(['Trefoil A', 'Trefoil B', 'Figure eight']));
    expect((await feedOf('member', '?person=nobody')).status).toBe(400);
  });

  it('the sketch page lists same-invariant sketches of this group only, and what my role may do', async () => {
    const [a, b, eight] = ids;
    await summarisedFeed(server, c.as.viewer, c.group);
    const page = (who: Who, id: string, group = c.group) => api(server).get(`/api/groups/${group}/feed/${id}`).set(auth(c.as[who]));
    const asViewer = GroupSketch.parse((await page('viewer', a)).body);
    // Earlier tests' sketches are trefoils too (the fixture's default diagram); the other group's never shows.
    const same = asViewer.sameInvariants.map((s) => s.id);
    expect(same).toContain(b);
    expect(same).not.toContain(a);
    expect(same).not.toContain(eight);
    expect(same).not.toContain(elsewhere);
    expect(asViewer.can).toEqual({ comment: false, moderate: false, uploadPhoto: false, fork: true, unshare: false });
    expect(GroupSketch.parse((await page('viewer', eight)).body).sameInvariants).toEqual([]);
    expect(GroupSketch.parse((await page('owner', a)).body).can).toEqual({ comment: true, moderate: true, uploadPhoto: true, fork: true, unshare: true });
    expect(GroupSketch.parse((await page('member', a)).body).can).toMatchObject({ comment: true, moderate: false, unshare: false });
    expect((await page('outsider', a)).status).toBe(404);
    expect((await page('outsider', a, c.otherGroup)).status).toBe(404); // a sketch of another group through my own group
  });
});

describe('same invariants as', () => {
  it('finds the same knot drawn with more crossings, not its mirror; lists ten and counts all', async () => {
    const stroke = (over: object) => sketchOf(server, c.as.member, { groupId: c.group, ...over });
    // The closure of [1,1,1,2] on 3 strands is the positive trefoil again (a Markov stabilisation
    // of [1,1,1], Markov's theorem), drawn with 4 crossings; [-1,-1,-1] closes to its mirror
    // (docs/conventions.md, Braid word).
    const { pd: stabilised } = fromBraid([1, 1, 1, 2], 3);
    const { pd: mirrored } = fromBraid([-1, -1, -1]);
    const drawn = (pd: readonly (readonly number[])[]) => ({ ...trefoil, pd: pd.map((x) => [...x] as [number, number, number, number]) });
    const first = await stroke({ title: 'Trefoil, three crossings', diagram: trefoil });
    const bigger = await stroke({ title: 'Trefoil, four crossings', diagram: drawn(stabilised) });
    const mirror = await stroke({ title: 'Left trefoil', diagram: drawn(mirrored) });
    await summarisedFeed(server, c.as.member, c.group); // keys are computed off the request thread
    const page = async (id: string) => GroupSketch.parse((await api(server).get(`/api/groups/${c.group}/feed/${id}`).set(auth(c.as.member))).body);
    const same = (await page(first)).sameInvariants.map((r) => r.id);
    expect(same).toContain(bigger);
    expect(same).not.toContain(mirror);
    for (let k = 0; k < SAME_INVARIANTS_SHOWN; k++) await stroke({ title: `Trefoil copy ${k}`, diagram: trefoilShifted });
    await summarisedFeed(server, c.as.member, c.group);
    const crowded = await page(bigger);
    expect(crowded.sameInvariants).toHaveLength(SAME_INVARIANTS_SHOWN);
    // This group's other trefoils: the earlier tests' (the fixture's default diagram is one too) and these.
    expect(crowded.sameInvariantsTotal).toBeGreaterThan(SAME_INVARIANTS_SHOWN);
    expect((await page(mirror)).sameInvariantsTotal).toBe(0);
  });
});

describe('fork', () => {
  it.each(everyone.map((w) => [w, w === 'outsider' ? 404 : 201] as [Who, number]))('%s forks a shared sketch -> %d', async (who, status) => {
    const original = await sketchOf(server, c.as.owner, { title: 'To fork', diagram: figureEight, groupId: c.group });
    const res = await api(server).post(`/api/sketches/${original}/fork`).set(auth(c.as[who]));
    expect(res.status).toBe(status);
    if (status !== 201) return;
    const fork = ForkResponse.parse(res.body);
    const [row] = await server.deps.db.query('SELECT ownerId, groupId, title, diagram FROM sketches WHERE id = ?', [fork.id]);
    expect(row).toMatchObject({ ownerId: c.as[who].id, groupId: null, title: 'To fork' });
    expect(JSON.parse(row.diagram).pd).toEqual(figureEight.pd);
    // It arrives on the forker's devices by sync, and nobody else sees it.
    const pulled = (await pullAll(server, c.as[who].token)).changes.filter((ch) => 'record' in ch && ch.record.id === fork.id);
    expect(pulled).toHaveLength(1);
    if (who !== 'owner') expect((await api(server).get(`/api/sketches/${fork.id}`).set(auth(c.as.owner))).status).toBe(404);
  });

  it('keeps a link to the original, shown on the fork once it is shared', async () => {
    const original = await sketchOf(server, c.as.owner, { title: 'Original', groupId: c.group });
    const fork = ForkResponse.parse((await api(server).post(`/api/sketches/${original}/fork`).set(auth(c.as.member))).body);
    expect(fork.forkedFrom).toBe(original);
    expect((await share('member', fork.id)).status).toBe(200);
    const page = GroupSketch.parse((await api(server).get(`/api/groups/${c.group}/feed/${fork.id}`).set(auth(c.as.viewer))).body);
    expect(page.forkedFrom).toEqual({ id: original, title: 'Original', owner: { id: c.as.owner.id, displayName: c.as.owner.name } });
  });

  it('a private sketch of someone else cannot be forked (404)', async () => {
    const secret = await sketchOf(server, c.as.owner, { title: 'Private' });
    for (const who of ['admin', 'member', 'outsider'] as Who[]) {
      expect((await api(server).post(`/api/sketches/${secret}/fork`).set(auth(c.as[who]))).status).toBe(404);
    }
  });
});
