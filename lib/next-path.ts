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
