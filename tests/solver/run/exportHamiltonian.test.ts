import { describe, expect, it } from 'vitest';
import { parseRunFile } from '../../../solver/runFile/parse';
import { runCalculation } from '../../../solver/run/runCalculation';
import { exportBasisHamiltonian, exportOrbitalHamiltonian } from '../../../solver/run/exportHamiltonian';
import { orbitalHamiltonianFromIntegrals } from '../../../solver/system/integralsFile';

// H2 at 1.4 bohr and HeH+ at 1.4632 bohr: the geometries of Szabo & Ostlund (1996) §3.5.2 and §3.5.3.
// LiH at 3.015 bohr: from memory of its experimental bond length.
const molecules = {
  'H2 STO-3G': { atoms: [['H', 0, 0, 0], ['H', 0, 0, 1.4]], charge: 0 },
  'HeH+ STO-3G': { atoms: [['He', 0, 0, 0], ['H', 0, 0, 1.4632]], charge: 1 },
  'LiH STO-3G': { atoms: [['Li', 0, 0, 0], ['H', 0, 0, 3.015]], charge: 0 },
} as const;

function moleculeRun(atoms: readonly (readonly [string, number, number, number])[], charge: number) {
  return parseRunFile({
    format: 'ketbook-run/1',
    system: { type: 'molecule', units: 'bohr', atoms, charge, multiplicity: 1, basis: 'STO-3G' },
    reference: 'RHF',
    ci: { space: 'FCI', roots: 2, method: 'dense' },
  });
}

describe.each(Object.entries(molecules))('Hamiltonian downloads of %s, read back as integral files', (_name, m) => {
  const runFile = moleculeRun(m.atoms, m.charge);

  it('the orbital and the basis-function Hamiltonians give the molecule’s full-CI energies', async () => {
    // FCI is invariant to any orthonormal change of orbitals (common practice, no source); the molecule run is the reference
    const original = await runCalculation(runFile);
    const mo = exportOrbitalHamiltonian(runFile);
    const ao = exportBasisHamiltonian(runFile);
    const ci = { space: 'FCI', roots: 2, method: 'dense' };
    // both downloads must survive JSON, as a user's file would
    const viaMo = await runCalculation(parseRunFile({ format: 'ketbook-run/1', system: JSON.parse(JSON.stringify(mo)), ci }));
    const viaAo = await runCalculation(parseRunFile({ format: 'ketbook-run/1', system: JSON.parse(JSON.stringify(ao)), reference: 'RHF', ci }));
    for (let k = 0; k < 2; k++) {
      expect(Math.abs(viaMo.energies.roots[k] - original.energies.roots[k])).toBeLessThan(1e-10);
      expect(Math.abs(viaAo.energies.roots[k] - original.energies.roots[k])).toBeLessThan(1e-10);
    }
    // the orthogonalised basis functions give back the molecule's RHF energy too (Löwdin 1950)
    expect(Math.abs(viaAo.energies.reference - original.energies.reference)).toBeLessThan(1e-10);
    expect(ao.overlap).toHaveLength(ao.orbitals);
    expect(ao.coreEnergy).toBe(original.energies.nuclearRepulsion);
  });
});

describe('the overlap field of an integral file', () => {
  it('matches the Szabo & Ostlund H2 overlap and core Hamiltonian', () => {
    // Szabo & Ostlund (1996) §3.5.2, H2 STO-3G at 1.4 bohr: S12 = 0.6593, H11 = −1.1204, H12 = −0.9584
    const ao = exportBasisHamiltonian(moleculeRun(molecules['H2 STO-3G'].atoms, 0));
    expect(ao.overlap[0][1]).toBeCloseTo(0.6593, 4);
    expect(ao.oneBody[0][0]).toBeCloseTo(-1.1204, 4);
    expect(ao.oneBody[0][1]).toBeCloseTo(-0.9584, 4);
  });

  it('refuses an overlap that is the wrong size, not symmetric or not positive definite, naming the field', () => {
    const base = { orbitals: 2, coreEnergy: 0, oneBody: [[-1, -0.5], [-0.5, -1]], twoBody: [[0, 0, 0, 0, 0.7]] as [number, number, number, number, number][] };
    const fieldOf = (overlap: number[][]) => {
      try {
        orbitalHamiltonianFromIntegrals({ ...base, overlap });
      } catch (error) {
        return { field: (error as { field?: string }).field, message: (error as Error).message };
      }
      return null;
    };
    expect(fieldOf([[1, 0.5]])).toMatchObject({ field: 'system.overlap', message: expect.stringMatching(/1 rows but orbitals is 2/) });
    expect(fieldOf([[1, 0.5], [0.4, 1]])).toMatchObject({ field: 'system.overlap', message: expect.stringMatching(/not symmetric/) });
    // eigenvalues 1 ± 1.5: one negative, so no overlap of real functions (common practice, no source)
    expect(fieldOf([[1, 1.5], [1.5, 1]])).toMatchObject({ field: 'system.overlap', message: expect.stringMatching(/not positive definite/) });
    expect(fieldOf([[1, 0.5], [0.5]])).toMatchObject({ field: 'system.overlap[1]' });
    expect(fieldOf([[1, 0.2], [0.2, 1]])).toBeNull();
  });

  it('an identity overlap changes nothing', () => {
    // X = I^{-1/2} = I (analytic)
    const base = { orbitals: 2, coreEnergy: 0.3, oneBody: [[-1, -0.5], [-0.5, -0.8]], twoBody: [[0, 0, 0, 0, 0.7], [1, 0, 1, 0, 0.1]] as [number, number, number, number, number][] };
    const plain = orbitalHamiltonianFromIntegrals(base);
    const withS = orbitalHamiltonianFromIntegrals({ ...base, overlap: [[1, 0], [0, 1]] });
    for (let i = 0; i < plain.h.length; i++) expect(withS.h[i]).toBeCloseTo(plain.h[i], 14);
    for (let i = 0; i < plain.eri.length; i++) expect(withS.eri[i]).toBeCloseTo(plain.eri[i], 14);
  });

  it('the run-file schema accepts the overlap field and a bad one is refused before anything runs', () => {
    const system = { type: 'integrals', orbitals: 2, electrons: 2, multiplicity: 1, coreEnergy: 0, oneBody: [[-1, -0.5], [-0.5, -1]], twoBody: [[0, 0, 0, 0, 0.7]] };
    expect(parseRunFile({ format: 'ketbook-run/1', system: { ...system, overlap: [[1, 0.2], [0.2, 1]] } }).system).toHaveProperty('overlap');
    expect(() => parseRunFile({ format: 'ketbook-run/1', system: { ...system, overlap: [[1, 'x'], [0.2, 1]] } })).toThrow(/overlap/);
  });
});
