import { Router, type Request, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { Sha256 } from '@/shared/api/sketches';
import { syncPaths } from '@/shared/api/sync';
import { currentUser, requireAuth } from '../auth/middleware';
import type { Deps } from '../deps';
import { AppError } from '../http/errors';
import { parse } from '../http/validate';
import * as uploads from './use-cases';

const Params = z.object({ hash: Sha256 });
const Body = z.object({ sha256: Sha256.optional() });

// Memory storage: the hash is computed over the bytes before anything is stored (S26).
const multipart = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: uploads.maxUploadBytes, files: 1 },
  fileFilter: (_req, file, cb) => cb(null, uploads.uploadTypes.includes(file.mimetype)),
});

/** multer's errors as the API's error shape. */
const single: RequestHandler = (req, res, next) =>
  multipart.single('file')(req, res, (err?: unknown) => {
    if (!err) return next();
    if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE') {
      return next(new AppError('payload_too_large', 413, `Attachments are at most ${uploads.maxUploadBytes} bytes`));
    }
    next(new AppError('invalid_input', 400, err instanceof Error ? err.message : 'Bad upload'));
  });

function fileOf(req: Request) {
  if (!req.file) {
    throw new AppError('invalid_input', 400, `Send one file in the field "file", of type ${uploads.uploadTypes.join(', ')}`, {
      file: 'Required, an image',
    });
  }
  return req.file;
}

export function routes(deps: Deps): Router {
  const router = Router();
  const auth = requireAuth(deps);
  router.post(syncPaths.uploads, auth, single, async (req, res) => {
    const { sha256 } = parse(Body, req.body ?? {});
    const out = await uploads.upload(deps, currentUser(req), fileOf(req), sha256);
    res.status(out.created ? 201 : 200).json(out);
  });
  router.head(syncPaths.upload(':hash'), auth, async (req, res) => {
    const { hash } = parse(Params, req.params, 'path');
    const meta = await uploads.stat(deps, currentUser(req), hash);
    res.set({ 'Content-Type': meta.mimeType, 'Content-Length': String(meta.size) }).status(200).end();
  });
  router.get(syncPaths.upload(':hash'), auth, async (req, res) => {
    const { hash } = parse(Params, req.params, 'path');
    const a = await uploads.read(deps, currentUser(req), hash);
    res.set({ 'Content-Type': a.mimeType, 'Cache-Control': 'private, max-age=31536000, immutable', ETag: `"${a.sha256}"` }).send(a.data);
  });
  return router;
}
