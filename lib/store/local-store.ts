// The device store: every write lands in the records and, in the same transaction, in the
// outbox (sync/SPEC.md S8); pulls rebase records on their server snapshots (S16, S17).
import { SketchFields, SketchFieldsPatch, sketchDefaults } from '@/shared/api/sketches';
import type { ConflictFields, Fields, Mutation, Op, PullResponse, PullViewer, PushResult, RecordType } from '@/shared/api/sync';
import { byClock, coalesce, mutationFor, settle, type Rejected } from '@/sync/outbox';
import { applyPulled, outOfScope, sameViewer, type LocalRecord } from '@/sync/rebase';
import { numberKey, type Tables } from './tables';
import type { LocalComment, LocalConflict, LocalGroup, LocalSketch, PendingUpload, Revision, SketchRepository, SyncCounts, SyncStore } from './types';

/** The device's crypto comes in from outside (lib/crypto.ts in the app, node:crypto in tests). */
export interface StoreOptions {
  newId: () => string;
  sha256Hex: (bytes: Uint8Array) => Promise<string>;
  now?: () => Date;
}

const recordKey = (type: RecordType, id: string) => `${type}:${id}`;
const commentKey = (c: LocalComment) => `${c.sketchId}:${c.createdAt}:${c.id}`;
/** Comments stored before S34 carry no state: they were never sent. */
const waiting = (c: LocalComment) => (c.state ?? 'waiting') === 'waiting';

function toBase64(bytes: Uint8Array): string {
  let s = '';
  for (const b of bytes) s += String.fromCharCode(b);
  return btoa(s);
}

export class LocalStore implements SketchRepository, SyncStore {
  private queue: Promise<unknown> = Promise.resolve();
  private listeners = new Set<() => void>();
  private readonly newId: () => string;
  private readonly sha256Hex: (bytes: Uint8Array) => Promise<string>;
  private readonly now: () => Date;

  constructor(
    private readonly tables: Tables,
    opts: StoreOptions,
  ) {
    this.newId = opts.newId;
    this.sha256Hex = opts.sha256Hex;
    this.now = opts.now ?? (() => new Date());
  }

  /** One store operation at a time, each in a transaction. */
  private tx<T>(work: (t: Tables) => Promise<T>, notify = false): Promise<T> {
    const run = this.queue.catch(() => undefined).then(() => this.tables.transaction(work));
    this.queue = run;
    return notify ? run.then((v) => (this.listeners.forEach((l) => l()), v)) : run;
  }

  private async meta<T>(t: Tables, key: string, init: () => T): Promise<T> {
    const v = await t.get<T>('meta', key);
    if (v !== undefined) return v;
    const made = init();
    await t.put('meta', key, made);
    return made;
  }

  private toSketch(r: LocalRecord, pending: number): LocalSketch {
    const fields = r.fields as SketchFields;
    return { ...fields, id: r.id, version: r.base?.version ?? 0, pending, ownerId: r.base?.ownerId ?? null };
  }

  private async pendingFor(t: Tables, id: string): Promise<Mutation[]> {
    return (await t.list<Mutation>('outbox')).filter((m) => m.recordId === id);
  }

  /** S5-S8: apply a write locally and queue its mutation, atomically. */
  private write(type: RecordType, id: string, op: Op, fields: Fields): Promise<LocalRecord> {
    return this.tx(async (t) => {
      const deviceId = await this.meta(t, 'deviceId', this.newId);
      const clock = (await this.meta(t, 'clock', () => 0)) + 1;
      const existing = await t.get<LocalRecord>('records', recordKey(type, id));
      const m = mutationFor({ recordId: id, type, op, fields, baseVersion: existing?.base?.version ?? 0 }, deviceId, clock, this.newId());
      const start = existing?.fields ?? (type === 'sketch' ? sketchDefaults(this.now().toISOString()) : {});
      const record: LocalRecord = { id, type, base: existing?.base ?? null, fields: { ...start, ...m.fields } };
      const last = await t.get<Mutation>('outbox', numberKey(clock - 1));
      const joined = coalesce(last, m, (await t.get<number>('meta', 'sentUpTo')) ?? 0); // S8a
      if (joined) await t.remove('outbox', numberKey(clock - 1));
      await t.put('meta', 'clock', clock);
      await t.put('outbox', numberKey(clock), joined ?? m);
      await t.put('records', recordKey(type, id), record);
      const revision: Revision = { recordId: id, clock, at: this.now().toISOString(), fields: record.fields };
      await t.put('revisions', `${id}:${numberKey(clock)}`, revision);
      return record;
    }, true);
  }

  // ---- SketchRepository ----

  async list(opts: { includeDeleted?: boolean } = {}): Promise<LocalSketch[]> {
    const [records, outbox] = await this.tx((t) => Promise.all([t.list<LocalRecord>('records', 'sketch:'), t.list<Mutation>('outbox')]));
    return records
      .filter((r) => opts.includeDeleted || r.fields.deleted !== true)
      .map((r) => this.toSketch(r, outbox.filter((m) => m.recordId === r.id).length))
      .sort((a, b) => b.updatedAt.localeCompare(a.updatedAt));
  }

  async get(id: string): Promise<LocalSketch | null> {
    return this.tx(async (t) => {
      const r = await t.get<LocalRecord>('records', recordKey('sketch', id));
      return r ? this.toSketch(r, (await this.pendingFor(t, id)).length) : null;
    });
  }

  async create(init: Partial<SketchFields> = {}): Promise<LocalSketch> {
    const now = this.now().toISOString();
    const fields = SketchFields.parse({ ...sketchDefaults(now), ...init, deleted: false });
    const id = this.newId();
    return this.toSketch(await this.write('sketch', id, 'add', fields), 1);
  }

  async update(id: string, patch: SketchFieldsPatch): Promise<LocalSketch> {
    const fields = SketchFieldsPatch.parse({ ...patch, updatedAt: patch.updatedAt ?? this.now().toISOString() });
    const r = await this.write('sketch', id, 'update', fields);
    return (await this.get(r.id))!;
  }

  async remove(id: string): Promise<void> {
    await this.write('sketch', id, 'delete', { updatedAt: this.now().toISOString() });
  }

  revisions(id: string): Promise<Revision[]> {
    return this.tx((t) => t.list<Revision>('revisions', `${id}:`));
  }

  async conflicts(): Promise<LocalConflict[]> {
    const records = await this.tx((t) => t.list<LocalRecord>('records', 'conflict:'));
    return records
      .map((r) => ({ ...(r.fields as ConflictFields), id: r.id }))
      .filter((c) => !c.resolved && !c.deleted);
  }

  async resolveConflict(conflictId: string, chosen: SketchFieldsPatch): Promise<void> {
    const c = await this.tx((t) => t.get<LocalRecord>('records', recordKey('conflict', conflictId)));
    if (!c) throw new Error(`No conflict ${conflictId} on this device`);
    const recordId = (c.fields as ConflictFields).recordId;
    if (Object.keys(chosen).length > 0) await this.update(recordId, chosen);
    await this.write('conflict', conflictId, 'update', { resolved: true });
  }

  async addComment(sketchId: string, body: string, id = this.newId()): Promise<LocalComment> {
    const comment: LocalComment = { id, sketchId, body, createdAt: this.now().toISOString(), state: 'waiting' };
    await this.tx((t) => t.put('comments', commentKey(comment), comment), true);
    return comment;
  }

  async comments(sketchId: string): Promise<LocalComment[]> {
    const list = await this.tx((t) => t.list<LocalComment>('comments', `${sketchId}:`));
    return list.map((c) => ({ ...c, state: c.state ?? 'waiting' }));
  }

  discardComment(comment: LocalComment): Promise<void> {
    return this.tx((t) => t.remove('comments', commentKey(comment)), true);
  }

  async rejected(recordId: string): Promise<Rejected[]> {
    const list = await this.tx((t) => t.list<Rejected>('rejected'));
    return list.filter((r) => r.mutation.recordId === recordId).sort((a, b) => byClock(a.mutation, b.mutation));
  }

  dismissRejected(mutationId: string): Promise<void> {
    return this.tx((t) => t.remove('rejected', mutationId), true);
  }

  async queueUpload(bytes: Uint8Array, mimeType: string): Promise<string> {
    const sha256 = await this.sha256Hex(bytes);
    const item: PendingUpload = { sha256, mimeType, base64: toBase64(bytes) };
    await this.tx((t) => t.put('uploads', sha256, item), true);
    return sha256;
  }

  cacheRun(key: string, value: unknown): Promise<void> {
    return this.tx((t) => t.put('runs', key, value));
  }

  cachedRun<T>(key: string): Promise<T | undefined> {
    return this.tx((t) => t.get<T>('runs', key));
  }

  rememberGroups(groups: LocalGroup[]): Promise<void> {
    return this.tx((t) => t.put('meta', 'groups', groups), true);
  }

  groups(): Promise<LocalGroup[]> {
    return this.tx(async (t) => (await t.get<LocalGroup[]>('meta', 'groups')) ?? []);
  }

  subscribe(listener: () => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  // ---- SyncStore ----

  deviceId(): Promise<string> {
    return this.tx((t) => this.meta(t, 'deviceId', this.newId));
  }

  cursor(): Promise<number> {
    return this.tx(async (t) => (await t.get<number>('meta', 'cursor')) ?? 0);
  }

  /** The oldest waiting mutations; from now on they count as sent and no write joins them (S8a). */
  outbox(limit: number): Promise<Mutation[]> {
    return this.tx(async (t) => {
      const box = (await t.list<Mutation>('outbox', '', limit)).sort(byClock);
      const sentUpTo = (await t.get<number>('meta', 'sentUpTo')) ?? 0;
      if (box.length > 0 && box[box.length - 1].clock > sentUpTo) await t.put('meta', 'sentUpTo', box[box.length - 1].clock);
      return box;
    });
  }

  settle(sent: readonly Mutation[], results: readonly PushResult[]): Promise<void> {
    return this.tx(async (t) => {
      const { done, rejected } = settle(sent, results);
      const gone = new Set([...done, ...rejected.map((r) => r.mutation.mutationId)]);
      for (const m of sent) if (gone.has(m.mutationId)) await t.remove('outbox', numberKey(m.clock));
      for (const r of rejected) await t.put('rejected', r.mutation.mutationId, r satisfies Rejected);
    }, true);
  }

  storePage(page: PullResponse): Promise<boolean> {
    return this.tx(async (t) => {
      const box = (await t.count('outbox')) > 0 ? await t.list<Mutation>('outbox') : [];
      const before = await t.get<PullViewer>('meta', 'viewer');
      await t.put('meta', 'viewer', page.viewer);
      if (before && !sameViewer(before, page.viewer)) {
        for (const r of await t.list<LocalRecord>('records')) {
          if (outOfScope(r, page.viewer, box)) await t.remove('records', recordKey(r.type, r.id));
        }
        await t.put('meta', 'cursor', 0);
        return false;
      }
      for (const change of page.changes) {
        const ref = 'record' in change ? change.record : change.revoked;
        const key = recordKey(ref.type, ref.id);
        const effect = applyPulled(await t.get<LocalRecord>('records', key), change, box);
        if (effect.kind === 'put') await t.put('records', key, effect.record);
        if (effect.kind === 'drop') await t.remove('records', key);
      }
      await t.put('meta', 'cursor', page.cursor);
      return true;
    }, true);
  }

  pendingUploads(): Promise<PendingUpload[]> {
    return this.tx((t) => t.list<PendingUpload>('uploads'));
  }

  uploaded(sha256: string): Promise<void> {
    return this.tx((t) => t.remove('uploads', sha256));
  }

  commentsToSend(): Promise<LocalComment[]> {
    return this.tx(async (t) => {
      const blocked = new Set((await t.list<Mutation>('outbox')).map((m) => m.recordId));
      const list = (await t.list<LocalComment>('comments')).filter((c) => waiting(c) && !blocked.has(c.sketchId));
      return list.map((c) => ({ ...c, state: 'waiting' as const })).sort((a, b) => a.createdAt.localeCompare(b.createdAt));
    });
  }

  commentSettled(comment: LocalComment, refused?: string): Promise<void> {
    const settled: LocalComment = refused === undefined ? { ...comment, state: 'sent' } : { ...comment, state: 'rejected', reason: refused };
    return this.tx((t) => t.put('comments', commentKey(comment), settled), true);
  }

  async counts(): Promise<SyncCounts> {
    const [waitingCount, rejected, uploads, comments] = await this.tx((t) =>
      Promise.all([t.count('outbox'), t.count('rejected'), t.count('uploads'), t.list<LocalComment>('comments')]),
    );
    return { waiting: waitingCount, rejected, uploads, comments: comments.filter(waiting).length, conflicts: (await this.conflicts()).length };
  }
}
