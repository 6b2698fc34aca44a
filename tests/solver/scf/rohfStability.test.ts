import { describe, expect, it } from 'vitest';
import { followInstability, runScf, stabilityAnalysis } from '../../../solver/scf';
import { hubbardProblem } from './modelProblems';
import { sto3gProblem, waterAtoms } from './moleculeProblem';

/** The atomic-orbital character of MO k: summed squared coefficients on the s and on the p functions. */
function character(coefficients: Float64Array, n: number, k: number, labels: string[]): { s: number; p: number } {
  let s = 0;
  let p = 0;
  for (let mu = 0; mu < n; mu++) {
    const c2 = coefficients[mu * n + k] ** 2;
    if (/p/.test(labels[mu])) p += c2;
    else s += c2;
  }
  return { s, p };
}

describe('Li atom, STO-3G: the starting guess reaches 1s²2s', () => {
  const li = sto3gProblem([['Li', 0, 0, 0]], { multiplicity: 2 });
  const n = li.problem.nBasis;
  const labels = Array.from(li.basis.functionLabels);
  // the same problem without the atom of each function: the plain two-centre Hückel formula everywhere
  const { functionAtom: _omitted, ...withoutAtoms } = li.problem;

  for (const reference of ['ROHF', 'UHF'] as const) {
    it(`${reference}: the 2S ground state, below the 1s²2p solution`, () => {
      const ground = runScf(li.problem, { reference });
      // Li STO-3G Hartree–Fock −7.3155 Eh: from memory of published STO-3G atomic energies
      expect(ground.energyHartree).toBeCloseTo(-7.3155, 4);
      const open = character(ground.coefficients.alpha, n, 1, labels);
      expect(open.p).toBeLessThan(1e-12); // the singly occupied orbital is 2s (no p component)
      const excited = runScf(withoutAtoms, { reference });
      const excitedOpen = character(excited.coefficients.alpha, n, 1, labels);
      expect(excitedOpen.s).toBeLessThan(1e-12); // that solution holds the electron in a 2p
      // 2S below 2P for Li (common practice, no source)
      expect(ground.energyHartree).toBeLessThan(excited.energyHartree - 0.05);
    });
  }

  it('ROHF→ROHF: 1s²2s is stable, 1s²2p is unstable and followed down to 1s²2s', () => {
    const ground = runScf(li.problem, { reference: 'ROHF' });
    const excited = runScf(withoutAtoms, { reference: 'ROHF' });
    const a = stabilityAnalysis(li.problem, ground);
    expect(a.analysed).toBe(true);
    expect(a.rohfToRohf!.lowestEigenvalue).toBeGreaterThan(0);
    expect(a.stable).toBe(true);
    const b = stabilityAnalysis(li.problem, excited);
    // a 2p → 2s rotation lowers the energy of the 2P determinant (the 2S state lies below; common practice, no source)
    expect(b.rohfToRohf!.lowestEigenvalue).toBeLessThan(-1e-3);
    expect(b.instability?.kind).toBe('rohf-to-rohf');
    const followed = followInstability(li.problem, excited, { reference: 'ROHF' });
    expect(followed.reference).toBe('ROHF');
    expect(Math.abs(followed.energyHartree - ground.energyHartree)).toBeLessThan(1e-8);
  });
});

describe('ROHF→ROHF Hessian against closed-shell results', () => {
  it('Hubbard dimer at half filling: the singlet Hessian 2t + U (analytic)', () => {
    // analytic (derived by hand, see hubbardScf.test.ts): singlet A+B eigenvalue 2t + U with t = 1
    for (const U of [1, 4]) {
      const p = hubbardProblem(2, U, 1, 1);
      const rohf = runScf(p, { reference: 'ROHF', guess: 'core' });
      const a = stabilityAnalysis(p, rohf);
      expect(Math.abs(a.rohfToRohf!.lowestEigenvalue - (2 + U))).toBeLessThan(1e-6);
    }
  });

  it('closed-shell water: the lowest ROHF eigenvalue equals the analytic RHF→RHF one', () => {
    // oracle: the analytic singlet Hessian of rhfHessians (Seeger & Pople 1977), an independent code path
    const w = sto3gProblem(waterAtoms());
    const rhf = stabilityAnalysis(w.problem, runScf(w.problem, { reference: 'RHF' })).rhfToRhf!.lowestEigenvalue;
    const rohf = stabilityAnalysis(w.problem, runScf(w.problem, { reference: 'ROHF' })).rohfToRohf!.lowestEigenvalue;
    expect(rhf).toBeGreaterThan(0.1);
    expect(Math.abs(rohf - rhf)).toBeLessThan(1e-6);
  });
});
