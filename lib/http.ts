// The one door to the server for the screens' `api()` and the sync engine's transport: the
// base URL and the bearer token are decided here, and a request that never got an answer
// becomes an UnreachableError for each caller to translate into its own failure kind.

/**
 * Web: same origin as the page (the server serves the build and /api). Native: the group's
 * server, from EXPO_PUBLIC_API_URL at build time.
 */
export const serverUrl = (path: string) => (process.env.EXPO_PUBLIC_API_URL ?? '') + path;

export class UnreachableError extends Error {
  constructor(cause: unknown) {
    super(cause instanceof Error ? cause.message : 'Network error');
    this.name = 'UnreachableError';
  }
}

export async function authorizedFetch(
  url: string,
  init: RequestInit,
  token: string | null,
  doFetch: typeof fetch = (input, i) => fetch(input, i),
): Promise<Response> {
  const headers = new Headers(init.headers);
  if (token) headers.set('Authorization', `Bearer ${token}`);
  try {
    return await doFetch(url, { ...init, headers });
  } catch (e) {
    throw new UnreachableError(e);
  }
}
