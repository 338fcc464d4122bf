import { Router, type Request, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { PhotoVariant, maxPhotoBytes, photoPaths } from '@/shared/api/photos';
import { RecordId, Sha256 } from '@/shared/api/sketches';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { AppError } from '../http/errors';
import { parse } from '../http/validate';
import * as photos from './use-cases';

const SketchParams = z.object({ id: RecordId });
/** A photo added in the feed (UUID) or one a device attached to the sketch (its hash, S25). */
const PhotoParams = z.object({ photoId: z.union([z.uuid(), Sha256], { message: 'Photo id must be a UUID or a SHA-256 hash' }) });
const FileParams = PhotoParams.extend({ variant: PhotoVariant });
const FileQuery = z.object({ exp: z.coerce.number().int(), sig: z.string().min(1).max(100) });

// Memory storage: the bytes are checked and re-encoded before anything is written. No filter on
// the declared type or the name: image.ts decides by the content.
const multipart = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxPhotoBytes, files: 1 } });

const single: RequestHandler = (req, res, next) =>
  multipart.single('file')(req, res, (err?: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
      return next(new AppError('payload_too_large', 413, `A photo is at most ${maxPhotoBytes / (1024 * 1024)} MB`));
    }
    next(new AppError('invalid_input', 400, err instanceof Error ? err.message : 'Bad upload'));
  });

function fileOf(req: Request): Buffer {
  if (!req.file) throw new AppError('invalid_input', 400, 'Send one image in the form field "file"', { file: 'Required: a JPEG, PNG or WebP image' });
  return req.file.buffer;
}

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  router.get(photoPaths.photos(':id'), auth, async (req, res) => {
    const { id } = parse(SketchParams, req.params, 'path');
    res.json(await photos.list(deps, currentUser(req), id));
  });
  router.post(photoPaths.photos(':id'), auth, single, async (req, res) => {
    const { id } = parse(SketchParams, req.params, 'path');
    res.status(201).json(await photos.upload(deps, currentUser(req), id, fileOf(req)));
  });
  router.delete(photoPaths.photo(':photoId'), auth, async (req, res) => {
    const { photoId } = parse(PhotoParams, req.params, 'path');
    await photos.remove(deps, currentUser(req), photoId);
    res.status(204).end();
  });
  router.get(photoPaths.file(':photoId', ':variant' as PhotoVariant), async (req, res) => {
    const { photoId, variant } = parse(FileParams, req.params, 'path');
    const { exp, sig } = parse(FileQuery, req.query, 'query');
    const bytes = await photos.read(deps, photoId, variant, exp, sig);
    res.set({ 'Content-Type': 'image/jpeg', 'Cache-Control': 'private, max-age=3600', 'Cross-Origin-Resource-Policy': 'same-origin' }).send(bytes);
  });
  return router;
}
