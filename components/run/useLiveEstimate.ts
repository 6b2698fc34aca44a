'use client';
import { useEffect, useRef, useState } from 'react';
import type { RunEstimate } from '../../solver/run/result';
import type { WorkerOutcome } from '../../workers/solver.worker';
import { runFileSchema } from '../../solver/runFile/schema';
import { systemParity } from './electronParity';
import { latestOnlyDebounce } from './latestOnlyDebounce';

export type LiveEstimate =
  | { kind: 'waiting' }
  | { kind: 'blocked'; message: string }
  | { kind: 'ok'; estimate: RunEstimate }
  | { kind: 'error'; message: string; field?: string };

/** Quiet time before an estimate is asked for: long enough to skip keystrokes, short enough to feel live. */
export const ESTIMATE_DELAY_MS = 300;

/**
 * The size of the run the form describes, asked of the worker a moment after typing stops.
 * Inputs the schema or the parity check reject are not sent: the form already says what
 * is wrong with them.
 */
export function useLiveEstimate(
  /** The form's values as JSON text: a string key changes exactly when the inputs do. */
  key: string,
  estimate: (runFile: unknown) => Promise<WorkerOutcome<RunEstimate>>,
  ready: boolean,
  blockedBy: string | null,
): LiveEstimate {
  const [state, setState] = useState<LiveEstimate>({ kind: 'waiting' });
  const debouncer = useRef<ReturnType<typeof latestOnlyDebounce<unknown, WorkerOutcome<RunEstimate>>> | null>(null);

  useEffect(() => {
    const d = latestOnlyDebounce<unknown, WorkerOutcome<RunEstimate>>(
      (runFile) => estimate(runFile),
      (outcome) =>
        setState(
          outcome.ok
            ? { kind: 'ok', estimate: outcome.value }
            : { kind: 'error', message: outcome.error.message, field: outcome.error.field },
        ),
      ESTIMATE_DELAY_MS,
      { onError: (error) => setState({ kind: 'error', message: error instanceof Error ? error.message : String(error) }) },
    );
    debouncer.current = d;
    return () => d.cancel();
  }, [estimate]);

  useEffect(() => {
    const d = debouncer.current;
    if (!d) return;
    if (blockedBy) {
      d.cancel();
      setState({ kind: 'blocked', message: blockedBy });
      return;
    }
    const parsed = runFileSchema.safeParse(JSON.parse(key));
    const parity = parsed.success ? systemParity(parsed.data.system) : null;
    if (!parsed.success || (parity && !parity.ok)) {
      d.cancel();
      setState({ kind: 'blocked', message: 'Fix the marked fields to see the size of this run.' });
      return;
    }
    if (!ready) {
      setState({ kind: 'waiting' });
      return;
    }
    setState((s) => (s.kind === 'ok' ? s : { kind: 'waiting' }));
    d.schedule(parsed.data);
  }, [key, ready, blockedBy]);

  return state;
}
