import type { ProgressEvent, ProgressSink } from '../solver/types';

/**
 * Posting every SCF or Davidson iteration across the worker boundary can flood the page's
 * main thread on fast runs. This passes the first event of each phase at once, then at
 * most one event per `intervalMs`, and always the last one held back (via `flush`).
 */
export function throttleProgress(
  sink: ProgressSink,
  intervalMs = 100,
  now: () => number = () => Date.now(),
): { push: ProgressSink; flush: () => void } {
  let lastSent = -Infinity;
  let lastPhase: string | undefined;
  let pending: ProgressEvent | undefined;
  const push = (event: ProgressEvent) => {
    const t = now();
    if (event.phase !== lastPhase && pending) {
      // The last event held back from the phase that just ended (e.g. the converged SCF iteration).
      sink(pending);
      pending = undefined;
    }
    if (event.phase !== lastPhase || t - lastSent >= intervalMs) {
      lastPhase = event.phase;
      lastSent = t;
      pending = undefined;
      sink(event);
    } else {
      pending = event;
    }
  };
  const flush = () => {
    if (pending) sink(pending);
    pending = undefined;
  };
  return { push, flush };
}
