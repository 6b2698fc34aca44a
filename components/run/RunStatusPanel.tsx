'use client';
import type { SolverWorkerHandle } from './useSolverWorker';
import { describePhase } from './progressLog';

/** A run in progress (phase, SCF and Davidson iterations as they arrive), or how the last one ended. */
export function RunStatusPanel({ solver }: { solver: SolverWorkerHandle }) {
  const { status, progress, failure } = solver;
  if (status === 'idle') return null;
  const lastScf = progress.scf[progress.scf.length - 1];
  const davidsonRows = progress.davidson.slice(-8);
  return (
    <section className="rounded-xl border border-ket-500/30 bg-white p-5 shadow-sm" aria-label="Run status" data-testid="run-status" data-status={status}>
      <div aria-live="polite">
        {status === 'running' ? (
          <p className="font-semibold text-ket-700" data-testid="progress-phase" data-phase={progress.phase}>
            <span className="mr-2 inline-block h-2 w-2 animate-pulse rounded-full bg-ket-500" aria-hidden="true" />
            {describePhase(progress.phase)}…
          </p>
        ) : null}
        {status === 'cancelled' ? (
          <p className="font-semibold text-caution-700" data-testid="run-cancelled">
            Cancelled. The solver was restarted; your inputs are unchanged.
          </p>
        ) : null}
        {status === 'failed' && failure ? (
          <div className="rounded-md bg-caution-50 px-3 py-2 text-sm text-caution-700" data-testid="run-failure" data-code={failure.code} role="alert">
            <p className="font-semibold">{failure.code === 'crash' ? 'The solver crashed.' : failure.code === 'over-budget' ? 'Too large to run.' : 'The run stopped.'}</p>
            <p>{failure.message}</p>
          </div>
        ) : null}
        {status === 'done' ? (
          <p className="font-semibold text-ket-700" data-testid="run-done">
            Done.
          </p>
        ) : null}
      </div>
      {progress.integrals || progress.scf.length > 0 || progress.determinants !== null ? (
        <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm" data-testid="progress-details">
          {progress.integrals ? (
            <>
              <dt className="text-ink-soft">Integrals</dt>
              <dd className="font-mono">
                {progress.integrals.done}/{progress.integrals.total}
              </dd>
            </>
          ) : null}
          {lastScf ? (
            <>
              <dt className="text-ink-soft">SCF (last reported)</dt>
              <dd className="font-mono" data-testid="progress-scf">
                iteration {lastScf.iteration}: {lastScf.energyHartree.toFixed(10)} Eh, error {lastScf.error.toExponential(2)}
              </dd>
            </>
          ) : null}
          {progress.determinants !== null ? (
            <>
              <dt className="text-ink-soft">CI space</dt>
              <dd className="font-mono" data-testid="progress-determinants">
                {progress.determinants.toLocaleString('en-US')} determinants
              </dd>
            </>
          ) : null}
        </dl>
      ) : null}
      {davidsonRows.length > 0 ? (
        <table className="mt-2 w-full text-right font-mono text-xs" data-testid="progress-davidson">
          <thead className="text-ink-soft">
            <tr>
              <th className="pr-3 text-left">Davidson it.</th>
              <th className="pr-3">energies (Eh)</th>
              <th>residual norms</th>
            </tr>
          </thead>
          <tbody>
            {davidsonRows.map((row) => (
              <tr key={row.iteration}>
                <td className="pr-3 text-left">{row.iteration}</td>
                <td className="pr-3">{row.energies.map((e) => e.toFixed(10)).join('  ')}</td>
                <td>{row.residualNorms.map((r) => r.toExponential(1)).join('  ')}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  );
}
