/**
 * Where to go after signing in: the `next` query parameter when it is a path inside this app,
 * else the sketchbook. Anything else (another origin, "//host") is ignored, so a crafted
 * sign-in link cannot send people away.
 */
export function nextPath(next: string | string[] | undefined): string {
  const value = Array.isArray(next) ? next[0] : next;
  return value && value.startsWith('/') && !value.startsWith('//') ? value : '/sketches';
}

export function withNext(path: string, next: string | undefined): string {
  return next ? `${path}?next=${encodeURIComponent(next)}` : path;
}

/**
 * The path being visited, for `?next=`. A layout that redirects before its navigator mounts
 * gets "/" from usePathname(), so on web the address bar is the truth.
 */
export function visitedPath(routerPath: string): string {
  const loc = globalThis.location;
  return loc?.pathname ? loc.pathname + loc.search : routerPath;
}
