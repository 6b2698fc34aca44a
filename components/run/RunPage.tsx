'use client';
import { useMemo } from 'react';
import { useSolverWorker } from './useSolverWorker';
import { RunBuilder } from './RunBuilder';
import { RunStatusPanel } from './RunStatusPanel';
import { ResultsView } from '../results/ResultsView';
import { SaveRunPanel } from '../runs/SaveRunPanel';
import { withoutVectors } from '../runs/savedRunPayload';

/** The whole in-browser run: builder, progress, results and saving, around one solver worker. */
export function RunPage() {
  const solver = useSolverWorker();
  const { estimate, ready, status, failure, run, cancel } = solver;
  // Progress events re-render this page many times a second; the form gets only what it uses.
  const builderSolver = useMemo(() => ({ estimate, ready, status, failure, run, cancel }), [estimate, ready, status, failure, run, cancel]);
  const shown = useMemo(() => (solver.result ? withoutVectors(solver.result) : null), [solver.result]);
  return (
    <div className="grid gap-6">
      <RunBuilder solver={builderSolver} />
      <RunStatusPanel solver={solver} />
      {solver.status === 'done' && solver.result && shown ? (
        <>
          <ResultsView result={shown} runFile={solver.lastRunFile} />
          <section className="rounded-xl border border-ink-soft/15 bg-white p-5 shadow-sm" aria-label="Save" data-testid="panel-save">
            <h3 className="mb-3 text-base font-semibold text-ink">Save to a workspace</h3>
            <SaveRunPanel key={shown.provenance.startedAt} result={solver.result} runFile={solver.lastRunFile} />
          </section>
        </>
      ) : null}
    </div>
  );
}
