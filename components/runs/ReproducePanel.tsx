'use client';
import type { RunResult } from '@/solver/run/result';
import { useSolverWorker } from '../run/useSolverWorker';
import { compareResults, REPRODUCE_TOLERANCE } from './reproduceVerdict';

function fmt(x: number | null, digits = 10): string {
  return x === null ? '—' : x.toFixed(digits);
}

/** Reruns a saved run file in this browser and compares each energy with the stored one. */
export function ReproducePanel({ runFile, stored }: { runFile: unknown; stored: RunResult }) {
  const solver = useSolverWorker();
  const lines = solver.status === 'done' && solver.result ? compareResults(stored, solver.result) : null;
  const all = lines?.every((l) => l.verdict === 'reproduced');
  const unit = stored.energyUnit === 'hartree' ? 'Eh' : 't';
  return (
    <section className="rounded-xl border border-ink-soft/15 bg-white p-5 shadow-sm" aria-label="Reproduce" data-testid="panel-reproduce">
      <h2 className="mb-2 text-base font-semibold text-ink">Reproduce in this browser</h2>
      <p className="mb-3 text-sm text-ink-soft">
        Runs the stored run file again here and compares every energy with the stored one (tolerance {REPRODUCE_TOLERANCE} {unit}).
      </p>
      <div className="flex items-center gap-3">
        <button
          type="button"
          disabled={!solver.ready || solver.status === 'running'}
          onClick={() => void solver.run(runFile)}
          className="rounded-md bg-ket-600 px-4 py-2 text-sm font-semibold text-white hover:bg-ket-700 disabled:opacity-60"
          data-testid="reproduce-run"
        >
          {solver.status === 'running' ? 'Running…' : 'Rerun and compare'}
        </button>
        {solver.status === 'running' ? (
          <button type="button" onClick={solver.cancel} className="rounded-md border border-caution-500 px-3 py-2 text-sm text-caution-700" data-testid="reproduce-cancel">
            Cancel
          </button>
        ) : null}
        {lines ? (
          <strong className={all ? 'text-ket-700' : 'text-caution-700'} data-testid="reproduce-verdict">
            {all ? 'reproduced' : 'differs'}
          </strong>
        ) : null}
      </div>
      {solver.status === 'failed' && solver.failure ? (
        <p className="mt-2 text-sm text-caution-700" role="alert" data-testid="reproduce-failure">
          {solver.failure.message}
        </p>
      ) : null}
      {lines ? (
        <table className="mt-3 w-full text-sm" data-testid="reproduce-table">
          <thead>
            <tr className="text-left text-ink-soft">
              <th className="py-1">Quantity ({unit})</th>
              <th>Stored</th>
              <th>Recomputed</th>
              <th>Difference</th>
              <th>Verdict</th>
            </tr>
          </thead>
          <tbody className="font-mono">
            {lines.map((l) => (
              <tr key={l.quantity} data-testid="reproduce-line">
                <td className="py-1 font-sans">{l.quantity}</td>
                <td>{fmt(l.stored)}</td>
                <td>{fmt(l.recomputed)}</td>
                <td>{l.difference === null ? '—' : l.difference.toExponential(1)}</td>
                <td className={`font-sans ${l.verdict === 'reproduced' ? 'text-ket-700' : 'text-caution-700'}`}>{l.verdict}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </section>
  );
}
