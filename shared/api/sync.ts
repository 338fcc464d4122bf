// The sync protocol's messages (sync/SPEC.md; rule ids in comments). Shared by the device
// engine (lib/sync), the pure protocol library (sync/) and the server (server/sync).
import { z } from 'zod';
import { RecordId, SketchFieldsPatch } from './sketches';

export const syncPaths = {
  push: '/api/sync/push',
  pull: '/api/sync/pull', // ?cursor=&limit=
  uploads: '/api/uploads', // POST multipart
  upload: (hash: string) => `/api/uploads/${hash}`, // HEAD / GET
} as const;

export const recordTypes = ['sketch', 'conflict'] as const; // S1
export const RecordType = z.enum(recordTypes);
export type RecordType = z.infer<typeof RecordType>;

export const ops = ['add', 'update', 'delete'] as const; // S5
export const Op = z.enum(ops);
export type Op = z.infer<typeof Op>;

export type Fields = Record<string, unknown>;
const FieldsObject = z.record(z.string(), z.unknown());

/** Who wrote a field's current value (S14, S18). */
export const Writer = z.object({
  deviceId: z.string(),
  clock: z.int().min(0),
  seq: z.int().min(0),
});
export type Writer = z.infer<typeof Writer>;

/** S20: the values that lost a same-field conflict, beside the ones that won. */
export const ConflictFields = z.object({
  recordId: RecordId,
  recordType: RecordType,
  losing: FieldsObject,
  winning: FieldsObject,
  losingWriter: Writer,
  winningWriter: Writer,
  resolved: z.boolean(),
  deleted: z.boolean(),
});
export type ConflictFields = z.infer<typeof ConflictFields>;
/** S21: a device may only mark a conflict copy resolved (or hide it). */
export const ConflictFieldsPatch = ConflictFields.pick({ resolved: true, deleted: true }).partial().strict();

/** What a mutation of each record type may carry (S24). */
export const fieldPatchSchemas = {
  sketch: SketchFieldsPatch,
  conflict: ConflictFieldsPatch,
} as const;

export const SyncRecord = z.object({
  id: RecordId,
  type: RecordType,
  version: z.int().min(0), // S3
  ownerId: z.string(),
  fields: FieldsObject,
});
export type SyncRecord = z.infer<typeof SyncRecord>;

export const Mutation = z.object({
  mutationId: z.uuid(), // S6
  deviceId: z.string().min(1).max(100), // S7
  clock: z.int().min(1), // S7
  recordId: RecordId, // S2
  type: RecordType,
  op: Op,
  baseVersion: z.int().min(0), // S5
  fields: FieldsObject,
});
export type Mutation = z.infer<typeof Mutation>;

export const maxPushMutations = 200;
/** Body limit of a push; the device also cuts its batches to stay below it. */
export const syncPushLimit = '8mb';
export const pushBatchBytes = 4 * 1024 * 1024;
export const PushRequest = z.object({
  deviceId: z.string().min(1).max(100),
  mutations: z.array(Mutation).max(maxPushMutations),
});
export type PushRequest = z.infer<typeof PushRequest>;

export const rejectReasons = ['forbidden', 'invalid'] as const; // S24
export const PushResult = z.object({
  mutationId: z.string(),
  status: z.enum(['applied', 'duplicate', 'rejected']), // S11, S12
  seq: z.int().optional(), // the change's seq; absent when nothing changed (S9)
  version: z.int().optional(), // the record's version after the mutation
  conflictId: z.string().optional(), // S20
  reason: z.enum(rejectReasons).optional(),
  message: z.string().optional(),
});
export type PushResult = z.infer<typeof PushResult>;
export const PushResponse = z.object({ results: z.array(PushResult) });
export type PushResponse = z.infer<typeof PushResponse>;

export const defaultPullLimit = 200;
export const maxPullLimit = 500;
/** S15: a page also stops past this many bytes of records (at least one record). */
export const maxPullPageBytes = 1024 * 1024;
export const PullQuery = z.object({
  cursor: z.coerce.number().int().min(0).default(0),
  limit: z.coerce.number().int().min(1).max(maxPullLimit).default(defaultPullLimit),
});
export type PullQuery = z.infer<typeof PullQuery>;

export const PulledChange = z.union([
  z.object({ seq: z.int(), record: SyncRecord }),
  z.object({ seq: z.int(), revoked: z.object({ id: RecordId, type: RecordType }) }), // S22
]);
export type PulledChange = z.infer<typeof PulledChange>;
/** S22a: whose view a pull answered: the user and the groups they are in, sorted. */
export const PullViewer = z.object({ userId: z.string(), groupIds: z.array(z.string()) });
export type PullViewer = z.infer<typeof PullViewer>;

export const PullResponse = z.object({
  changes: z.array(PulledChange),
  cursor: z.int().min(0), // S15: seq of the last change scanned
  hasMore: z.boolean(),
  viewer: PullViewer,
});
export type PullResponse = z.infer<typeof PullResponse>;

export const UploadResponse = z.object({
  sha256: z.string(),
  size: z.int(),
  mimeType: z.string(),
  created: z.boolean(), // false: the server already held these bytes (S26)
});
export type UploadResponse = z.infer<typeof UploadResponse>;
