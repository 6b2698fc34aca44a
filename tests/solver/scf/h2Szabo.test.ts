import { describe, expect, it } from 'vitest';
import { runScf, stabilityAnalysis } from '../../../solver/scf';
import { SolverError } from '../../../solver/errors';
import { h2SzaboProblem } from './h2Szabo';

describe('RHF of H2 in STO-3G at 1.4 bohr (integrals typed in from Szabo & Ostlund §3.5.2)', () => {
  const problem = h2SzaboProblem();
  const rhf = runScf(problem, { reference: 'RHF' });

  it('reproduces the printed orbital energies and total energy', () => {
    expect(rhf.orbitalEnergies.alpha[0]).toBeCloseTo(-0.578, 3); // Szabo & Ostlund (1996) §3.5.2
    expect(rhf.orbitalEnergies.alpha[1]).toBeCloseTo(0.670, 3); // Szabo & Ostlund (1996) §3.5.2
    expect(Math.abs(rhf.energyHartree - -1.1167)).toBeLessThan(1e-4); // Szabo & Ostlund (1996) §3.5.2 (4-digit integrals)
    expect(rhf.nuclearRepulsionHartree).toBeCloseTo(1 / 1.4, 12);
    expect(rhf.energyHartree - rhf.electronicEnergyHartree).toBeCloseTo(1 / 1.4, 12);
  });

  it('gives the printed MO coefficients with the largest coefficient of each MO positive', () => {
    const c = rhf.coefficients.alpha;
    // from memory of Szabo & Ostlund (1996) §3.5.2: ψ1 = 0.5489(φ1+φ2), ψ2 = 1.2115(φ1−φ2)
    expect(c[0]).toBeCloseTo(0.5489, 3);
    expect(c[2]).toBeCloseTo(0.5489, 3);
    expect(c[1]).toBeCloseTo(1.2115, 3);
    expect(c[3]).toBeCloseTo(-1.2115, 3);
    for (let j = 0; j < 2; j++) {
      const column = [c[j], c[2 + j]];
      const largest = column.reduce((a, b) => (Math.abs(b) > Math.abs(a) + 1e-8 ? b : a));
      expect(largest).toBeGreaterThan(0);
    }
  });

  it('converges to |ΔE| < 1e-10 and commutator norm < 1e-8 and fills the result', () => {
    const last = rhf.iterations[rhf.iterations.length - 1];
    expect(Math.abs(last.deltaEnergy)).toBeLessThan(1e-10);
    expect(last.commutatorNorm).toBeLessThan(1e-8);
    expect(rhf.converged).toBe(true);
    expect(rhf.coefficients.alpha).toBe(rhf.coefficients.beta);
    expect(Array.from(rhf.occupations.alpha)).toEqual([1, 0]);
    expect(rhf.s2).toBe(0);
    // tr(D S) counts the α electrons (common practice, no source)
    const d = rhf.density.alpha;
    const s = problem.overlap;
    let electrons = 0;
    for (let i = 0; i < 2; i++) for (let j = 0; j < 2; j++) electrons += d[i * 2 + j] * s[j * 2 + i];
    expect(electrons).toBeCloseTo(1, 12);
  });

  it('agrees between DIIS and plain iterations, core and Hückel guesses, RHF, UHF and ROHF', () => {
    for (const options of [
      { reference: 'RHF' as const, diis: false },
      { reference: 'RHF' as const, guess: 'core' as const },
      { reference: 'UHF' as const },
      { reference: 'ROHF' as const },
    ]) {
      const other = runScf(problem, options);
      expect(Math.abs(other.energyHartree - rhf.energyHartree)).toBeLessThan(1e-10);
    }
  });

  it('reports progress once per iteration', () => {
    const seen: number[] = [];
    const r = runScf(problem, { reference: 'RHF', onProgress: (ev) => seen.push(ev.iteration) });
    expect(seen).toEqual(r.iterations.map((it) => it.iteration));
  });

  it('is stable at 1.4 bohr, with Hessian eigenvalues from the printed MO integrals', () => {
    const a = stabilityAnalysis(problem, rhf);
    expect(a.stable).toBe(true);
    // One occupied–virtual pair: singlet Δε + 3K12 − J12, triplet Δε − J12 − K12 with
    // J12 = 0.6636, K12 = 0.1813 (from memory of Szabo & Ostlund (1996), their minimal-basis H2 MO integrals).
    const gap = 0.6703 + 0.5782; // Szabo & Ostlund (1996) §3.5.2 orbital energies
    expect(a.rhfToRhf!.lowestEigenvalue).toBeCloseTo(gap + 3 * 0.1813 - 0.6636, 2);
    expect(a.rhfToUhf!.lowestEigenvalue).toBeCloseTo(gap - 0.6636 - 0.1813, 2);
  });
});

describe('SCF input checks and failure reports', () => {
  it('rejects a linearly dependent basis', () => {
    const p = h2SzaboProblem();
    p.overlap = Float64Array.from([1, 1, 1, 1]);
    expect(() => runScf(p, { reference: 'RHF' })).toThrow(/basis is linearly dependent/);
  });

  it('rejects an open shell for RHF', () => {
    const p = { ...h2SzaboProblem(), nAlpha: 1, nBeta: 0 };
    try {
      runScf(p, { reference: 'RHF' });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SolverError);
      expect((e as SolverError).code).toBe('bad-input');
    }
  });

  it('throws not-converged with the iteration history when out of iterations', () => {
    try {
      runScf(h2SzaboProblem(), { reference: 'RHF', maxIterations: 1 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SolverError);
      const err = e as SolverError;
      expect(err.code).toBe('not-converged');
      expect(err.message).toMatch(/SCF did not converge in 1 iterations \(last ΔE .*, error .*\)/);
      const details = err.details as { iterations: { energyHartree: number }[] };
      expect(details.iterations).toHaveLength(1);
      expect(Number.isFinite(details.iterations[0].energyHartree)).toBe(true);
    }
  });
});
