// A group with one account per role plus an outsider, and sketches pushed through sync the way
// a device writes them: the set-up of the feed, comment, photo and member tests.
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import sharp from 'sharp';
import { FeedPage } from '@/shared/api/feed';
import type { SketchFields } from '@/shared/api/sketches';
import type { Role } from '@/shared/api/groups';
import type { RunningServer } from '@/server/server';
import { bearer, groupWith, signUp, testServer } from './helpers';
import { mutation, push, sketchFields } from './sync-fixtures';

export interface Account {
  token: string;
  id: string;
  name: string;
}

export const roleNames = ['owner', 'admin', 'member', 'viewer'] as const satisfies readonly Role[];
export type Who = Role | 'outsider';
export const everyone: readonly Who[] = [...roleNames, 'outsider'];
/** Statuses of a write any member may make: `ok` for owner, admin and member, 403 for a viewer, 404 for an outsider (who does not see the group). */
export const memberWrite = (ok: number): [Who, number][] => [['owner', ok], ['admin', ok], ['member', ok], ['viewer', 403], ['outsider', 404]];

export interface Cast {
  group: string;
  /** A second group the outsider owns, for isolation checks. */
  otherGroup: string;
  as: Record<Who, Account>;
}

async function account(server: RunningServer, name: string): Promise<Account> {
  const a = await signUp(server, name);
  return { token: a.token, id: a.user.id, name };
}

export async function cast(server: RunningServer): Promise<Cast> {
  const as = {} as Record<Who, Account>;
  for (const who of everyone) as[who] = await account(server, `${who[0].toUpperCase()}${who.slice(1)} ${randomUUID().slice(0, 4)}`);
  const group = await groupWith(server, [[as.owner.id, 'owner'], [as.admin.id, 'admin'], [as.member.id, 'member'], [as.viewer.id, 'viewer']]);
  const otherGroup = await groupWith(server, [[as.outsider.id, 'owner']]);
  return { group, otherGroup, as };
}

/** A fresh server with a cast in it: the set-up of most feed test files. */
export async function castServer(options?: Parameters<typeof testServer>[0]): Promise<{ server: RunningServer; c: Cast }> {
  const server = await testServer(options);
  return { server, c: await cast(server) };
}

let clock = 1;
/** A sketch owned by `who`, created by a sync push (as a device would), optionally shared. */
export async function sketchOf(server: RunningServer, who: Account, over: Partial<SketchFields> = {}): Promise<string> {
  const id = randomUUID();
  const [r] = await push(server, who.token, 'phone-1', [mutation('phone-1', clock++, id, 'add', sketchFields(over))]);
  expect(r.status).toBe('applied');
  return id;
}

export const api = (server: RunningServer) => request(server.url);
export const auth = (a: Pick<Account, 'token'>) => bearer(a.token);

/**
 * The group's feed once no item's summary is still computing (the server computes them off the
 * request thread after a write, server/feed/summaries.ts).
 */
export async function summarisedFeed(server: RunningServer, who: Pick<Account, 'token'>, groupId: string, timeoutMs = 30_000): Promise<FeedPage> {
  for (const t0 = Date.now(); ; await new Promise((r) => setTimeout(r, 50))) {
    const page = FeedPage.parse((await api(server).get(`/api/groups/${groupId}/feed?limit=50`).set(auth(who))).body);
    if (!page.items.some((i) => i.invariants.computing)) return page;
    if (Date.now() - t0 > timeoutMs) throw new Error(`feed summaries still computing after ${timeoutMs} ms`);
  }
}

/** A real photo: a gradient JPEG carrying EXIF with a GPS position, as a phone camera writes it. */
export function cameraJpeg(width = 640, height = 480): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: { r: 30, g: 40, b: 50 } } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'TestCam', Model: 'Board 1' },
      // GPS IFD: the location the server must drop (Exif 2.32, tags GPSLatitude etc.).
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '48/1 51/1 24/1', GPSLongitudeRef: 'E', GPSLongitude: '2/1 21/1 3/1' },
    })
    .toBuffer();
}

export const pngImage = () => sharp({ create: { width: 64, height: 48, channels: 4, background: { r: 200, g: 0, b: 0, alpha: 0.5 } } }).png().toBuffer();
export const webpImage = () => sharp({ create: { width: 64, height: 48, channels: 3, background: '#336699' } }).webp().toBuffer();
export const gifImage = () => sharp({ create: { width: 16, height: 16, channels: 3, background: '#000000' } }).gif().toBuffer();
