// What the Slate and the Sketches screens use (SketchRepository) and what the sync engine
// uses (SyncStore). One implementation serves both: local-store.ts.
import type { SketchFields, SketchFieldsPatch } from '@/shared/api/sketches';
import type { ConflictFields, Mutation, PullResponse, PushResult } from '@/shared/api/sync';
import type { Rejected } from '@/sync/outbox';

export interface LocalSketch extends SketchFields {
  id: string;
  /** Server version of the base this view is built on (0: never synced). */
  version: number;
  /** Changes of this sketch still waiting in the outbox. */
  pending: number;
  /** From the server snapshot; null for a sketch made here and never pulled (so it is mine). */
  ownerId: string | null;
}

/** A group as the device last saw it (kept so the Slate can share and name groups offline). */
export interface LocalGroup {
  id: string;
  name: string;
  role: 'owner' | 'admin' | 'member' | 'viewer';
}

export interface LocalConflict extends ConflictFields {
  id: string;
}

export interface Revision {
  recordId: string;
  clock: number;
  at: string;
  fields: Record<string, unknown>;
}

export interface LocalComment {
  /** Made on the device and sent with the comment, so a retried post is not a second one (S34). */
  id: string;
  sketchId: string;
  body: string;
  createdAt: string;
  /** S34: waiting to be posted, posted, or refused by the server (kept, with the reason). */
  state: 'waiting' | 'sent' | 'rejected';
  reason?: string;
}

export interface PendingUpload {
  sha256: string;
  mimeType: string;
  /** The bytes, base64: JSON storage on every platform. */
  base64: string;
}

export interface SketchRepository {
  list(opts?: { includeDeleted?: boolean }): Promise<LocalSketch[]>;
  get(id: string): Promise<LocalSketch | null>;
  create(init?: Partial<SketchFields>): Promise<LocalSketch>;
  update(id: string, patch: SketchFieldsPatch): Promise<LocalSketch>;
  remove(id: string): Promise<void>;
  revisions(id: string): Promise<Revision[]>;
  conflicts(): Promise<LocalConflict[]>;
  /** S21: write the chosen values to the sketch and mark the conflict copy resolved. */
  resolveConflict(conflictId: string, chosen: SketchFieldsPatch): Promise<void>;
  /** `id`: when an online post of the same comment may have reached the server already (S34). */
  addComment(sketchId: string, body: string, id?: string): Promise<LocalComment>;
  comments(sketchId: string): Promise<LocalComment[]>;
  /** The author drops a comment the server refused (S34): it leaves the device. */
  discardComment(comment: LocalComment): Promise<void>;
  /** S24: the writes of one record the server refused, kept with the reason until dismissed. */
  rejected(recordId: string): Promise<Rejected[]>;
  dismissRejected(mutationId: string): Promise<void>;
  /** S28: keep a photo until the server has it; answers its hash to list in `attachments`. */
  queueUpload(bytes: Uint8Array, mimeType: string): Promise<string>;
  cacheRun(key: string, value: unknown): Promise<void>;
  cachedRun<T>(key: string): Promise<T | undefined>;
  /** The user's groups and roles as last fetched, for sharing and group names while offline. */
  rememberGroups(groups: LocalGroup[]): Promise<void>;
  groups(): Promise<LocalGroup[]>;
  /** Called after every change of the store (local write or pull). */
  subscribe(listener: () => void): () => void;
}

export interface SyncCounts {
  waiting: number;
  conflicts: number;
  rejected: number;
  uploads: number;
  /** Comments written offline still waiting to be posted (S34). */
  comments: number;
}

export interface SyncStore {
  deviceId(): Promise<string>;
  cursor(): Promise<number>;
  outbox(limit: number): Promise<Mutation[]>;
  /** S8: `sent` is the batch the results answer. */
  settle(sent: readonly Mutation[], results: readonly PushResult[]): Promise<void>;
  /**
   * S16: the page's records and its cursor in one transaction. False (page not stored, cursor
   * back to 0) when the user's groups changed since the last pull (S22a).
   */
  storePage(page: PullResponse): Promise<boolean>;
  pendingUploads(): Promise<PendingUpload[]>;
  uploaded(sha256: string): Promise<void>;
  /** S34: waiting comments, oldest first, leaving out those whose sketch still has outbox writes. */
  commentsToSend(): Promise<LocalComment[]>;
  /** S34: posted (no reason) or refused by the server (the reason). */
  commentSettled(comment: LocalComment, refused?: string): Promise<void>;
  counts(): Promise<SyncCounts>;
}
