// The engine's view of the server: push, pull and uploads over fetch, answers checked with the
// shared zod contract. Failures become TransportError so the engine can tell "try later"
// (network, 5xx) from "stop" (401) and "our bug" (other 4xx).
import { Comment, commentPaths, type NewCommentRequest } from '@/shared/api/comments';
import { PullResponse, PushResponse, syncPaths, type PushRequest } from '@/shared/api/sync';
import { authorizedFetch } from '@/lib/http';

export type TransportFailure = 'network' | 'unauthorized' | 'server' | 'client';

export class TransportError extends Error {
  constructor(
    readonly kind: TransportFailure,
    message: string,
    readonly status = 0,
  ) {
    super(message);
    this.name = 'TransportError';
  }
}

export interface SyncTransport {
  push(req: PushRequest): Promise<PushResponse>;
  pull(cursor: number, limit: number): Promise<PullResponse>;
  hasUpload(sha256: string): Promise<boolean>;
  upload(sha256: string, mimeType: string, bytes: Uint8Array): Promise<void>;
  /** S34: 201 new or 200 already made (same id); refusals (4xx, 404 too) are `client` errors. */
  postComment(sketchId: string, req: NewCommentRequest): Promise<Comment>;
}

export interface HttpOptions {
  /** The server's origin ('' on web); a function, so a test can move the server (restart on another port). */
  baseUrl: () => string;
  token: () => string | null;
  fetch?: typeof fetch;
}

export function httpTransport(opts: HttpOptions): SyncTransport {
  async function call(path: string, init: RequestInit): Promise<Response> {
    let res: Response;
    try {
      res = await authorizedFetch(opts.baseUrl() + path, init, opts.token(), opts.fetch);
    } catch (e) {
      throw new TransportError('network', (e as Error).message);
    }
    if (res.ok || res.status === 404) return res;
    const kind = res.status === 401 ? 'unauthorized' : res.status >= 500 || res.status === 429 ? 'server' : 'client';
    throw new TransportError(kind, `${init.method ?? 'GET'} ${path} answered ${res.status}`, res.status);
  }

  const json = async (res: Response) => {
    try {
      return await res.json();
    } catch {
      throw new TransportError('network', 'The answer was cut off');
    }
  };

  return {
    async push(req) {
      const res = await call(syncPaths.push, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(req) });
      return PushResponse.parse(await json(res));
    },
    async pull(cursor, limit) {
      return PullResponse.parse(await json(await call(`${syncPaths.pull}?cursor=${cursor}&limit=${limit}`, { method: 'GET' })));
    },
    async hasUpload(sha256) {
      return (await call(syncPaths.upload(sha256), { method: 'HEAD' })).status === 200;
    },
    async upload(sha256, mimeType, bytes) {
      const form = new FormData();
      form.append('sha256', sha256);
      form.append('file', new Blob([new Uint8Array(bytes)], { type: mimeType }), `${sha256}.${mimeType.split('/')[1]}`);
      await call(syncPaths.uploads, { method: 'POST', body: form });
    },
    async postComment(sketchId, req) {
      const path = commentPaths.comments(sketchId);
      const res = await call(path, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(req) });
      if (res.status === 404) throw new TransportError('client', `POST ${path} answered 404`, 404);
      return Comment.parse(await json(res));
    },
  };
}
