// The one way the app talks to the server: JSON over fetch, every answer parsed with the shared
// zod contract (shared/api), every failure turned into an ApiError the screens can switch on.
import { z } from 'zod';
import { ApiErrorBody, type ErrorCode } from '@/shared/api/errors';
import { authorizedFetch, serverUrl } from './http';

/** Failures that never reached (or never came back from) the server as a proper API error. */
export type ClientErrorCode = 'network' | 'bad_response';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode | ClientErrorCode,
    message: string,
    /** Field path -> message, for invalid_input (put them beside the form inputs). */
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

export function isApiError(e: unknown, code?: ApiError['code']): e is ApiError {
  return e instanceof ApiError && (code === undefined || e.code === code);
}

/** An absolute URL for a server path the API handed out (e.g. a signed photo URL for <Image>). */
export const apiUrl = serverUrl;

let tokenSource: () => string | null = () => null;
let onUnauthorized: () => void = () => {};

/** Wired once by the session store, so the client never imports React state. */
export function configureApi(opts: { token: () => string | null; onUnauthorized: () => void }) {
  tokenSource = opts.token;
  onUnauthorized = opts.onUnauthorized;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** Call `path`; parse a 2xx body with `schema` (null for 204 answers). */
export async function api<S extends z.ZodType>(
  method: Method,
  path: string,
  schema: S,
  body?: unknown,
): Promise<z.infer<S>>;
export async function api(method: Method, path: string, schema: null, body?: unknown): Promise<void>;
export async function api(method: Method, path: string, schema: z.ZodType | null, body?: unknown) {
  const token = tokenSource();
  const headers: Record<string, string> = { Accept: 'application/json' };
  // FormData (uploads) sets its own multipart Content-Type with the boundary.
  const form = typeof FormData !== 'undefined' && body instanceof FormData;
  if (body !== undefined && !form) headers['Content-Type'] = 'application/json';

  let res: Response;
  try {
    res = await authorizedFetch(serverUrl(path), {
      method,
      headers,
      body: body === undefined ? undefined : form ? (body as FormData) : JSON.stringify(body),
    }, token);
  } catch {
    throw new ApiError(0, 'network', 'Cannot reach the server. Check the connection and try again.');
  }

  const json: unknown = await res.json().catch(() => undefined);
  if (!res.ok) {
    const parsed = ApiErrorBody.safeParse(json);
    if (!parsed.success) {
      throw new ApiError(res.status, 'bad_response', `The server answered ${res.status} without an explanation.`);
    }
    const { code, message, fields } = parsed.data.error;
    // A stored token the server no longer accepts (expired, or the account is gone).
    if (res.status === 401 && code === 'unauthorized' && token) onUnauthorized();
    throw new ApiError(res.status, code, message, fields);
  }
  if (schema === null) return;
  const parsed = schema.safeParse(json);
  if (!parsed.success) {
    throw new ApiError(res.status, 'bad_response', 'The server sent an answer this app does not understand.');
  }
  return parsed.data;
}
