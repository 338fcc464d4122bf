// A length of time as people read it: "850 ms", "4.2 s", "12 min". Negative or NaN input (a
// clock that went backwards) reads as 0 ms.
export function formatDuration(ms: number): string {
  const t = Number.isFinite(ms) && ms > 0 ? ms : 0;
  if (t < 1000) return `${Math.round(t)} ms`;
  if (t < 120_000) return `${(t / 1000).toFixed(1)} s`;
  return `${Math.round(t / 60_000)} min`;
}
