'use client';
import type { RunResult } from '../../solver/run/result';
import { fixedNoNegativeZero, formatEnergy, shownUnitLabel } from './energyUnits';
import { useEnergyUnitStore } from './useEnergyUnitStore';
import { UnitSwitcher } from './UnitSwitcher';
import { Formula, FORMULAS } from './Formula';

/**
 * The energies as the solver reported them — nothing is recomputed here. Each energy cell
 * carries its full-precision value in `data-value` (hartree, or t for Hubbard runs), so a
 * check can compare the screen with the command line to the last digit.
 */
export function EnergiesTable({ result }: { result: RunResult }) {
  const unit = useEnergyUnitStore((s) => s.unit);
  const eu = result.energyUnit;
  const fmt = (e: number) => formatEnergy(e, unit, eu);
  const label = shownUnitLabel(unit, eu);
  const roots = result.ci?.roots ?? [];
  return (
    <div>
      <div className="mb-2 flex flex-wrap items-center justify-between gap-2">
        <p className="text-sm text-ink-soft">
          Total energies in <span className="font-semibold text-ink" data-testid="shown-unit">{label}</span>
          {eu === 't' ? ' (a Hubbard model is in units of its hopping t)' : ''}.
        </p>
        <UnitSwitcher disabled={eu === 't'} />
      </div>
      <dl className="mb-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="text-ink-soft">Reference ({result.scf?.reference ?? 'aufbau'})</dt>
        <dd className="font-mono" data-testid="energy-reference" data-value={result.energies.reference}>
          {fmt(result.energies.reference)}
        </dd>
        {eu === 'hartree' ? (
          <>
            <dt className="text-ink-soft">Nuclear repulsion</dt>
            <dd className="font-mono" data-testid="energy-nuclear" data-value={result.energies.nuclearRepulsion}>
              {fmt(result.energies.nuclearRepulsion)}
            </dd>
          </>
        ) : null}
        {result.energies.plusQ !== null ? (
          <>
            <dt className="text-ink-soft">
              Root 1 with +Q <span className="text-xs">(Langhoff–Davidson)</span>
            </dt>
            <dd className="font-mono" data-testid="energy-plus-q" data-value={result.energies.plusQ}>
              {fmt(result.energies.plusQ)}
            </dd>
          </>
        ) : null}
      </dl>
      {roots.length > 0 ? (
        <div className="overflow-x-auto">
          <table className="w-full text-right text-sm" data-testid="energies-table">
            <thead className="text-xs text-ink-soft">
              <tr>
                <th className="py-1 pr-3 text-left font-semibold">root</th>
                <th className="py-1 pr-3 font-semibold">total ({label})</th>
                <th className="py-1 pr-3 font-semibold">correlation</th>
                <th className="py-1 pr-3 font-semibold">excitation</th>
                <th className="py-1 pr-3 font-semibold">⟨S²⟩</th>
                <th className="py-1 pr-3 font-semibold">2S+1</th>
                <th className="py-1 pr-3 font-semibold">irrep</th>
                <th className="py-1 font-semibold">c₀²</th>
              </tr>
            </thead>
            <tbody className="font-mono">
              {roots.map((root, k) => (
                <tr key={k} className="border-t border-ink-soft/10" data-testid={`root-row-${k}`}>
                  <td className="py-1 pr-3 text-left font-sans">{k + 1}</td>
                  <td className="py-1 pr-3" data-testid={`energy-root-${k}`} data-value={root.energy}>
                    {fmt(root.energy)}
                  </td>
                  <td className="py-1 pr-3" data-testid={`correlation-root-${k}`} data-value={root.correlationEnergy}>
                    {fmt(root.correlationEnergy)}
                  </td>
                  <td className="py-1 pr-3" data-value={root.excitationEnergy}>
                    {fmt(root.excitationEnergy)}
                  </td>
                  <td className="py-1 pr-3">{fixedNoNegativeZero(root.s2, 6)}</td>
                  <td className="py-1 pr-3">{root.multiplicity}</td>
                  <td className="py-1 pr-3">{root.irrep ?? '—'}</td>
                  <td className="py-1">{fixedNoNegativeZero(root.referenceWeight, 6)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <p className="text-sm text-ink-soft">SCF only: the reference is the one state computed.</p>
      )}
      <div className="mt-3 grid gap-1 text-sm text-ink-soft" data-testid="formulas">
        <Formula tex={FORMULAS.correlation} />
        <Formula tex={FORMULAS.excitation} />
        <Formula tex={FORMULAS.referenceWeight} />
        {result.energies.plusQ !== null ? <Formula tex={FORMULAS.plusQ} testId="formula-plus-q" /> : null}
      </div>
    </div>
  );
}
