'use client';
import type { LiveEstimate } from './useLiveEstimate';
import { formatBytes } from '../../solver/formatBytes';

/** The size of the run as the worker counts it; over the budget it says why Run is off. */
export function EstimatePanel({ state }: { state: LiveEstimate }) {
  return (
    <div aria-live="polite" data-testid="estimate" data-state={state.kind === 'ok' ? (state.estimate.withinBudget ? 'within' : 'over') : state.kind} className="text-sm">
      {state.kind === 'waiting' ? <p className="text-ink-soft">Counting determinants…</p> : null}
      {state.kind === 'blocked' ? <p className="text-ink-soft">{state.message}</p> : null}
      {state.kind === 'error' ? (
        <p className="rounded-md bg-caution-50 px-3 py-2 text-caution-700" data-testid="estimate-error">
          {state.message}
        </p>
      ) : null}
      {state.kind === 'ok' ? (
        state.estimate.withinBudget ? (
          <p className="text-ink">
            <span className="font-semibold" data-testid="estimate-determinants" data-value={state.estimate.determinants}>
              {state.estimate.determinants.toLocaleString('en-US')}
            </span>{' '}
            determinant{state.estimate.determinants === 1 ? '' : 's'} over {state.estimate.activeOrbitals} active of {state.estimate.orbitals} orbitals, about{' '}
            <span className="font-semibold" data-testid="estimate-memory">{formatBytes(state.estimate.bytes)}</span> of the{' '}
            {formatBytes(state.estimate.budgetBytes)} budget.
          </p>
        ) : (
          <div className="rounded-md border-l-4 border-caution-500 bg-caution-50 px-3 py-2 text-caution-700" data-testid="estimate-refusal" role="alert">
            <p className="font-semibold">Too large to run here.</p>
            <p>{state.estimate.message}</p>
          </div>
        )
      ) : null}
    </div>
  );
}
