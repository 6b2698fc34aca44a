import type { ProgressEvent } from '../../solver/types';

/**
 * What the page shows of a run in progress, built from the worker's progress events.
 * Events arrive throttled (workers/progressThrottle.ts), so the lists hold the iterations
 * that were posted, not necessarily every one; the full histories come with the result.
 */
export interface ProgressLog {
  phase: ProgressEvent['phase'] | 'starting';
  integrals: { done: number; total: number } | null;
  scf: { iteration: number; energyHartree: number; error: number }[];
  determinants: number | null;
  davidson: { iteration: number; energies: number[]; residualNorms: number[] }[];
}

export const EMPTY_PROGRESS: ProgressLog = { phase: 'starting', integrals: null, scf: [], determinants: null, davidson: [] };

/** Kept short so a long Davidson run does not grow the page's state without bound. */
export const MAX_PROGRESS_ROWS = 200;

function appendCapped<T>(list: T[], item: T): T[] {
  const next = list.length >= MAX_PROGRESS_ROWS ? list.slice(list.length - MAX_PROGRESS_ROWS + 1) : list.slice();
  next.push(item);
  return next;
}

export function applyProgress(log: ProgressLog, event: ProgressEvent): ProgressLog {
  switch (event.phase) {
    case 'integrals':
      return { ...log, phase: event.phase, integrals: { done: event.done, total: event.total } };
    case 'scf':
      return { ...log, phase: event.phase, scf: appendCapped(log.scf, { iteration: event.iteration, energyHartree: event.energyHartree, error: event.error }) };
    case 'ci-setup':
      return { ...log, phase: event.phase, determinants: event.determinants };
    case 'davidson':
      return {
        ...log,
        phase: event.phase,
        davidson: appendCapped(log.davidson, { iteration: event.iteration, energies: [...event.energies], residualNorms: [...event.residualNorms] }),
      };
    case 'transform':
    case 'properties':
      return { ...log, phase: event.phase };
  }
}

const PHASE_TEXT: Record<ProgressLog['phase'], string> = {
  starting: 'Starting the solver',
  integrals: 'Computing integrals',
  scf: 'Solving the SCF equations',
  transform: 'Transforming integrals to orbitals',
  'ci-setup': 'Building the CI space',
  davidson: 'Finding the lowest roots (Davidson)',
  properties: 'Computing properties',
};

export function describePhase(phase: ProgressLog['phase']): string {
  return PHASE_TEXT[phase];
}
