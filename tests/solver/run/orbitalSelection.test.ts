import { describe, expect, it } from 'vitest';
import { selectOrbitals, maxExcitationOf } from '../../../solver/run/orbitalSelection';
import { ciSchema } from '../../../solver/runFile/schema';
import { SolverError } from '../../../solver/errors';

const ci = (value: unknown) => ciSchema.parse(value);

describe('orbital roles for the CI', () => {
  it('freezes the lowest and deletes the highest orbitals', () => {
    // Water-like count: 10 electrons, 7 orbitals (STO-3G); freezing O 1s is common practice, no source.
    const s = selectOrbitals({ nOrbitals: 7, nElectrons: 10, twoS: 0, ci: ci({ space: 'CISD', frozenCore: 1, deletedVirtuals: 1 }) });
    expect(s.core).toEqual([0]);
    expect(s.active).toEqual([1, 2, 3, 4, 5]);
    expect(s.outside).toEqual([6]);
    expect([s.nAlpha, s.nBeta]).toEqual([4, 4]);
  });

  it('puts a CAS window next to the Fermi level by default', () => {
    // CAS(2,2) in a 10-electron, 7-orbital system: inactive = (10 − 2)/2 = 4 orbitals (definition of CAS).
    const s = selectOrbitals({ nOrbitals: 7, nElectrons: 10, twoS: 0, ci: ci({ space: 'CAS', active: { electrons: 2, orbitals: 2 } }) });
    expect(s.core).toEqual([0, 1, 2, 3]);
    expect(s.active).toEqual([4, 5]);
    expect(s.outside).toEqual([6]);
    expect([s.nAlpha, s.nBeta]).toEqual([1, 1]);
  });

  it('takes a chosen window and fills the lowest remaining orbitals as core', () => {
    const s = selectOrbitals({
      nOrbitals: 7,
      nElectrons: 10,
      twoS: 0,
      ci: ci({ space: 'CAS', active: { electrons: 4, orbitals: 3 }, activeOrbitals: [6, 2, 4] }),
    });
    expect(s.active).toEqual([2, 4, 6]);
    expect(s.core).toEqual([0, 1, 3]);
    expect(s.outside).toEqual([5]);
  });

  it('warns when a boundary splits a degenerate pair', () => {
    const energies = [-20, -1.3, -0.5, -0.5, 0.4, 0.6, 0.8];
    const s = selectOrbitals({
      nOrbitals: 7,
      nElectrons: 8,
      twoS: 0,
      ci: ci({ space: 'CAS', active: { electrons: 2, orbitals: 2 } }),
      orbitalEnergies: energies,
    });
    expect(s.warnings.join(' ')).toMatch(/orbitals 2 and 3 are degenerate.*core.*active/);
  });

  it('refuses a frozen core that reaches an open shell, and an odd window', () => {
    expect(() => selectOrbitals({ nOrbitals: 5, nElectrons: 3, twoS: 1, ci: ci({ space: 'CISD', frozenCore: 2 }) })).toThrow(SolverError);
    expect(() =>
      selectOrbitals({ nOrbitals: 5, nElectrons: 4, twoS: 0, ci: ci({ space: 'CAS', active: { electrons: 3, orbitals: 2 } }) }),
    ).toThrow(/odd or negative/);
  });

  it('maps RAS orbitals to positions among the active ones', () => {
    const s = selectOrbitals({
      nOrbitals: 6,
      nElectrons: 4,
      twoS: 0,
      ci: ci({ space: 'FCI', frozenCore: 1, ras: { ras1: [1], ras3: [4, 5], maxHoles: 1, maxParticles: 1 } }),
    });
    expect(s.ras).toEqual({ ras1: [0], ras3: [3, 4], maxHoles: 1, maxParticles: 1 });
  });

  it('names the excitation level of each space', () => {
    // The level of each named truncation is its definition (common practice, no source).
    expect(['CIS', 'CISD', 'CISDT', 'CISDTQ'].map((space) => maxExcitationOf(ci({ space })))).toEqual([1, 2, 3, 4]);
    expect(maxExcitationOf(ci({ space: 'FCI' }))).toBeNull();
    expect(maxExcitationOf(ci({ space: 'CI', excitationLevel: 5 }))).toBe(5);
  });
});
