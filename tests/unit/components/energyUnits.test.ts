import { describe, expect, it } from 'vitest';
import { hartreeEnergy, elementaryCharge, avogadro, planckConstant, speedOfLight } from 'mathjs';
import { convertFromHartree, ENERGY_UNITS, formatEnergy, shownUnitLabel } from '../../../components/results/energyUnits';

// Reference values from mathjs's physical constants (CODATA 2018), a general-purpose npm library.
const EH_J = hartreeEnergy.toNumber('J');
const E_C = elementaryCharge.toNumber('C');
const NA = avogadro.toNumber('mol^-1');
const H_JS = planckConstant.toNumber('J s');
const C_MS = speedOfLight.toNumber('m/s');

describe('energy units of the results view', () => {
  it('converts one hartree to eV as E_h / e', () => {
    expect(convertFromHartree(1, 'eV')).toBeCloseTo(EH_J / E_C, 9); // mathjs CODATA 2018 constants
  });

  it('converts one hartree to kJ/mol as E_h · N_A / 1000', () => {
    expect(convertFromHartree(1, 'kJ/mol')).toBeCloseTo((EH_J * NA) / 1000, 7); // mathjs CODATA 2018 constants
  });

  it('converts one hartree to kcal/mol with the thermochemical calorie of 4.184 J', () => {
    expect(convertFromHartree(1, 'kcal/mol')).toBeCloseTo((EH_J * NA) / 1000 / 4.184, 7); // 1 cal_th = 4.184 J exactly, common practice, no source
  });

  it('converts one hartree to a wavenumber E_h / (h c) in cm⁻¹', () => {
    expect(convertFromHartree(1, 'cm-1')).toBeCloseTo(EH_J / (H_JS * C_MS) / 100, 4); // mathjs CODATA 2018 constants
  });

  it('scales linearly and keeps the sign (a negative total energy stays negative)', () => {
    const eh = -1.1372838344885; // any value; linearity is the property checked
    for (const unit of ENERGY_UNITS) {
      expect(convertFromHartree(eh, unit.id)).toBeCloseTo(eh * convertFromHartree(1, unit.id), 8);
      expect(convertFromHartree(eh, unit.id)).toBeLessThan(0);
    }
  });

  it('shows hartree to 10 decimals and leaves Hubbard energies (units of t) unconverted', () => {
    expect(formatEnergy(-1.13728383449, 'hartree', 'hartree')).toBe('-1.1372838345');
    expect(formatEnergy(-2.5, 'eV', 't')).toBe('-2.5000000000');
    expect(shownUnitLabel('eV', 't')).toBe('t');
    expect(shownUnitLabel('cm-1', 'hartree')).toBe('cm⁻¹');
  });

  it('shows 1 eV worth of hartree as 1.00000000 eV', () => {
    expect(formatEnergy(E_C / EH_J, 'eV', 'hartree')).toBe('1.00000000'); // mathjs CODATA 2018 constants
  });
});

describe('fixed-point text without a negative zero', () => {
  it('shows a value that rounds to zero as zero, and keeps real negatives', async () => {
    const { fixedNoNegativeZero } = await import('../../../components/results/energyUnits');
    expect(fixedNoNegativeZero(-1e-15, 6)).toBe('0.000000'); // common practice, no source
    expect(fixedNoNegativeZero(-0.0000004, 6)).toBe('0.000000');
    expect(fixedNoNegativeZero(-0.0000006, 6)).toBe('-0.000001');
    expect(fixedNoNegativeZero(-2, 0)).toBe('-2');
  });
});
