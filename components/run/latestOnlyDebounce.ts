/**
 * Debounce for the live estimate: a call waits `delayMs` of quiet before it runs, a newer
 * call replaces a waiting one, and a result that comes back after a newer call was made is
 * dropped — so the estimate on screen always belongs to the latest inputs.
 */
export interface LatestOnlyDebouncer<A> {
  /** Schedule `args`; any earlier scheduled or in-flight call becomes stale. */
  schedule: (args: A) => void;
  /** Forget anything waiting or in flight (e.g. on unmount). */
  cancel: () => void;
}

export interface TimerFunctions {
  setTimeout: (fn: () => void, ms: number) => unknown;
  clearTimeout: (handle: unknown) => void;
}

const defaultTimers: TimerFunctions = {
  setTimeout: (fn, ms) => globalThis.setTimeout(fn, ms),
  clearTimeout: (handle) => globalThis.clearTimeout(handle as ReturnType<typeof globalThis.setTimeout>),
};

export function latestOnlyDebounce<A, R>(
  work: (args: A) => Promise<R>,
  onResult: (result: R, args: A) => void,
  delayMs: number,
  options: { onError?: (error: unknown, args: A) => void; timers?: TimerFunctions } = {},
): LatestOnlyDebouncer<A> {
  const timers = options.timers ?? defaultTimers;
  let generation = 0;
  let handle: unknown = null;

  const cancel = () => {
    generation++;
    if (handle !== null) timers.clearTimeout(handle);
    handle = null;
  };

  const schedule = (args: A) => {
    cancel();
    const mine = generation;
    handle = timers.setTimeout(() => {
      handle = null;
      work(args).then(
        (result) => {
          if (mine === generation) onResult(result, args);
        },
        (error) => {
          if (mine === generation) options.onError?.(error, args);
        },
      );
    }, delayMs);
  };

  return { schedule, cancel };
}
