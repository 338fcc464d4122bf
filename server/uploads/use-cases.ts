// Attachments by content hash (sync/SPEC.md S25-S28), through the same pipeline as the feed's
// board photos (server/photos): re-encoded without metadata, thumbnailed, kept in the
// PhotoStore under the hash of the bytes the device sent, shown in the feed as the sketch's photos.
import { createHash } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import type { Photo } from '@/shared/api/photos';
import type { UploadResponse } from '@/shared/api/sync';
import type { Sketch } from '../db/entities';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { usersById } from '../feed/repository';
import { AppError, notFound } from '../http/errors';
import { processPhoto } from '../photos/image';
import { signedPhotoUrl } from '../photos/signing';
import { photoFile, storePhoto } from '../photos/use-cases';
import { seesAttachment } from '../sketches/repository';
import { viewerOf } from '../sync/repository';
import * as repo from './repository';

export const uploadTypes = ['image/jpeg', 'image/png', 'image/webp'];
export const maxUploadBytes = 10 * 1024 * 1024;

/** What the server holds under a hash. A row from before the pipeline goes through it now; one that never was an image is not held. */
async function held(deps: Deps, sha256: string): Promise<repo.AttachmentMeta | null> {
  const a = await repo.attachmentMeta(deps.db, sha256);
  if (!a || a.width !== null) return a;
  const img = await processPhoto((await repo.legacyData(deps.db, sha256)) ?? Buffer.alloc(0)).catch(() => null);
  if (!img) return null;
  const done = { sha256, size: img.full.length, mimeType: 'image/jpeg', width: img.width, height: img.height };
  await storePhoto(deps, sha256, img, () => inTransaction(deps.db, (em) => repo.markProcessed(em, done)));
  return { ...done, createdAt: a.createdAt };
}

export async function upload(deps: Deps, user: User, file: { buffer: Buffer; mimetype: string }, claimed?: string): Promise<UploadResponse> {
  const sha256 = createHash('sha256').update(file.buffer).digest('hex');
  if (claimed && claimed !== sha256) {
    // A claimed hash that does not match means the bytes were damaged on the way: retry.
    throw new AppError('invalid_input', 400, 'The bytes do not match the sha256 sent with them', { sha256: 'Does not match the file' });
  }
  const had = await held(deps, sha256);
  const img = had ? null : await processPhoto(file.buffer); // 415 before anything is stored
  const kept = had ?? { sha256, size: img!.full.length, mimeType: 'image/jpeg', width: img!.width, height: img!.height };
  const save = () => inTransaction(deps.db, (em) => repo.storeAttachment(em, { ...kept, data: null }, user.id));
  const created = img ? await storePhoto(deps, sha256, img, save) : await save();
  return { sha256, size: kept.size, mimeType: kept.mimeType, created };
}

/** S27: the uploader, or anyone who may see a sketch listing the hash; else 404. */
async function mayRead(deps: Deps, user: User, sha256: string): Promise<boolean> {
  if (await repo.isUploader(deps.db, sha256, user.id)) return true;
  return seesAttachment(deps.db, await viewerOf(deps.db, user.id), sha256);
}

export async function stat(deps: Deps, user: User, sha256: string) {
  const meta = (await mayRead(deps, user, sha256)) && (await held(deps, sha256));
  if (!meta) throw notFound('No such attachment');
  return meta;
}

/** S27: the re-encoded image (never the bytes as sent). */
export async function read(deps: Deps, user: User, sha256: string) {
  const meta = await stat(deps, user, sha256);
  const data = await photoFile(deps, sha256, 'full');
  if (!data) throw notFound('No such attachment');
  return { ...meta, data };
}

/**
 * The photos each sketch lists in `attachments` that the server holds and its owner uploaded, in list order, as the
 * feed shows photos: the owner's (only the owner writes a sketch, S23), with signed URLs.
 * Callers have checked that the caller may see these sketches.
 */
export async function attachmentPhotos(deps: Deps, sketches: Pick<Sketch, 'id' | 'ownerId' | 'attachments'>[]): Promise<Map<string, Photo[]>> {
  const hashes = [...new Set(sketches.flatMap((s) => s.attachments))];
  const rows = await repo.attachmentsIn(deps.db, hashes);
  // Only photos the sketch's owner uploaded: a hash listed by someone who never had the bytes shows nothing.
  const uploaded = await repo.uploadsOf(deps.db, hashes);
  const byHash = new Map<string, repo.AttachmentMeta>();
  for (const r of rows) {
    const a = r.width === null ? await held(deps, r.sha256) : r;
    if (a) byHash.set(a.sha256, a);
  }
  const users = await usersById(deps.db, sketches.map((s) => s.ownerId));
  const now = deps.now();
  const photoOf = (s: Pick<Sketch, 'id' | 'ownerId'>, a: repo.AttachmentMeta): Photo => ({
    id: a.sha256,
    sketchId: s.id,
    uploader: { id: s.ownerId, displayName: users.get(s.ownerId)?.displayName ?? 'Former member' },
    width: a.width!,
    height: a.height!,
    url: signedPhotoUrl(deps.config.jwtSecret, a.sha256, 'full', now),
    thumbUrl: signedPhotoUrl(deps.config.jwtSecret, a.sha256, 'thumb', now),
    createdAt: a.createdAt.toISOString(),
  });
  return new Map(sketches.map((s) => [s.id, s.attachments.flatMap((h) => (byHash.has(h) && uploaded.has(`${h} ${s.ownerId}`) ? [photoOf(s, byHash.get(h)!)] : []))]));
}
