// "12 seconds ago", "5 minutes ago", "3 hours ago", then a date: how lists say when, in the reader's language.
const relative = new Intl.RelativeTimeFormat(undefined, { numeric: 'auto' });

export function when(iso: string, now = Date.now()): string {
  const t = Date.parse(iso);
  if (Number.isNaN(t)) return '';
  const sec = Math.min(0, Math.round((t - now) / 1000));
  const min = Math.round(sec / 60);
  if (min > -1) return relative.format(sec, 'second');
  if (min > -60) return relative.format(min, 'minute');
  if (min > -24 * 60) return relative.format(Math.round(min / 60), 'hour');
  return new Date(t).toLocaleDateString(undefined, { day: 'numeric', month: 'short', year: 'numeric' });
}
