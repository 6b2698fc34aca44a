'use client';
import { startTransition, useCallback, useEffect, useRef, useState } from 'react';
import * as Comlink from 'comlink';
import type { SolverWorkerApi, WorkerOutcome } from '../../workers/solver.worker';
import type { RunEstimate, RunResult } from '../../solver/run/result';
import type { ProgressEvent } from '../../solver/types';
import { applyProgress, EMPTY_PROGRESS, type ProgressLog } from './progressLog';

/**
 * The page's handle on the solver. Runs go to one dedicated worker; live estimates go to a
 * second one, so typing keeps getting estimates while a long run holds the first. The
 * form's inputs live in react-hook-form on the main thread, so a worker that crashes or is
 * cancelled loses nothing the user typed.
 */
export type RunStatus = 'idle' | 'running' | 'done' | 'failed' | 'cancelled';

export interface RunFailure {
  /** 'crash' when the worker itself died; otherwise the solver's error code. */
  code: string;
  message: string;
  field?: string;
  issues?: { path: string; message: string }[];
}

export interface SolverHandle {
  worker: Worker;
  api: Comlink.Remote<SolverWorkerApi>;
  /** Rejects when the worker dies: a call it was answering would otherwise wait forever. */
  crashed: Promise<never>;
}

/** A new solver worker; the results view starts its own for the Hamiltonian map and downloads. */
export function spawnSolverWorker(onCrash: (message: string) => void): SolverHandle {
  const worker = new Worker(new URL('../../workers/solver.worker.ts', import.meta.url), { type: 'module' });
  let reject: (error: Error) => void = () => {};
  const crashed = new Promise<never>((_, r) => {
    reject = r;
  });
  crashed.catch(() => {}); // nobody may be waiting when it happens
  const die = (message: string) => {
    reject(new Error(message));
    onCrash(message);
  };
  worker.addEventListener('error', (event) => {
    // An uncaught error or a failed allocation inside the worker; the worker is unusable after it.
    event.preventDefault();
    die(event.message || 'the solver worker stopped without a message');
  });
  worker.addEventListener('messageerror', () => die('the solver worker sent a message the page could not read'));
  return { worker, api: Comlink.wrap<SolverWorkerApi>(worker), crashed };
}

function crashText(detail: string): string {
  return `The solver stopped unexpectedly (${detail}). Your inputs are kept; change them or press Run again.`;
}

export function useSolverWorker() {
  const runHandle = useRef<SolverHandle | null>(null);
  const estimateHandle = useRef<SolverHandle | null>(null);
  /** Bumped by every run, cancel and crash: an answer from an older run is ignored. */
  const runToken = useRef(0);
  /** Workers are started only while the page is mounted (lazily again after a crash). */
  const mounted = useRef(false);
  const [ready, setReady] = useState(false);
  const [status, setStatus] = useState<RunStatus>('idle');
  const [progress, setProgress] = useState<ProgressLog>(EMPTY_PROGRESS);
  const [result, setResult] = useState<RunResult | null>(null);
  const [failure, setFailure] = useState<RunFailure | null>(null);
  const [lastRunFile, setLastRunFile] = useState<unknown>(null);

  const spawnRunWorker = useCallback(() => {
    const handle = spawnSolverWorker((message) => {
      if (runHandle.current !== handle) return;
      handle.worker.terminate();
      runToken.current++;
      setStatus((s) => (s === 'running' ? 'failed' : s));
      setFailure({ code: 'crash', message: crashText(message) });
      // The next run starts a fresh worker. Not at once: a worker that cannot even start
      // (a script that fails to load) would otherwise be respawned in an endless loop.
      runHandle.current = null;
    });
    return handle;
  }, []);

  const spawnEstimateWorker = useCallback(() => {
    const handle = spawnSolverWorker(() => {
      if (estimateHandle.current !== handle) return;
      handle.worker.terminate();
      estimateHandle.current = null; // respawned by the next estimate, as for runs
    });
    return handle;
  }, []);

  useEffect(() => {
    runHandle.current = spawnRunWorker();
    estimateHandle.current = spawnEstimateWorker();
    mounted.current = true;
    setReady(true);
    return () => {
      mounted.current = false;
      runToken.current++;
      runHandle.current?.worker.terminate();
      estimateHandle.current?.worker.terminate();
      runHandle.current = null;
      estimateHandle.current = null;
      setReady(false);
    };
  }, [spawnRunWorker, spawnEstimateWorker]);

  const estimate = useCallback(async (runFile: unknown): Promise<WorkerOutcome<RunEstimate>> => {
    if (!estimateHandle.current && mounted.current) estimateHandle.current = spawnEstimateWorker();
    const handle = estimateHandle.current;
    if (!handle) return { ok: false, error: { code: 'internal', message: 'the solver is still starting' } };
    try {
      return await Promise.race([handle.api.estimate(runFile), handle.crashed]);
    } catch (error) {
      const crashed = estimateHandle.current !== handle;
      const message = error instanceof Error ? error.message : String(error);
      return { ok: false, error: crashed ? { code: 'crash', message: crashText(message) } : { code: 'internal', message } };
    }
  }, [spawnEstimateWorker]);

  const run = useCallback(async (runFile: unknown): Promise<void> => {
    if (!runHandle.current && mounted.current) runHandle.current = spawnRunWorker();
    const handle = runHandle.current;
    if (!handle) return;
    const token = ++runToken.current;
    setStatus('running');
    setProgress(EMPTY_PROGRESS);
    setResult(null);
    setFailure(null);
    setLastRunFile(runFile);
    const onProgress = (event: ProgressEvent) => {
      if (token === runToken.current) startTransition(() => setProgress((log) => applyProgress(log, event)));
    };
    let outcome: WorkerOutcome<RunResult>;
    try {
      // After a crash the token has moved on and the crash handler has said what happened.
      outcome = await Promise.race([handle.api.run(runFile, Comlink.proxy(onProgress)), handle.crashed]);
    } catch (error) {
      outcome = { ok: false, error: { code: 'internal', message: error instanceof Error ? error.message : String(error) } };
    }
    if (token !== runToken.current) return;
    if (outcome.ok) {
      const value = outcome.value;
      // Putting a large result on screen is the page's heaviest render; as a transition React
      // renders it in slices between frames instead of one long main-thread task.
      startTransition(() => {
        setResult(value);
        setStatus('done');
      });
    } else {
      const issues = Array.isArray(outcome.error.issues) ? (outcome.error.issues as RunFailure['issues']) : undefined;
      setFailure({ code: outcome.error.code, message: outcome.error.message, field: outcome.error.field, issues });
      setStatus('failed');
    }
  }, [spawnRunWorker]);

  /** Stop a run at once: a busy worker cannot be interrupted from inside, so it is replaced. */
  const cancel = useCallback(() => {
    runToken.current++;
    runHandle.current?.worker.terminate();
    runHandle.current = spawnRunWorker();
    setStatus((s) => (s === 'running' ? 'cancelled' : s));
  }, [spawnRunWorker]);

  return { ready, status, progress, result, failure, lastRunFile, estimate, run, cancel };
}

export type SolverWorkerHandle = ReturnType<typeof useSolverWorker>;
