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

/** Errors body-parser raises before any route runs, by their `type`. */
function fromBodyParser(err: { type?: unknown; limit?: unknown }): AppError | undefined {
  switch (err.type) {
    case 'entity.parse.failed':
      return new AppError('malformed_json', 400, 'The request body is not valid JSON');
    case 'entity.too.large':
      return new AppError('payload_too_large', 413, `The request body is larger than the limit of ${err.limit} bytes`);
    case 'encoding.unsupported':
    case 'charset.unsupported':
      return new AppError('invalid_input', 400, 'The request body must be UTF-8 JSON');
    default:
      return undefined;
  }
}

export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const known = err instanceof AppError ? err : fromBodyParser(err ?? {});
  if (!known) req.log?.error({ err }, 'unhandled error');
  const e = known ?? new AppError('internal', 500, 'Something went wrong on the server');
  res.status(e.status).json({ error: { code: e.code, message: e.message, ...(e.fields && { fields: e.fields }) } });
};
