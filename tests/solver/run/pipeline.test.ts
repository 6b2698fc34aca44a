import { describe, expect, it } from 'vitest';
import { runCalculation, type RunResult } from '../../../solver/run';
import { parseRunFile } from '../../../solver/runFile/parse';
import type { RunFileInput } from '../../../solver/runFile/schema';
import { exportOrbitalHamiltonian } from '../../../solver/run/exportHamiltonian';
import { SolverError } from '../../../solver/errors';

type Atoms = [string, number, number, number][];

function molecule(atoms: Atoms, extra: Partial<RunFileInput> & { charge?: number; multiplicity?: number; zeta?: Record<string, number> } = {}): RunFileInput {
  const { charge = 0, multiplicity = 1, zeta, ...rest } = extra;
  return {
    format: 'ketbook-run/1',
    system: { type: 'molecule', units: 'bohr', atoms, charge, multiplicity, basis: 'STO-3G', ...(zeta ? { zeta } : {}) },
    ...rest,
  } as RunFileInput;
}

async function run(input: RunFileInput): Promise<RunResult> {
  return runCalculation(parseRunFile(input));
}

const H2: Atoms = [['H', 0, 0, 0], ['H', 0, 0, 1.4]];
const LiH: Atoms = [['Li', 0, 0, 0], ['H', 0, 0, 3.015]]; // near the LiH equilibrium distance, common practice, no source

describe('H2 in STO-3G at 1.4 bohr, end to end', () => {
  it('gives the published RHF and full-CI energies', async () => {
    const r = await run(molecule(H2, { reference: 'RHF', ci: { space: 'FCI' } }));
    expect(r.energies.reference).toBeCloseTo(-1.1167, 4); // Szabo & Ostlund (1996) §3.5.2
    expect(r.energies.correlation[0]).toBeCloseTo(-0.0206, 4); // Szabo & Ostlund (1996) ch. 4, minimal-basis H2
    expect(r.scf?.orbitalEnergies.alpha[0]).toBeCloseTo(-0.578, 3); // Szabo & Ostlund (1996) §3.5.2
    expect(r.scf?.orbitalEnergies.alpha[1]).toBeCloseTo(0.670, 3); // Szabo & Ostlund (1996) §3.5.2
    expect(r.determinantCount).toBe(4); // C(2,1)² determinants, common practice, no source
    expect(r.energies.plusQ).toBeNull();
  });

  it('CISD equals full CI for two electrons and CAS(2,2) is the same space', async () => {
    const fci = await run(molecule(H2, { ci: { space: 'FCI' } }));
    const cisd = await run(molecule(H2, { ci: { space: 'CISD' } }));
    const cas = await run(molecule(H2, { ci: { space: 'CAS', active: { electrons: 2, orbitals: 2 } } }));
    // Two electrons can be at most doubly excited (common practice, no source).
    expect(Math.abs(cisd.energies.roots[0] - fci.energies.roots[0])).toBeLessThan(1e-10);
    expect(Math.abs(cas.energies.roots[0] - fci.energies.roots[0])).toBeLessThan(1e-10);
  });
});

describe('published SCF energies through the whole pipeline', () => {
  it('HeH+ with the scaled exponents of the worked example', async () => {
    // Szabo & Ostlund (1996) §3.5.3: ζ(He) = 2.0925, ζ(H) = 1.24, R = 1.4632 bohr, E = −2.8606 Eh.
    const r = await run(molecule([['He', 0, 0, 0], ['H', 0, 0, 1.4632]], { charge: 1, zeta: { He: 2.0925, H: 1.24 } }));
    // The book prints the energy cut to four decimals, so the computed value lies within that last digit.
    expect(r.energies.reference).toBeLessThanOrEqual(-2.8606);
    expect(r.energies.reference).toBeGreaterThan(-2.8607);
  });

  it('He atom: STO-3G SCF, above the HF limit; FCI above the exact energy', async () => {
    const r = await run(molecule([['He', 0, 0, 0]], { ci: { space: 'FCI' } }));
    expect(r.energies.reference).toBeCloseTo(-2.8078, 4); // from memory of common STO-3G tables
    expect(r.energies.reference).toBeGreaterThan(-2.86168); // HF limit of He, fact of the trade
    expect(r.energies.roots[0]).toBeGreaterThan(-2.90372); // exact nonrelativistic He energy, fact of the trade
  });
});

describe('facts of the trade through the pipeline', () => {
  it('full CI of two H2 far apart is twice the monomer; CISD is not size-consistent', async () => {
    const monomer = await run(molecule(H2, { ci: { space: 'FCI' } }));
    const dimerAtoms: Atoms = [...H2, ['H', 100, 0, 0], ['H', 100, 0, 1.4]];
    const fci = await run(molecule(dimerAtoms, { ci: { space: 'FCI' } }));
    const cisd = await run(molecule(dimerAtoms, { ci: { space: 'CISD' } }));
    // Full CI is size-consistent (common practice, no source).
    expect(Math.abs(fci.energies.roots[0] - 2 * monomer.energies.roots[0])).toBeLessThan(1e-9);
    // CISD of the pair misses the simultaneous double excitations of both monomers (common practice, no source).
    expect(cisd.energies.roots[0] - 2 * monomer.energies.roots[0]).toBeGreaterThan(1e-5);
  });

  it('LiH: variational order of the CI ladder, and all-active CAS and limitless RAS equal FCI', async () => {
    const energies: number[] = [];
    for (const space of ['CISD', 'CISDT', 'CISDTQ', 'FCI'] as const) {
      energies.push((await run(molecule(LiH, { ci: { space } }))).energies.roots[0]);
    }
    const rhf = (await run(molecule(LiH))).energies.reference;
    // Nested spaces give non-increasing variational energies (common practice, no source).
    expect(rhf).toBeGreaterThanOrEqual(energies[0]);
    for (let k = 1; k < energies.length; k++) expect(energies[k - 1]).toBeGreaterThanOrEqual(energies[k] - 1e-12);
    const cas = await run(molecule(LiH, { ci: { space: 'CAS', active: { electrons: 4, orbitals: 6 } } }));
    expect(Math.abs(cas.energies.roots[0] - energies[3])).toBeLessThan(1e-10);
    const ras = await run(molecule(LiH, { ci: { space: 'FCI', ras: { ras1: [0, 1], ras3: [4, 5], maxHoles: 4, maxParticles: 4 } } }));
    expect(Math.abs(ras.energies.roots[0] - energies[3])).toBeLessThan(1e-10);
  });

  it('the Langhoff–Davidson correction recomputed by hand', async () => {
    const r = await run(molecule(LiH, { ci: { space: 'CISD' } }));
    const c0sq = r.ci!.roots[0].referenceWeight;
    const eCisd = r.energies.roots[0];
    // E(+Q) = E_CISD + (1 − c0²)(E_CISD − E_ref) (Langhoff & Davidson, Int. J. Quantum Chem. 8, 61 (1974)).
    expect(r.energies.plusQ).toBeCloseTo(eCisd + (1 - c0sq) * (eCisd - r.energies.reference), 12);
    expect(c0sq).toBeGreaterThan(0.9);
    expect(c0sq).toBeLessThan(1);
  });

  it('energies do not change when the molecule is translated and rotated', async () => {
    const h3: Atoms = [['H', 0, 0, 0], ['H', 1.7, 0, 0], ['H', 0.6, 1.5, 0.2]];
    const base = await run(molecule(h3, { charge: 1, ci: { space: 'FCI' } }));
    const c = Math.cos(0.7);
    const s = Math.sin(0.7);
    const moved: Atoms = h3.map(([sym, x, y, z]) => [sym, c * x - s * z + 3.1, y - 2.2, s * x + c * z + 0.4]);
    const other = await run(molecule(moved, { charge: 1, ci: { space: 'FCI' } }));
    // Invariance under rigid motions, fact of the trade.
    expect(Math.abs(other.energies.reference - base.energies.reference)).toBeLessThan(1e-10);
    expect(Math.abs(other.energies.roots[0] - base.energies.roots[0])).toBeLessThan(1e-10);
  });

  it('the orbital Hamiltonian written out in the integral layout and read back gives the same energies', async () => {
    const input = parseRunFile(molecule(LiH, { ci: { space: 'CISD', frozenCore: 1, roots: 2 } }));
    const original = await runCalculation(input);
    const exported = exportOrbitalHamiltonian(input);
    const again = await runCalculation(parseRunFile({ format: 'ketbook-run/1', system: exported, ci: { space: 'CISD', roots: 2 } }));
    for (let k = 0; k < 2; k++) expect(Math.abs(again.energies.roots[k] - original.energies.roots[k])).toBeLessThan(1e-10);
    // With the frozen core folded in, the aufbau determinant of the exported orbitals is the RHF determinant.
    expect(Math.abs(again.energies.reference - original.energies.reference)).toBeLessThan(1e-10);
  });
});

describe('several roots of a symmetric molecule', () => {
  it('Davidson finds the same lowest roots as the dense solver, whatever their spin and irrep', async () => {
    const chain: Atoms = Array.from({ length: 6 }, (_, i) => ['H', 0, 0, 1.8 * i] as [string, number, number, number]);
    const dense = await run(molecule(chain, { ci: { space: 'FCI', roots: 4, method: 'dense' } }));
    const davidson = await run(molecule(chain, { ci: { space: 'FCI', roots: 4, method: 'davidson' } }));
    // The dense eigensolver is the oracle for the iterative one (common practice, no source).
    for (let k = 0; k < 4; k++) {
      expect(Math.abs(davidson.energies.roots[k] - dense.energies.roots[k])).toBeLessThan(1e-9);
      expect(Math.abs(davidson.s2[k] - dense.s2[k])).toBeLessThan(1e-6);
    }
  });
});

describe('refusals', () => {
  it('refuses a space above the memory budget before allocating it', async () => {
    const chain: Atoms = Array.from({ length: 12 }, (_, i) => ['H', 0, 0, 1.8 * i] as [string, number, number, number]);
    await expect(run(molecule(chain, { ci: { space: 'FCI' }, budget: { memoryBytes: 8 * 1024 * 1024 } }))).rejects.toMatchObject({
      code: 'over-budget',
    });
  });

  it('refuses an impossible multiplicity with a message', async () => {
    await expect(run(molecule(H2, { multiplicity: 2 }))).rejects.toBeInstanceOf(SolverError);
  });
});
