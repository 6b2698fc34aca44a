import { describe, expect, it } from 'vitest';
import { Matrix, solve } from 'ml-matrix';
import { gaussQuadrature } from 'flo-gauss-quadrature';
import { STO_1S, STO_2SP } from '../../../solver/basis/stoExpansions';

/**
 * Checks of the STO-nG tables (ζ = 1) against the Slater functions they fit, by radial
 * quadrature with flo-gauss-quadrature. Slater functions: 1s e^{−r}/√π, 2s r e^{−r}/√(3π),
 * 2p x e^{−r}/√π (analytic normalisation).
 */
const BREAKS = [0, 0.05, 0.2, 0.6, 1.5, 4, 10, 25, 45];
function radial(f: (r: number) => number): number {
  let sum = 0;
  for (let k = 0; k + 1 < BREAKS.length; k++) {
    const h = (BREAKS[k + 1] - BREAKS[k]) / 4;
    for (let m = 0; m < 4; m++) sum += gaussQuadrature(f, [BREAKS[k] + m * h, BREAKS[k] + (m + 1) * h], 64);
  }
  return sum;
}

type Kind = '1s' | '2s' | '2p';
const slater: Record<Kind, (r: number) => number> = {
  '1s': (r) => Math.exp(-r) / Math.sqrt(Math.PI),
  '2s': (r) => (r * Math.exp(-r)) / Math.sqrt(3 * Math.PI),
  '2p': (r) => Math.exp(-r) / Math.sqrt(Math.PI), // radial factor of x·e^{−r}/√π
};
/** Angular integral and extra radial power: s ∫dΩ = 4π, p ∫x² dΩ = 4π r²/3. */
const angular = (kind: Kind) => (kind === '2p' ? { factor: (4 * Math.PI) / 3, power: 4 } : { factor: 4 * Math.PI, power: 2 });

/** Gaussian primitive normalised by quadrature: s e^{−αr²}, p x e^{−αr²}. */
function gaussian(kind: Kind, alpha: number): (r: number) => number {
  const { factor, power } = angular(kind);
  const norm = Math.sqrt(factor * radial((r) => Math.pow(r, power) * Math.exp(-2 * alpha * r * r)));
  return (r) => Math.exp(-alpha * r * r) / norm;
}

function inner(kind: Kind, f: (r: number) => number, g: (r: number) => number): number {
  const { factor, power } = angular(kind);
  return factor * radial((r) => Math.pow(r, power) * f(r) * g(r));
}

/** ⟨STO|G⟩ for the normalised contraction G = Σ d_k g_k. */
function slaterOverlap(kind: Kind, exponents: readonly number[], coefficients: readonly number[]): number {
  const g = exponents.map((a) => gaussian(kind, a));
  const contraction = (r: number) => g.reduce((s, gk, k) => s + coefficients[k] * gk(r), 0);
  return inner(kind, slater[kind], contraction) / Math.sqrt(inner(kind, contraction, contraction));
}

/** Least-squares residual with the best linear coefficients for fixed exponents: 1 − bᵀS⁻¹b. */
function residual(kind: Kind, exponents: readonly number[]): number {
  const g = exponents.map((a) => gaussian(kind, a));
  const b = g.map((gk) => inner(kind, slater[kind], gk));
  const s = new Matrix(g.map((gi) => g.map((gj) => inner(kind, gi, gj))));
  const x = solve(s, Matrix.columnVector(b)).to1DArray();
  return 1 - b.reduce((sum, bk, k) => sum + bk * x[k], 0);
}

describe('STO-nG expansions reproduce the Slater functions', () => {
  // common practice, no source: an n-Gaussian fit's error falls roughly tenfold per added term.
  const bound1s: Record<number, number> = { 2: 2e-3, 3: 3e-4, 4: 5e-5, 5: 1e-5, 6: 2e-6 };
  const boundSp: Record<number, number> = { 2: 1e-2, 3: 1e-3, 4: 2e-4, 5: 5e-5, 6: 1e-5 };
  for (const n of [2, 3, 4, 5, 6]) {
    it(`STO-${n}G: overlaps with 1s, 2s, 2p are close to 1`, () => {
      const s1 = slaterOverlap('1s', STO_1S[n].exponents, STO_1S[n].coefficients);
      const s2 = slaterOverlap('2s', STO_2SP[n].exponents, STO_2SP[n].coefficientsS);
      const s3 = slaterOverlap('2p', STO_2SP[n].exponents, STO_2SP[n].coefficientsP);
      expect(1 - s1).toBeGreaterThan(0); // Cauchy–Schwarz: a Gaussian sum cannot equal e^{−r}
      expect(1 - s1).toBeLessThan(bound1s[n]);
      expect(1 - s2).toBeLessThan(boundSp[n]);
      expect(1 - s3).toBeLessThan(boundSp[n]);
    });
  }

  it('the tabulated coefficients are the best linear ones for the tabulated exponents', () => {
    // At the least-squares optimum ⟨STO|G⟩ = √(bᵀS⁻¹b) = √(1 − residual) (analytic result).
    for (const n of [2, 3, 6]) {
      const e = STO_1S[n].exponents;
      expect(Math.abs(slaterOverlap('1s', e, STO_1S[n].coefficients) - Math.sqrt(1 - residual('1s', e)))).toBeLessThan(1e-8);
      const sp = STO_2SP[n].exponents;
      expect(Math.abs(slaterOverlap('2p', sp, STO_2SP[n].coefficientsP) - Math.sqrt(1 - residual('2p', sp)))).toBeLessThan(1e-8);
    }
  });

  it('the tabulated exponents are a minimum of the least-squares fit', () => {
    // Moving any exponent by ±0.5% must not lower the residual (for 2sp the 2s and 2p residuals are summed).
    const check = (exponents: readonly number[], kinds: Kind[]) => {
      const total = (e: readonly number[]) => kinds.reduce((s, k) => s + residual(k, e), 0);
      const best = total(exponents);
      for (let k = 0; k < exponents.length; k++) {
        for (const f of [0.995, 1.005]) {
          const moved = exponents.map((a, m) => (m === k ? a * f : a));
          expect(total(moved)).toBeGreaterThan(best);
        }
      }
    };
    check(STO_1S[3].exponents, ['1s']);
    check(STO_1S[6].exponents, ['1s']);
    check(STO_2SP[3].exponents, ['2s', '2p']);
    check(STO_2SP[4].exponents, ['2s', '2p']);
  });
});
