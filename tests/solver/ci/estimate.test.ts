import { describe, expect, it } from 'vitest';
import { checkBudget, estimateCiSpace } from '../../../solver/ci/estimate';
import { buildCiSpace } from '../../../solver/ci/space';
import { SolverError } from '../../../solver/errors';
import { solveCi } from '../../../solver/ci/solveCi';
import { hubbardHamiltonian } from '../../../solver/system/hubbard';
import { spaceCases } from './spaces';

describe('estimateCiSpace', () => {
  it('counts full CI as C(n,nα)·C(n,nβ)', () => {
    // binomials: C(12,6)² = 924² = 853,776; C(10,5)² = 252² = 63,504; C(30,15)² ≈ 2.4e16
    expect(estimateCiSpace({ nOrbitals: 12, nAlpha: 6, nBeta: 6, maxExcitation: null })).toMatchObject({ determinants: 853776, alphaStrings: 924, betaStrings: 924 });
    expect(estimateCiSpace({ nOrbitals: 10, nAlpha: 5, nBeta: 5, maxExcitation: null }).determinants).toBe(63504);
    const huge = estimateCiSpace({ nOrbitals: 30, nAlpha: 15, nBeta: 15, maxExcitation: null });
    expect(huge.alphaStrings).toBe(155117520);
    // above 2^53 the class sums round: compare relatively
    expect(Math.abs(huge.determinants / (155117520 * 155117520) - 1)).toBeLessThan(1e-12);
    expect(Number.isFinite(huge.bytes)).toBe(true);
  });

  it('counts CISD of a closed shell as 1 + 2·o·v + (o·v)² + 2·C(o,2)·C(v,2)', () => {
    // analytic: singles o·v per spin; doubles αα, ββ: C(o,2)C(v,2) each, αβ: (o·v)²; o = 5, v = 5
    const o = 5;
    const v = 5;
    const expected = 1 + 2 * o * v + (o * v) ** 2 + 2 * 10 * 10;
    expect(estimateCiSpace({ nOrbitals: 10, nAlpha: 5, nBeta: 5, maxExcitation: 2 }).determinants).toBe(expected);
  });

  it('equals the built space for every kind of truncated space', () => {
    const extra = [
      { nOrbitals: 9, nAlpha: 4, nBeta: 3, maxExcitation: 3 },
      { nOrbitals: 8, nAlpha: 4, nBeta: 4, maxExcitation: 2, ras: { ras1: [0, 1, 2], ras3: [6, 7], maxHoles: 1, maxParticles: 2 } },
      { nOrbitals: 8, nAlpha: 2, nBeta: 0, maxExcitation: null },
      { nOrbitals: 35, nAlpha: 3, nBeta: 3, maxExcitation: 2 },
    ];
    for (const spec of [...spaceCases.map((c) => c.spec), ...extra]) {
      const irreps = spaceCases.find((c) => c.spec === spec)?.irreps;
      const ir = irreps ? Int32Array.from(irreps) : undefined;
      const built = buildCiSpace(spec, ir);
      const est = estimateCiSpace(spec, { orbitalIrreps: ir });
      expect(est.determinants).toBe(built.determinantCount);
      expect(est.alphaStrings).toBe(built.alpha.count);
      expect(est.betaStrings).toBe(built.beta.count);
    }
  });

  it('works above 32 orbitals: CISD with 35 orbitals', () => {
    // analytic count as above with o = 3, v = 32
    const space = buildCiSpace({ nOrbitals: 35, nAlpha: 3, nBeta: 3, maxExcitation: 2 });
    expect(space.determinantCount).toBe(1 + 2 * 96 + 96 ** 2 + 2 * 3 * 496);
    expect(space.referenceIndex).toBe(0);
  });
});

describe('checkBudget', () => {
  it('refuses a space over budget with the count and the ways to shrink it', () => {
    const est = estimateCiSpace({ nOrbitals: 30, nAlpha: 15, nBeta: 15, maxExcitation: null });
    let error: unknown;
    try {
      checkBudget(est);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(SolverError);
    expect((error as SolverError).code).toBe('over-budget');
    const message = (error as SolverError).message;
    expect(message).toContain(est.determinants.toExponential(3));
    for (const hint of ['freeze core', 'virtual', 'excitation level', 'active window', 'smaller basis']) expect(message).toContain(hint);
  });

  it('names the count with separators, accepts spaces within budget, and solveCi refuses before allocating', () => {
    const est = estimateCiSpace({ nOrbitals: 12, nAlpha: 6, nBeta: 6, maxExcitation: null });
    expect(() => checkBudget(est, 1e6)).toThrow(/853,776 determinants/);
    expect(() => checkBudget(est)).not.toThrow();
    const ham = hubbardHamiltonian({ sites: 12, periodic: true, t: 1, U: 4 });
    expect(() => solveCi(ham, { nOrbitals: 12, nAlpha: 6, nBeta: 6, maxExcitation: null }, { budgetBytes: 1e6 })).toThrow(/853,776/);
  });
});
