// S30: exponential back-off with full jitter (Brooker, "Exponential Backoff And Jitter",
// AWS Architecture Blog, 2015). `random` in [0, 1) is passed in so the function stays pure.
export const backoffBaseMs = 1_000;
export const backoffMaxMs = 5 * 60_000;

/** Delay before retry number `attempt` (1 = first retry). */
export function backoffDelay(attempt: number, random: number): number {
  const ceiling = Math.min(backoffMaxMs, backoffBaseMs * 2 ** Math.max(0, attempt - 1));
  return Math.round(ceiling / 2 + (random * ceiling) / 2);
}
