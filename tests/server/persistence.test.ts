import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { GroupSketch, feedPaths } from '@/shared/api/feed';
import { GroupList, MemberList } from '@/shared/api/groups';
import { RunList } from '@/shared/api/runs';
import { DEMO_GROUP, DEMO_USERS } from '@/server/demo/seed';
import { DEMO_SKETCHES } from '@/server/demo/story';
import { summarisedFeed } from './feed-fixtures';
import { bearer, signUp, testServer } from './helpers';

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'overstrand-db-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

const counts = async (db: import('typeorm').DataSource) =>
  Object.fromEntries(
    await Promise.all(
      ['users', 'groups', 'memberships', 'invitations', 'migrations', 'sketches', 'comments', 'runs'].map(async (t) => [t, (await db.query(`SELECT COUNT(*) AS n FROM "${t}"`))[0].n]),
    ),
  );

describe('a database file across restarts', () => {
  it('keeps accounts and groups, and running the migrations again changes nothing', async () => {
    const dbPath = join(dir, 'nested', 'overstrand.sqlite');
    const first = await testServer({ dbPath });
    const { token, user } = await signUp(first, 'Persistent Pat');
    await request(first.url).post('/api/groups').set(bearer(token)).send({ name: 'Kept group' }).expect(201);
    const migrations = await first.deps.db.query('SELECT name FROM migrations');
    const before = await counts(first.deps.db);
    await first.stop();

    const second = await testServer({ dbPath });
    try {
      expect(await counts(second.deps.db)).toEqual(before);
      expect(await second.deps.db.query('SELECT name FROM migrations')).toEqual(migrations);
      // The old token still works: same secret, same user row.
      expect((await request(second.url).get('/api/me').set(bearer(token))).body).toEqual(user);
      const groups = GroupList.parse((await request(second.url).get('/api/groups').set(bearer(token))).body);
      expect(groups).toEqual([expect.objectContaining({ name: 'Kept group', role: 'owner' })]);
      expect(await second.deps.db.showMigrations()).toBe(false); // nothing pending
    } finally {
      await second.stop();
    }
  });

  it('uses WAL journaling for a file database', async () => {
    const server = await testServer({ dbPath: join(dir, 'wal.sqlite') });
    try {
      expect(await server.deps.db.query('PRAGMA journal_mode')).toEqual([{ journal_mode: 'wal' }]);
    } finally {
      await server.stop();
    }
  });
});

describe('the demo scenario', () => {
  it('is loaded once: a second start adds nothing and keeps changes made in the demo', async () => {
    const dbPath = join(dir, 'demo.sqlite');
    const first = await testServer({ dbPath, demo: true });
    const comments = DEMO_SKETCHES.reduce((n, s) => n + s.comments.length, 0);
    const runs = DEMO_SKETCHES.reduce((n, s) => n + s.runs.length, 0);
    expect(first.demoRowsAdded).toBe(1 + 2 * DEMO_USERS.length + DEMO_SKETCHES.length + comments + runs);
    const loaded = await counts(first.deps.db);
    expect(loaded).toMatchObject({ users: 5, groups: 1, memberships: 5, sketches: DEMO_SKETCHES.length, comments });
    // A cable sweep adds a row per cable beside its own: at least one row per run started.
    expect(loaded.runs).toBeGreaterThanOrEqual(runs);
    // Someone changes the demo; a restart must not undo it.
    const owner = DEMO_USERS.find((u) => u.role === 'owner')!;
    const viewer = DEMO_USERS.find((u) => u.role === 'viewer')!;
    const login = await request(first.url).post('/api/auth/login').send({ email: owner.email, password: owner.password });
    await request(first.url).delete(`/api/groups/${DEMO_GROUP.id}/members/${viewer.id}`).set(bearer(login.body.token)).expect(204);
    await first.stop();

    const second = await testServer({ dbPath, demo: true });
    try {
      expect(second.demoRowsAdded).toBe(0);
      expect(await counts(second.deps.db)).toEqual({ ...loaded, memberships: 4 });
    } finally {
      await second.stop();
    }
  });

  it('signs in every demo person with the printed password and the stated role', async () => {
    const server = await testServer({ demo: true });
    try {
      for (const u of DEMO_USERS) {
        const res = await request(server.url).post('/api/auth/login').send({ email: u.email, password: u.password });
        expect(res.status).toBe(200);
        const groups = GroupList.parse((await request(server.url).get('/api/groups').set(bearer(res.body.token))).body);
        expect(groups).toEqual([{ id: DEMO_GROUP.id, name: DEMO_GROUP.name, role: u.role }]);
      }
      const roles = MemberList.parse(
        (await request(server.url).get(`/api/groups/${DEMO_GROUP.id}/members`).set(bearer((await request(server.url).post('/api/auth/login').send(DEMO_USERS[0])).body.token))).body,
      ).map((m) => m.role);
      expect(roles.sort()).toEqual(['admin', 'member', 'member', 'owner', 'viewer']);
    } finally {
      await server.stop();
    }
  });

  it('tells a story in the feed: shared sketches newest first, their comments, and a pair with the same invariants', async () => {
    const server = await testServer({ demo: true });
    try {
      const viewer = DEMO_USERS.find((u) => u.role === 'viewer')!;
      const { token } = (await request(server.url).post('/api/auth/login').send(viewer)).body;
      // The Jones polynomials behind "same invariants" are computed off the request thread after start.
      const page = await summarisedFeed(server, { token }, DEMO_GROUP.id);
      const byAge = [...DEMO_SKETCHES].sort((a, b) => a.daysAgo - b.daysAgo);
      expect(page.items.map((i) => i.id)).toEqual(byAge.map((s) => s.id));
      expect(page.items.map((i) => i.commentCount)).toEqual(byAge.map((s) => s.comments.length));
      expect(page.items.every((i) => i.diagram.geometry !== null)).toBe(true); // the feed draws each one from its drawing
      const [week1, week3] = ['demo-sketch-trefoil-opening', 'demo-sketch-trefoil-handles'];
      const sketch = GroupSketch.parse((await request(server.url).get(feedPaths.groupSketch(DEMO_GROUP.id, week3)).set(bearer(token))).body);
      expect(sketch.sameInvariants.map((r) => r.id)).toContain(week1);
      // Runs the seed starts before the run pool's own start are not requeued by it: each one
      // that ends keeps the time it started.
      const runs = RunList.parse((await request(server.url).get(`/api/runs?groupId=${DEMO_GROUP.id}`).set(bearer(token))).body);
      expect(runs.length).toBe(DEMO_SKETCHES.reduce((n, s) => n + s.runs.length, 0));
      expect(runs.filter((r) => r.status !== 'queued' && r.startedAt === null)).toEqual([]);
    } finally {
      await server.stop();
    }
  });
});
