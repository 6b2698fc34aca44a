/**
 * The browser face of the solver: a dedicated web worker exposed through comlink.
 * It imports only solver/ (and comlink), so the page's main thread never runs solver code.
 * Cancelling a run means terminating this worker and starting a new one (the page's hook
 * does that); a run in progress cannot be interrupted from inside any faster.
 */
import * as Comlink from 'comlink';
import { SolverError } from '../solver/errors';
import { parseRunFile } from '../solver/runFile/parse';
import { runCalculation, estimateRun, type RunResult, type RunEstimate } from '../solver/run';
import type { ProgressEvent } from '../solver/types';
import { throttleProgress } from './progressThrottle';

export type WorkerOutcome<T> =
  | { ok: true; value: T }
  | { ok: false; error: { code: string; message: string; field?: string; issues?: unknown } };

function failure(error: unknown): WorkerOutcome<never> {
  const e = error instanceof SolverError ? error : new SolverError('internal', error instanceof Error ? error.message : String(error));
  return {
    ok: false,
    error: { code: e.code, message: e.message, field: e.field, issues: e.code === 'bad-input' ? e.details : undefined },
  };
}

const api = {
  estimate(runFile: unknown): WorkerOutcome<RunEstimate> {
    try {
      return { ok: true, value: estimateRun(parseRunFile(runFile)) };
    } catch (error) {
      return failure(error);
    }
  },
  async run(runFile: unknown, onProgress?: (event: ProgressEvent) => void): Promise<WorkerOutcome<RunResult>> {
    const progress = onProgress ? throttleProgress(onProgress) : undefined;
    try {
      // The page keeps the whole CI vectors to save them with the run; it strips them for display.
      const value = await runCalculation(parseRunFile(runFile), { onProgress: progress?.push, includeVectors: true });
      return { ok: true, value };
    } catch (error) {
      return failure(error);
    } finally {
      progress?.flush();
    }
  },
};

export type SolverWorkerApi = typeof api;

Comlink.expose(api);
