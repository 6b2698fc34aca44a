import { describe, expect, it } from 'vitest';
import { runScf, stabilityAnalysis, followInstability } from '../../../solver/scf';
import { orbitalHamiltonian, moIntegrals } from '../../../solver/transform';
import { dipoleMomentDebye, mullikenCharges } from '../../../solver/properties';
import { dipoleMatrices, eriIndex } from '../../../solver/integrals';
import { centreOfMassBohr } from '../../../solver/system/molecule';
import type { Vec3 } from '../../../solver/types';
import { sto3gProblem, waterAtoms } from './moleculeProblem';

/** Helium Hartree–Fock limit (fact of the trade; from memory of Clementi & Roetti tables). */
const HE_HF_LIMIT = -2.86168;

describe('STO-3G SCF through the project integrals', () => {
  it('He RHF −2.8078 Eh, above the HF limit', () => {
    const r = runScf(sto3gProblem([['He', 0, 0, 0]]).problem, { reference: 'RHF' });
    expect(r.energyHartree).toBeCloseTo(-2.8078, 4); // from memory of common STO-3G tables
    expect(r.energyHartree).toBeGreaterThan(HE_HF_LIMIT);
  });

  it('H atom UHF −0.4666 Eh', () => {
    const r = runScf(sto3gProblem([['H', 0, 0, 0]], { multiplicity: 2 }).problem, { reference: 'UHF' });
    expect(r.energyHartree).toBeCloseTo(-0.4666, 4); // from memory of common STO-3G tables
  });

  it('HeH+ with ζHe 2.0925, ζH 1.24 at 1.4632 bohr: −2.8606 Eh; Mulliken charges sum to +1', () => {
    const c = sto3gProblem(
      [
        ['He', 0, 0, 0],
        ['H', 0, 0, 1.4632],
      ],
      { charge: 1, zeta: { He: 2.0925, H: 1.24 } },
    );
    const r = runScf(c.problem, { reference: 'RHF' });
    expect(Math.abs(r.energyHartree - -2.8606)).toBeLessThan(1e-4); // Szabo & Ostlund (1996) §3.5.3
    const total = r.density.alpha.map((v, i) => v + r.density.beta[i]);
    const q = mullikenCharges(total, c.problem.overlap, c.basis.functionAtom, c.molecule);
    expect(q[0] + q[1]).toBeCloseTo(1, 10);
  });

  it('LiH at 3.015 bohr: −7.862 Eh; frozen Li 1s folded in keeps the energy', () => {
    const c = sto3gProblem([
      ['Li', 0, 0, 0],
      ['H', 0, 0, 3.015],
    ]);
    const r = runScf(c.problem, { reference: 'RHF' });
    expect(r.energyHartree).toBeCloseTo(-7.862, 3); // from memory of Szabo & Ostlund (1996) ch. 3 STO-3G tables
    const n = c.problem.nBasis;
    const ham = orbitalHamiltonian({
      coreHamiltonianAO: c.problem.coreHamiltonian,
      eriAO: c.problem.eri,
      coefficients: r.coefficients.alpha,
      nBasis: n,
      nuclearRepulsionHartree: c.problem.nuclearRepulsionHartree,
      frozenOrbitals: [0],
      activeOrbitals: Array.from({ length: n - 1 }, (_, i) => i + 1),
    });
    // Reference determinant: active orbital 0 doubly occupied (closed-shell energy; common practice, no source).
    const m = ham.nOrbitals;
    const e = ham.coreEnergy + 2 * ham.h[0] + ham.eri[eriIndex(0, 0, 0, 0)];
    expect(m).toBe(n - 1);
    expect(Math.abs(e - r.energyHartree)).toBeLessThan(1e-10);
  });

  it('Li atom: the Hückel guess lands on 1s²2p, stability analysis finds it and following reaches 1s²2s (−7.3155 Eh)', () => {
    const c = sto3gProblem([['Li', 0, 0, 0]], { multiplicity: 2 });
    const uhf = runScf(c.problem, { reference: 'UHF', guess: 'huckel' });
    const a = stabilityAnalysis(c.problem, uhf);
    const followed = a.stable ? uhf : followInstability(c.problem, uhf, { reference: 'UHF' });
    expect(followed.energyHartree).toBeCloseTo(-7.3155, 3); // from memory of common STO-3G tables
    expect(stabilityAnalysis(c.problem, followed).stable).toBe(true);
    const rohf = runScf(c.problem, { reference: 'ROHF', initialOrbitals: followed.coefficients });
    expect(followed.energyHartree).toBeLessThanOrEqual(rohf.energyHartree + 1e-10);
    expect(rohf.s2).toBeCloseTo(0.75, 10);
  });

  for (const [name, atoms, multiplicity] of [
    ['NH2 doublet', [['N', 0, 0, 0], ['H', 1.5, 0, 1.2], ['H', -1.5, 0, 1.2]], 2],
    ['CH2 triplet', [['C', 0, 0, 0], ['H', 1.6, 0, 1.0], ['H', -1.6, 0, 1.0]], 3],
  ] as [string, [string, number, number, number][], number][]) {
    it(`${name}: UHF ≤ ROHF, ROHF ⟨S²⟩ = S(S+1), UHF ⟨S²⟩ ≥ S(S+1)`, () => {
      const c = sto3gProblem(atoms, { multiplicity });
      const s = (multiplicity - 1) / 2;
      const uhf = runScf(c.problem, { reference: 'UHF' });
      const rohf = runScf(c.problem, { reference: 'ROHF' });
      expect(uhf.energyHartree).toBeLessThan(rohf.energyHartree); // fact of the trade
      expect(rohf.s2).toBeCloseTo(s * (s + 1), 10);
      expect(uhf.s2).toBeGreaterThan(s * (s + 1));
    });
  }
});

describe('water in STO-3G', () => {
  const c = sto3gProblem(waterAtoms());
  const rhf = runScf(c.problem, { reference: 'RHF' });
  const total = rhf.density.alpha.map((v) => 2 * v);

  it('has the tabulated RHF energy, converges tightly, DIIS and plain agree, and is stable', () => {
    expect(rhf.energyHartree).toBeCloseTo(-74.963, 3); // from memory of Szabo & Ostlund (1996) ch. 3 STO-3G tables
    const last = rhf.iterations[rhf.iterations.length - 1];
    expect(Math.abs(last.deltaEnergy)).toBeLessThan(1e-10);
    expect(last.commutatorNorm).toBeLessThan(1e-8);
    const plain = runScf(c.problem, { reference: 'RHF', diis: false });
    expect(Math.abs(plain.energyHartree - rhf.energyHartree)).toBeLessThan(1e-9);
    expect(stabilityAnalysis(c.problem, rhf).stable).toBe(true);
    expect(runScf(c.problem, { reference: 'ROHF' }).energyHartree).toBeCloseTo(rhf.energyHartree, 9);
  });

  it('rebuilds the RHF energy from MO integrals, with and without the O 1s frozen', () => {
    const n = c.problem.nBasis;
    const all = Array.from({ length: n }, (_, i) => i);
    const mo = moIntegrals(c.problem.coreHamiltonian, c.problem.eri, rhf.coefficients.alpha, n, all);
    const closedShell = (h: Float64Array, eri: Float64Array, m: number, nOcc: number, e0: number) => {
      let e = e0;
      for (let i = 0; i < nOcc; i++) {
        e += 2 * h[i * m + i];
        for (let j = 0; j < nOcc; j++) e += 2 * eri[eriIndex(i, i, j, j)] - eri[eriIndex(i, j, j, i)];
      }
      return e;
    };
    expect(Math.abs(closedShell(mo.h, mo.eri, n, 5, c.problem.nuclearRepulsionHartree) - rhf.energyHartree)).toBeLessThan(1e-10);
    const ham = orbitalHamiltonian({
      coreHamiltonianAO: c.problem.coreHamiltonian,
      eriAO: c.problem.eri,
      coefficients: rhf.coefficients.alpha,
      nBasis: n,
      nuclearRepulsionHartree: c.problem.nuclearRepulsionHartree,
      frozenOrbitals: [0],
      activeOrbitals: all.slice(1),
    });
    expect(Math.abs(closedShell(ham.h, ham.eri, n - 1, 4, ham.coreEnergy) - rhf.energyHartree)).toBeLessThan(1e-10);
  });

  it('has a dipole near 1.7 D that does not depend on the origin; Mulliken charges sum to zero', () => {
    const com = centreOfMassBohr(c.molecule);
    const d = dipoleMomentDebye(total, dipoleMatrices(c.basis, com), c.molecule, com);
    expect(Math.abs(d.magnitudeDebye - 1.71)).toBeLessThan(0.05); // from memory of STO-3G tables (≈1.71 D)
    const elsewhere: Vec3 = [1.1, -0.7, 2.3];
    const d2 = dipoleMomentDebye(total, dipoleMatrices(c.basis, elsewhere), c.molecule, elsewhere);
    for (let k = 0; k < 3; k++) expect(d2.vectorAu[k]).toBeCloseTo(d.vectorAu[k], 10);
    // C2v with the C2 axis along z: only a z component survives (analytic).
    expect(d.vectorAu[0]).toBeCloseTo(0, 10);
    expect(d.vectorAu[1]).toBeCloseTo(0, 10);
    const q = mullikenCharges(total, c.problem.overlap, c.basis.functionAtom, c.molecule);
    expect(q[0] + q[1] + q[2]).toBeCloseTo(0, 10);
    expect(q[0]).toBeLessThan(0); // O is negative (fact of the trade)
    expect(q[1]).toBeCloseTo(q[2], 10);
  });
});
