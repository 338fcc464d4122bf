// The one error type of the server and the one middleware that turns errors into
// {"error": {"code", "message"}}. Anything that is not an AppError is a bug: it is logged with
// its stack and the client sees only "internal".
import type { ErrorRequestHandler } from 'express';
import type { ErrorCode } from '@/shared/api/errors';

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const notFound = (what = 'Not found') => new AppError('not_found', 404, what);
export const forbidden = (why: string) => new AppError('forbidden', 403, why);
export const unauthorized = (why = 'Sign in first') => new AppError('unauthorized', 401, why);

interface HttpError {
  type?: unknown;
  limit?: unknown;
  code?: unknown;
  status?: unknown;
  expose?: unknown;
  message?: unknown;
}

/** Errors body-parser and the router raise before any route runs (http-errors with a 4xx status). */
function fromParsers(err: HttpError): AppError | undefined {
  // zlib's codes (Z_DATA_ERROR, Z_BUF_ERROR...): the body is not what its Content-Encoding says.
  if (typeof err.code === 'string' && err.code.startsWith('Z_')) {
    return new AppError('invalid_input', 400, 'The request body could not be decompressed as its Content-Encoding says');
  }
  if (err instanceof URIError) return new AppError('invalid_input', 400, 'The path has a malformed %-escape');
  switch (err.type) {
    case 'entity.parse.failed':
      return new AppError('malformed_json', 400, 'The request body is not valid JSON');
    case 'entity.too.large':
      return new AppError('payload_too_large', 413, `The request body is larger than the limit of ${err.limit} bytes`);
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new AppError('invalid_input', 400, 'The request body must be UTF-8 JSON');
  }
  return err.status === 400 && err.expose === true ? new AppError('invalid_input', 400, String(err.message)) : undefined;
}

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = err instanceof AppError ? err : fromParsers(err ?? {});
  if (!known) req.log?.error({ err }, 'unhandled error');
  const e = known ?? new AppError('internal', 500, 'Something went wrong on the server');
  res.status(e.status).json({ error: { code: e.code, message: e.message, ...(e.fields && { fields: e.fields }) } });
};
