// Attachments by content hash (sync/SPEC.md S25-S28).
import { createHash } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import type { UploadResponse } from '@/shared/api/sync';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { AppError, notFound } from '../http/errors';
import { seesAttachment } from '../sketches/repository';
import { viewerOf } from '../sync/repository';
import * as repo from './repository';

export const uploadTypes = ['image/jpeg', 'image/png', 'image/webp'];
export const maxUploadBytes = 10 * 1024 * 1024;

export function upload(deps: Deps, user: User, file: { buffer: Buffer; mimetype: string }, claimed?: string): Promise<UploadResponse> {
  const sha256 = createHash('sha256').update(file.buffer).digest('hex');
  if (claimed && claimed !== sha256) {
    // A claimed hash that does not match means the bytes were damaged on the way: retry.
    throw new AppError('invalid_input', 400, 'The bytes do not match the sha256 sent with them', { sha256: 'Does not match the file' });
  }
  return inTransaction(deps.db, async (em) => {
    const created = await repo.storeAttachment(em, { sha256, size: file.buffer.length, mimeType: file.mimetype, data: file.buffer }, user.id);
    return { sha256, size: file.buffer.length, mimeType: file.mimetype, created };
  });
}

/** S27: the uploader, or anyone who may see a sketch listing the hash; else 404. */
async function mayRead(deps: Deps, user: User, sha256: string): Promise<boolean> {
  if (await repo.isUploader(deps.db, sha256, user.id)) return true;
  return seesAttachment(deps.db, await viewerOf(deps.db, user.id), sha256);
}

export async function stat(deps: Deps, user: User, sha256: string) {
  const meta = await repo.attachmentMeta(deps.db, sha256);
  if (!meta || !(await mayRead(deps, user, sha256))) throw notFound('No such attachment');
  return meta;
}

export async function read(deps: Deps, user: User, sha256: string) {
  await stat(deps, user, sha256);
  return (await repo.findAttachment(deps.db, sha256))!;
}
