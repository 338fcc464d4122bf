import type { Href } from 'expo-router';

/**
 * Where to go after signing in: the `next` query parameter when it is a path inside this app,
 * else the sketchbook. Anything else (another origin, "//host") is ignored, so a crafted
 * sign-in link cannot send people away.
 */
export function nextPath(next: string | string[] | undefined): Href {
  const value = Array.isArray(next) ? next[0] : next;
  // A checked path of this app: the router resolves it (or shows its not-found page).
  return value && value.startsWith('/') && !value.startsWith('//') ? (value as Href) : '/sketches';
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
