import type { RunResult } from '../../solver/run/result';

/** How the numbers were made: solver version, run-file hash, timings and both convergence histories. */
export function ProvenancePanel({ result }: { result: RunResult }) {
  const p = result.provenance;
  const totalMs = Object.values(p.timingsMs).reduce((a, b) => a + b, 0);
  return (
    <div className="grid gap-3 text-sm" data-testid="provenance">
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="text-ink-soft">Solver version</dt>
        <dd className="font-mono" data-testid="provenance-version">{p.solverVersion}</dd>
        <dt className="text-ink-soft">Run-file hash (SHA-256)</dt>
        <dd className="break-all font-mono text-xs" data-testid="provenance-hash">{p.runFileHash}</dd>
        <dt className="text-ink-soft">Started</dt>
        <dd className="font-mono">{p.startedAt}</dd>
        <dt className="text-ink-soft">Timings</dt>
        <dd className="font-mono">
          {Object.entries(p.timingsMs)
            .map(([stage, ms]) => `${stage} ${ms.toFixed(1)} ms`)
            .join(' · ')}{' '}
          (total {totalMs.toFixed(1)} ms)
        </dd>
        <dt className="text-ink-soft">Determinants</dt>
        <dd className="font-mono">
          {result.determinantCount.toLocaleString('en-US')}
          {result.ci ? ` (${result.ci.method}, ${result.ci.nAlpha}α + ${result.ci.nBeta}β in ${result.ci.activeOrbitals.length} active orbitals)` : ''}
        </dd>
        {result.system.pointGroup ? (
          <>
            <dt className="text-ink-soft">Point group</dt>
            <dd className="font-mono">{result.system.pointGroup}</dd>
          </>
        ) : null}
      </dl>
      {result.scf ? (
        <details data-testid="scf-history">
          <summary className="cursor-pointer font-semibold text-ink">
            SCF: {result.scf.converged ? 'converged' : 'not converged'} in {result.scf.iterations.length} iterations
          </summary>
          <table className="mt-2 w-full text-right font-mono text-xs">
            <thead className="text-ink-soft">
              <tr>
                <th className="pr-3 text-left">it.</th>
                <th className="pr-3">energy (Eh)</th>
                <th className="pr-3">ΔE</th>
                <th>‖FDS − SDF‖</th>
              </tr>
            </thead>
            <tbody>
              {result.scf.iterations.map((it) => (
                <tr key={it.iteration}>
                  <td className="pr-3 text-left">{it.iteration}</td>
                  <td className="pr-3">{it.energy.toFixed(12)}</td>
                  <td className="pr-3">{it.deltaEnergy.toExponential(2)}</td>
                  <td>{it.commutatorNorm.toExponential(2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      ) : null}
      {result.ci && result.ci.iterations.length > 0 ? (
        <details data-testid="davidson-history">
          <summary className="cursor-pointer font-semibold text-ink">Davidson: {result.ci.iterations.length} iterations</summary>
          <table className="mt-2 w-full text-right font-mono text-xs">
            <thead className="text-ink-soft">
              <tr>
                <th className="pr-3 text-left">it.</th>
                <th className="pr-3">energies</th>
                <th>largest residual</th>
              </tr>
            </thead>
            <tbody>
              {result.ci.iterations.map((it) => (
                <tr key={it.iteration}>
                  <td className="pr-3 text-left">{it.iteration}</td>
                  <td className="pr-3">{it.energies.map((e) => e.toFixed(10)).join('  ')}</td>
                  <td>{Math.max(...it.residualNorms).toExponential(2)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </details>
      ) : result.ci ? (
        <p className="text-xs text-ink-soft">The CI matrix was diagonalised directly ({result.ci.method}); there is no iteration history.</p>
      ) : null}
    </div>
  );
}
