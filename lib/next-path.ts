import type { Href } from 'expo-router';

// Any origin will do: only whether `next` stays on it matters.
const HERE = 'https://overstrand.invalid';

/**
 * Where to go after signing in: the `next` query parameter when it is a path inside this app,
 * else the sketchbook. Anything that a browser would resolve to another origin ("//host",
 * "/\host", "https:host", tabs or newlines inside) is ignored, so a crafted sign-in link cannot
 * send people away. The URL parser decides, as the browser will, not a string prefix.
 */
export function nextPath(next: string | string[] | undefined): Href {
  const value = Array.isArray(next) ? next[0] : next;
  if (!value?.startsWith('/')) return '/sketches';
  let url: URL;
  try {
    url = new URL(value, HERE);
  } catch {
    return '/sketches';
  }
  // A checked path of this app: the router resolves it (or shows its not-found page).
  return url.origin === HERE ? ((url.pathname + url.search + url.hash) as Href) : '/sketches';
}

export function withNext(pathname: '/sign-in' | '/sign-up', next: string | undefined): Href {
  return next ? { pathname, params: { next } } : pathname;
}

/**
 * The path being visited, for `?next=`. A layout that redirects before its navigator mounts
 * gets "/" from usePathname(), so on web the address bar is the truth.
 */
export function visitedPath(routerPath: string): string {
  const loc = globalThis.location;
  return loc?.pathname ? loc.pathname + loc.search : routerPath;
}
