'use client';
import { useCallback, useEffect, useRef } from 'react';
import { spawnSolverWorker, type SolverHandle } from '../run/useSolverWorker';
import type { DeterminantPick, HamiltonianExportKind, WorkerOutcome } from '../../workers/solver.worker';
import type { ElementBreakdown, HamiltonianMapView } from '../../solver/run/hamiltonianMap';

/**
 * The results view's own solver worker, started on first use: the Hamiltonian map, its
 * breakdowns and the Hamiltonian downloads need the run's integrals again, and a results view
 * shown for a saved run has no run worker to borrow. It keeps the last map, so clicks are cheap.
 */
export function useResultsWorker() {
  const handle = useRef<SolverHandle | null>(null);

  const api = useCallback(() => {
    if (!handle.current) {
      const created = spawnSolverWorker(() => {
        if (handle.current !== created) return;
        created.worker.terminate();
        handle.current = null;
      });
      handle.current = created;
    }
    return handle.current.api;
  }, []);

  useEffect(
    () => () => {
      handle.current?.worker.terminate();
      handle.current = null;
    },
    [],
  );

  const guard = useCallback(async <T,>(call: () => Promise<WorkerOutcome<T>>): Promise<WorkerOutcome<T>> => {
    try {
      return await call();
    } catch (error) {
      return { ok: false, error: { code: 'internal', message: error instanceof Error ? error.message : String(error) } };
    }
  }, []);

  return {
    hamiltonianMap: useCallback((runFile: unknown) => guard<HamiltonianMapView>(() => api().hamiltonianMap(runFile)), [api, guard]),
    hamiltonianElement: useCallback((row: number, column: number) => guard<ElementBreakdown>(() => api().hamiltonianElement(row, column)), [api, guard]),
    determinantPairElement: useCallback(
      (runFile: unknown, first: DeterminantPick, second: DeterminantPick) => guard<ElementBreakdown>(() => api().determinantPairElement(runFile, first, second)),
      [api, guard],
    ),
    exportHamiltonian: useCallback((runFile: unknown, kind: HamiltonianExportKind) => guard<unknown>(() => api().exportHamiltonian(runFile, kind)), [api, guard]),
  };
}

export type ResultsWorker = ReturnType<typeof useResultsWorker>;
