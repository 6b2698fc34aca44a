'use client';
import { ENERGY_UNITS } from './energyUnits';
import { useEnergyUnitStore } from './useEnergyUnitStore';

/** One choice of energy unit for every table in the results view. */
export function UnitSwitcher({ disabled = false }: { disabled?: boolean }) {
  const unit = useEnergyUnitStore((s) => s.unit);
  const setUnit = useEnergyUnitStore((s) => s.setUnit);
  return (
    <fieldset className="flex flex-wrap items-center gap-1" disabled={disabled} data-testid="unit-switcher">
      <legend className="sr-only">Energy unit</legend>
      {ENERGY_UNITS.map((u) => (
        <label
          key={u.id}
          className={
            'cursor-pointer rounded-full px-2.5 py-0.5 text-xs font-semibold ' +
            (unit === u.id ? 'bg-ket-600 text-white' : 'border border-ket-500/40 text-ket-700 hover:bg-ket-50') +
            (disabled ? ' cursor-not-allowed opacity-50' : '')
          }
        >
          <input type="radio" name="energy-unit" value={u.id} checked={unit === u.id} onChange={() => setUnit(u.id)} className="sr-only" data-testid={`unit-${u.id}`} />
          {u.label}
        </label>
      ))}
    </fieldset>
  );
}
