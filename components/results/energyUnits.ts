import {
  HARTREE_TO_EV,
  HARTREE_TO_INVERSE_CM,
  HARTREE_TO_KCAL_PER_MOL,
  HARTREE_TO_KJ_PER_MOL,
} from '../../solver/constants';

/**
 * The energy units the results view can show. Every factor comes from solver/constants.ts
 * (CODATA 2018); the page holds no conversion numbers of its own.
 */
export type EnergyUnit = 'hartree' | 'eV' | 'kcal/mol' | 'kJ/mol' | 'cm-1';

export interface EnergyUnitInfo {
  id: EnergyUnit;
  /** Short label for the switcher and column headings. */
  label: string;
  /** Multiply an energy in hartree by this to get it in this unit. */
  perHartree: number;
  /** Decimals that keep about the same absolute resolution (≈1e-10 Eh) in each unit. */
  decimals: number;
}

export const ENERGY_UNITS: readonly EnergyUnitInfo[] = [
  { id: 'hartree', label: 'Eh', perHartree: 1, decimals: 10 },
  { id: 'eV', label: 'eV', perHartree: HARTREE_TO_EV, decimals: 8 },
  { id: 'kcal/mol', label: 'kcal/mol', perHartree: HARTREE_TO_KCAL_PER_MOL, decimals: 6 },
  { id: 'kJ/mol', label: 'kJ/mol', perHartree: HARTREE_TO_KJ_PER_MOL, decimals: 6 },
  { id: 'cm-1', label: 'cm⁻¹', perHartree: HARTREE_TO_INVERSE_CM, decimals: 4 },
];

export function energyUnitInfo(unit: EnergyUnit): EnergyUnitInfo {
  const info = ENERGY_UNITS.find((u) => u.id === unit);
  if (!info) throw new RangeError(`unknown energy unit ${unit}`);
  return info;
}

/** An energy given in hartree, expressed in `unit`. */
export function convertFromHartree(energyHartree: number, unit: EnergyUnit): number {
  return energyHartree * energyUnitInfo(unit).perHartree;
}

/**
 * Text for an energy in the chosen unit. Hubbard results are in units of t, which no
 * factor converts, so they are always shown as they are.
 */
export function formatEnergy(energy: number, unit: EnergyUnit, energyUnit: 'hartree' | 't'): string {
  if (energyUnit === 't') return fixedNoNegativeZero(energy, 10);
  const info = energyUnitInfo(unit);
  return fixedNoNegativeZero(energy * info.perHartree, info.decimals);
}

/** toFixed without "-0.000…": a value that rounds to zero is shown as zero (e.g. ⟨S²⟩ = −1e-15). */
export function fixedNoNegativeZero(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  return /^-0\.?0*$/.test(text) ? text.slice(1) : text;
}

/** The heading label of the unit actually shown. */
export function shownUnitLabel(unit: EnergyUnit, energyUnit: 'hartree' | 't'): string {
  return energyUnit === 't' ? 't' : energyUnitInfo(unit).label;
}
