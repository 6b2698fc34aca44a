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
import {
  hamiltonianMap,
  elementBreakdown,
  pairBreakdown,
  runCiHamiltonian,
  type ElementBreakdown,
  type HamiltonianMapContext,
  type HamiltonianMapView,
  type RunCiHamiltonian,
} from '../solver/run/hamiltonianMap';
import { exportBasisHamiltonian, exportOrbitalHamiltonian } from '../solver/run/exportHamiltonian';
import type { RunFile } from '../solver/runFile/schema';

export type DeterminantPick = { alpha: string; beta: string };
export type HamiltonianExportKind = 'orbitals' | 'basis';

/**
 * The last Hamiltonian map (and the last run's CI Hamiltonian for picked pairs), kept so that
 * a click costs one Slater–Condon element instead of a new SCF. Keyed by the parsed run file.
 */
let mapCache: { key: string; context: HamiltonianMapContext } | null = null;
let runCache: { key: string; run: RunCiHamiltonian } | null = null;

function cacheKey(runFile: RunFile): string {
  return JSON.stringify(runFile);
}

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
  /** The Hamiltonian map of a run; the matrix crosses to the page as a transferred buffer. */
  hamiltonianMap(runFile: unknown): WorkerOutcome<HamiltonianMapView> {
    try {
      const parsed = parseRunFile(runFile);
      const { view, context } = hamiltonianMap(parsed);
      mapCache = { key: cacheKey(parsed), context };
      const outcome: WorkerOutcome<HamiltonianMapView> = { ok: true, value: view };
      return Comlink.transfer(outcome, [view.matrix.buffer]);
    } catch (error) {
      return failure(error);
    }
  },
  /** The Slater–Condon breakdown of one element of the last map drawn. */
  hamiltonianElement(row: number, column: number): WorkerOutcome<ElementBreakdown> {
    try {
      if (!mapCache) throw new SolverError('bad-input', 'draw the Hamiltonian map first');
      return { ok: true, value: elementBreakdown(mapCache.context, row, column) };
    } catch (error) {
      return failure(error);
    }
  },
  /** ⟨D_I|H|D_J⟩ taken apart for two determinants picked by their bit strings. */
  determinantPairElement(runFile: unknown, first: DeterminantPick, second: DeterminantPick): WorkerOutcome<ElementBreakdown> {
    try {
      const parsed = parseRunFile(runFile);
      const key = cacheKey(parsed);
      if (!runCache || runCache.key !== key) runCache = { key, run: runCiHamiltonian(parsed) };
      return { ok: true, value: pairBreakdown(runCache.run, first, second) };
    } catch (error) {
      return failure(error);
    }
  },
  /** The Hamiltonian over the CI's orbitals or over the basis functions, in the integral layout. */
  exportHamiltonian(runFile: unknown, kind: HamiltonianExportKind): WorkerOutcome<unknown> {
    try {
      const parsed = parseRunFile(runFile);
      return { ok: true, value: kind === 'basis' ? exportBasisHamiltonian(parsed) : exportOrbitalHamiltonian(parsed) };
    } catch (error) {
      return failure(error);
    }
  },
};

export type SolverWorkerApi = typeof api;

Comlink.expose(api);
