import { describe, expect, it } from 'vitest';
import { eriIndex, eriLength } from '../../../solver/integrals/eriIndex';
import { runScf } from '../../../solver/scf';
import { moIntegrals, orbitalHamiltonian } from '../../../solver/transform';
import type { ScfProblem, ScfResult } from '../../../solver/scf';
import { h2SzaboProblem } from '../scf/h2Szabo';
import { hubbardProblem } from '../scf/modelProblems';

/** A small deterministic pseudo-random sequence (linear congruential; common practice, no source). */
function randomSequence(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (1664525 * state + 1013904223) >>> 0;
    return state / 2 ** 32 - 0.5;
  };
}

/** E = E_nuc + 2 Σ_i h_ii + Σ_ij (2(ii|jj) − (ij|ji)) over doubly occupied MOs (closed-shell HF energy in MOs; common practice, no source). */
function closedShellEnergy(h: Float64Array, eri: Float64Array, m: number, nOcc: number, coreEnergy: number): number {
  let e = coreEnergy;
  for (let i = 0; i < nOcc; i++) {
    e += 2 * h[i * m + i];
    for (let j = 0; j < nOcc; j++) e += 2 * eri[eriIndex(i, i, j, j)] - eri[eriIndex(i, j, j, i)];
  }
  return e;
}

function allOrbitals(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i);
}

describe('moIntegrals', () => {
  it('matches the definition (pq|rs) = Σ C C C C (μν|λσ) on random data', () => {
    const n = 4;
    const rnd = randomSequence(7);
    const eriAO = new Float64Array(eriLength(n)).map(() => rnd());
    const h = new Float64Array(n * n);
    for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) h[i * n + j] = h[j * n + i] = rnd();
    const c = new Float64Array(n * n).map(() => rnd());
    const orbitals = [2, 0, 3];
    const mo = moIntegrals(h, eriAO, c, n, orbitals);
    const m = orbitals.length;
    for (let p = 0; p < m; p++)
      for (let q = 0; q < m; q++) {
        let hv = 0;
        for (let a = 0; a < n; a++) for (let b = 0; b < n; b++) hv += c[a * n + orbitals[p]] * c[b * n + orbitals[q]] * h[a * n + b];
        expect(mo.h[p * m + q]).toBeCloseTo(hv, 12);
        for (let r = 0; r < m; r++)
          for (let s = 0; s < m; s++) {
            let v = 0;
            for (let a = 0; a < n; a++)
              for (let b = 0; b < n; b++)
                for (let x = 0; x < n; x++)
                  for (let y = 0; y < n; y++)
                    v +=
                      c[a * n + orbitals[p]] * c[b * n + orbitals[q]] * c[x * n + orbitals[r]] * c[y * n + orbitals[s]] * eriAO[eriIndex(a, b, x, y)];
            expect(mo.eri[eriIndex(p, q, r, s)]).toBeCloseTo(v, 12);
          }
      }
  });

  it('gives the H2 STO-3G MO integrals at 1.4 bohr', () => {
    const problem = h2SzaboProblem();
    const rhf = runScf(problem, { reference: 'RHF' });
    const mo = moIntegrals(problem.coreHamiltonian, problem.eri, rhf.coefficients.alpha, 2, [0, 1]);
    // from memory of Szabo & Ostlund (1996), minimal-basis H2 at R = 1.4 bohr:
    // J11 = 0.6746, J22 = 0.6975, J12 = 0.6636, K12 = 0.1813.
    expect(mo.eri[eriIndex(0, 0, 0, 0)]).toBeCloseTo(0.6746, 3);
    expect(mo.eri[eriIndex(1, 1, 1, 1)]).toBeCloseTo(0.6975, 3);
    expect(mo.eri[eriIndex(0, 0, 1, 1)]).toBeCloseTo(0.6636, 3);
    expect(mo.eri[eriIndex(0, 1, 0, 1)]).toBeCloseTo(0.1813, 3);
    // The MO basis is orthonormal and canonical, so h is diagonal (by symmetry for H2).
    expect(mo.h[1]).toBeCloseTo(0, 12);
  });
});

function checkRebuild(problem: ScfProblem, rhf: ScfResult): void {
  const n = problem.nBasis;
  const mo = moIntegrals(problem.coreHamiltonian, problem.eri, rhf.coefficients.alpha, n, allOrbitals(n));
  expect(Math.abs(closedShellEnergy(mo.h, mo.eri, n, problem.nAlpha, problem.nuclearRepulsionHartree) - rhf.energyHartree)).toBeLessThan(1e-10);
}

describe('orbitalHamiltonian', () => {
  it('rebuilds the RHF energy of H2 from MO integrals, and with the σg orbital frozen', () => {
    const problem = h2SzaboProblem();
    const rhf = runScf(problem, { reference: 'RHF' });
    checkRebuild(problem, rhf);
    const ham = orbitalHamiltonian({
      coreHamiltonianAO: problem.coreHamiltonian,
      eriAO: problem.eri,
      coefficients: rhf.coefficients.alpha,
      nBasis: 2,
      nuclearRepulsionHartree: problem.nuclearRepulsionHartree,
      frozenOrbitals: [0],
      activeOrbitals: [1],
    });
    expect(ham.nOrbitals).toBe(1);
    expect(Math.abs(ham.coreEnergy - rhf.energyHartree)).toBeLessThan(1e-10);
  });

  it('folds a frozen core into h so the reference determinant keeps the RHF energy (8-site ring)', () => {
    const problem = hubbardProblem(8, 3, 3, 3, true);
    const rhf = runScf(problem, { reference: 'RHF', guess: 'core' });
    checkRebuild(problem, rhf);
    const ham = orbitalHamiltonian({
      coreHamiltonianAO: problem.coreHamiltonian,
      eriAO: problem.eri,
      coefficients: rhf.coefficients.alpha,
      nBasis: 8,
      nuclearRepulsionHartree: 0,
      frozenOrbitals: [0],
      activeOrbitals: [1, 2, 3, 4, 5],
    });
    expect(ham.nOrbitals).toBe(5);
    expect(ham.eri.length).toBe(eriLength(5));
    // Two active doubly occupied orbitals remain (MOs 1 and 2 → active 0 and 1).
    expect(Math.abs(closedShellEnergy(ham.h, ham.eri, 5, 2, ham.coreEnergy) - rhf.energyHartree)).toBeLessThan(1e-10);
  });

  it('rejects orbitals listed twice or out of range', () => {
    const problem = h2SzaboProblem();
    const base = {
      coreHamiltonianAO: problem.coreHamiltonian,
      eriAO: problem.eri,
      coefficients: Float64Array.from([1, 0, 0, 1]),
      nBasis: 2,
      nuclearRepulsionHartree: 0,
    };
    expect(() => orbitalHamiltonian({ ...base, frozenOrbitals: [0], activeOrbitals: [0, 1] })).toThrow(/twice/);
    expect(() => orbitalHamiltonian({ ...base, frozenOrbitals: [], activeOrbitals: [2] })).toThrow(/outside/);
  });
});
