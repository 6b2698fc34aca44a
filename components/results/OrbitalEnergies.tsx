'use client';
import type { RunResult } from '../../solver/run/result';
import { formatEnergy, shownUnitLabel } from './energyUnits';
import { useEnergyUnitStore } from './useEnergyUnitStore';

function roleOf(ci: RunResult['ci'], index: number): string {
  if (!ci) return '—';
  if (ci.coreOrbitals.includes(index)) return 'core';
  if (ci.activeOrbitals.includes(index)) return 'active';
  if (ci.outsideOrbitals.includes(index)) return 'outside';
  return '—';
}

/** SCF orbital energies with occupations, irreps and the CI role of each orbital. */
export function OrbitalEnergies({ result }: { result: RunResult }) {
  const unit = useEnergyUnitStore((s) => s.unit);
  const scf = result.scf;
  if (!scf) return <p className="text-sm text-ink-soft">This run used the model&apos;s own orbitals; there is no SCF.</p>;
  const split = scf.reference === 'UHF';
  const label = shownUnitLabel(unit, result.energyUnit);
  const fmt = (e: number) => formatEnergy(e, unit, result.energyUnit);
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-right text-sm" data-testid="orbital-energies">
        <thead className="text-xs text-ink-soft">
          <tr>
            <th className="py-1 pr-3 text-left font-semibold">orbital</th>
            <th className="py-1 pr-3 text-left font-semibold">irrep</th>
            <th className="py-1 pr-3 font-semibold">{split ? `ε α (${label})` : `ε (${label})`}</th>
            {split ? <th className="py-1 pr-3 font-semibold">ε β ({label})</th> : null}
            <th className="py-1 pr-3 font-semibold">occupation α/β</th>
            <th className="py-1 text-left font-semibold">role</th>
          </tr>
        </thead>
        <tbody className="font-mono">
          {scf.orbitalEnergies.alpha.map((e, i) => (
            <tr key={i} className="border-t border-ink-soft/10">
              <td className="py-0.5 pr-3 text-left font-sans">{i + 1}</td>
              <td className="py-0.5 pr-3 text-left">{scf.orbitalIrreps?.[i] ?? '—'}</td>
              <td className="py-0.5 pr-3" data-value={e}>{fmt(e)}</td>
              {split ? <td className="py-0.5 pr-3">{scf.orbitalEnergies.beta[i] !== undefined ? fmt(scf.orbitalEnergies.beta[i]) : '—'}</td> : null}
              <td className="py-0.5 pr-3">
                {scf.occupations.alpha[i] ?? 0}/{scf.occupations.beta[i] ?? 0}
              </td>
              <td className="py-0.5 text-left font-sans">{roleOf(result.ci, i)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
