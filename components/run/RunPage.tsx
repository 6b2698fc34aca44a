'use client';
import { useSolverWorker } from './useSolverWorker';
import { RunBuilder } from './RunBuilder';
import { RunStatusPanel } from './RunStatusPanel';
import { ResultsView } from '../results/ResultsView';

/** The whole in-browser run: builder, progress and results, around one solver worker. */
export function RunPage() {
  const solver = useSolverWorker();
  return (
    <div className="grid gap-6">
      <RunBuilder solver={solver} />
      <RunStatusPanel solver={solver} />
      {solver.status === 'done' && solver.result ? <ResultsView result={solver.result} runFile={solver.lastRunFile} /> : null}
    </div>
  );
}
