/**
 * Sliding-window limit on failed sign-ins: with `max` failures inside `windowSeconds`,
 * further attempts are refused until the oldest of the counted failures leaves the window.
 * Pure so it can be unit-tested; the caller supplies the failure times.
 */
export function retryAfterSeconds({
  failureTimes,
  max,
  windowSeconds,
  now,
}: {
  failureTimes: readonly Date[];
  max: number;
  windowSeconds: number;
  now: Date;
}): number | null {
  if (failureTimes.length < max) return null;
  const sorted = [...failureTimes].sort((a, b) => a.getTime() - b.getTime());
  // The attempt becomes possible again when only max-1 failures remain in the window.
  const freeing = sorted[sorted.length - max];
  const freeAtMs = freeing.getTime() + windowSeconds * 1000;
  const waitMs = freeAtMs - now.getTime();
  return waitMs > 0 ? Math.ceil(waitMs / 1000) : null;
}
