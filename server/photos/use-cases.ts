// Board photos of a sketch. Whoever may see the sketch sees its photos; the members (not
// viewers) of the group it is shared to add them, its owner too while it is private; the uploader removes their own,
// owners and admins of the group remove any. Photos a device attached to the sketch record
// (server/uploads) use the same pipeline, files and signed URLs, under their hash.
import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import { canModerate, canPost } from '@/shared/api/feed-rules';
import type { Photo as PhotoDto, PhotoVariant } from '@/shared/api/photos';
import { Sha256 } from '@/shared/api/sketches';
import type { Photo } from '../db/entities';
import { inTransaction } from '../db/transaction';
import type { Deps } from '../deps';
import { sketchAccess } from '../feed/access';
import { usersById } from '../feed/repository';
import { attachmentMeta } from '../uploads/repository';
import { AppError, forbidden, notFound } from '../http/errors';
import { processPhoto, type ProcessedPhoto } from './image';
import * as repo from './repository';
import { checkSignature, signedPhotoUrl } from './signing';
import { photoStoreFor } from './store';

const keyOf = (id: string, variant: PhotoVariant) => `${id}/${variant}`;
const storeOf = (deps: Deps) => photoStoreFor(deps.config.photos);

export async function toDtos(deps: Deps, rows: Photo[]): Promise<PhotoDto[]> {
  const users = await usersById(deps.db, rows.map((p) => p.uploaderId));
  const now = deps.now();
  return rows.map((p) => ({
    id: p.id,
    sketchId: p.sketchId,
    uploader: { id: p.uploaderId, displayName: users.get(p.uploaderId)?.displayName ?? 'Former member' },
    width: p.width,
    height: p.height,
    url: signedPhotoUrl(deps.config.jwtSecret, p.id, 'full', now),
    thumbUrl: thumbUrl(deps, p.id),
    createdAt: p.createdAt.toISOString(),
  }));
}

export const thumbUrl = (deps: Deps, photoId: string) => signedPhotoUrl(deps.config.jwtSecret, photoId, 'thumb', deps.now());

export async function list(deps: Deps, caller: User, sketchId: string): Promise<PhotoDto[]> {
  await sketchAccess(deps.db, caller.id, sketchId);
  return toDtos(deps, await repo.photosOf(deps.db, sketchId));
}

export async function upload(deps: Deps, caller: User, sketchId: string, file: Buffer): Promise<PhotoDto> {
  const { sketch, isOwner, role } = await sketchAccess(deps.db, caller.id, sketchId);
  // A shared sketch takes photos from those who post in its group, its owner too: an owner
  // removed from the group (or made a viewer) adds none.
  if (sketch.groupId ? !(role && canPost(role)) : !isOwner) throw forbidden('Only members of the group the sketch is shared to add photos (not viewers)');
  const img = await processPhoto(file); // before anything is stored
  const row: Photo = { id: randomUUID(), sketchId, uploaderId: caller.id, width: img.width, height: img.height, bytes: img.full.length, createdAt: deps.now() };
  await storePhoto(deps, row.id, img, () => inTransaction(deps.db, (m) => repo.insertPhoto(m, row)));
  return (await toDtos(deps, [row]))[0];
}

/**
 * The pipeline's two files under one id (a photo's UUID, or a device photo's hash), then its
 * row (`save`); when anything fails neither file stays.
 */
export async function storePhoto<T>(deps: Deps, id: string, img: ProcessedPhoto, save: () => Promise<T>): Promise<T> {
  const store = storeOf(deps);
  try {
    await store.put(keyOf(id, 'full'), img.full, 'image/jpeg');
    await store.put(keyOf(id, 'thumb'), img.thumb, 'image/jpeg');
    return await save();
  } catch (err) {
    await Promise.all([store.delete(keyOf(id, 'full')), store.delete(keyOf(id, 'thumb'))]).catch(() => undefined);
    throw err;
  }
}

export const photoFile = (deps: Deps, id: string, variant: PhotoVariant) => storeOf(deps).get(keyOf(id, variant));

export async function remove(deps: Deps, caller: User, photoId: string): Promise<void> {
  if (Sha256.safeParse(photoId).success) {
    throw forbidden("This photo is part of the sketch, added on its owner's device: the owner removes it from the sketch's details, and the feed follows");
  }
  const p = await repo.findPhoto(deps.db, photoId);
  if (!p) throw notFound('No such photo');
  const { role } = await sketchAccess(deps.db, caller.id, p.sketchId).catch(() => {
    throw notFound('No such photo');
  });
  if (p.uploaderId !== caller.id && !(role && canModerate(role))) throw forbidden('Only the person who added a photo, an admin or an owner can remove it');
  await inTransaction(deps.db, (m) => repo.deletePhoto(m, p.id));
  const store = storeOf(deps);
  await Promise.all([store.delete(keyOf(p.id, 'full')), store.delete(keyOf(p.id, 'thumb'))]);
}

/** The bytes behind a signed URL (see signing.ts). */
export async function read(deps: Deps, photoId: string, variant: PhotoVariant, exp: number, sig: string): Promise<Buffer> {
  if (!checkSignature(deps.config.jwtSecret, photoId, variant, exp, sig, deps.now())) {
    throw new AppError('forbidden', 403, 'This photo link is invalid or has expired; reload the page');
  }
  const held = (await repo.findPhoto(deps.db, photoId)) ?? (await attachmentMeta(deps.db, photoId));
  const bytes = held && (await photoFile(deps, photoId, variant));
  if (!bytes) throw notFound('No such photo');
  return bytes;
}
