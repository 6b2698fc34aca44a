import type { RunResult } from '../../solver/run/result';

/**
 * Natural-orbital occupations of each root (eigenvalues of its one-particle density over the
 * active orbitals, Löwdin, Phys. Rev. 97, 1474 (1955)) beside the SCF occupations of the same
 * active orbitals, both in descending order. Values are the solver's; nothing is recomputed.
 */
export function NaturalOrbitals({ result }: { result: RunResult }) {
  const ci = result.ci;
  if (!ci || ci.roots.length === 0) return null;
  const scf = result.scf;
  const scfOccupations = ci.activeOrbitals
    .map((p) => (scf ? (scf.occupations.alpha[p] ?? 0) + (scf.occupations.beta[p] ?? 0) : null))
    .sort((a, b) => (b ?? 0) - (a ?? 0));
  const count = ci.activeOrbitals.length;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-right text-sm" data-testid="natural-occupations">
        <thead className="text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-3 text-left font-semibold">rank</th>
            <th className="py-1 pr-3 font-semibold">SCF occupation</th>
            {ci.roots.map((_, k) => (
              <th key={k} className="py-1 pr-3 font-semibold">
                root {k + 1}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="font-mono">
          {Array.from({ length: count }, (_, i) => (
            <tr key={i} className="border-t border-ink-soft/10" data-testid={`natural-row-${i}`}>
              <td className="py-0.5 pr-3 text-left font-sans">{i + 1}</td>
              <td className="py-0.5 pr-3">{scfOccupations[i] === null ? '—' : scfOccupations[i]}</td>
              {ci.roots.map((r, k) => (
                <td key={k} className="py-0.5 pr-3" data-testid={`natural-${k}-${i}`} data-value={r.naturalOccupations[i]}>
                  {r.naturalOccupations[i] === undefined ? '—' : r.naturalOccupations[i].toFixed(6)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs text-ink-soft">
        Occupations of the {count} active orbitals, largest first; each column sums to the {ci.nAlpha + ci.nBeta} active electrons. Core orbitals hold 2
        and outside orbitals 0 in every root.
      </p>
    </div>
  );
}
