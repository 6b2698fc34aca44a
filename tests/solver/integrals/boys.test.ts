import { describe, expect, it } from 'vitest';
import gammainc from '@stdlib/math-base-special-gammainc';
import gamma from '@stdlib/math-base-special-gamma';
import { boysFunction, boysValues } from '../../../solver/integrals/boys';

/** F_n(x) = Γ(n+½) P(n+½, x) / (2 x^{n+½}), P the regularised lower incomplete gamma (analytic identity). */
function boysReference(n: number, x: number): number {
  const a = n + 0.5;
  return (gamma(a) * gammainc(x, a)) / (2 * Math.pow(x, a));
}

describe('boysFunction', () => {
  it('is 1/(2n+1) at x = 0', () => {
    for (let n = 0; n <= 16; n++) expect(boysFunction(n, 0)).toBe(1 / (2 * n + 1)); // analytic: ∫₀¹ t^{2n} dt
  });

  it('matches the incomplete-gamma form from @stdlib over n = 0…16, x up to 100', () => {
    let worst = 0;
    for (let n = 0; n <= 16; n++) {
      for (let x = 1e-3; x <= 100; x *= 1.09) {
        const ref = boysReference(n, x); // @stdlib/math-base-special-gammainc and -gamma
        worst = Math.max(worst, Math.abs(boysFunction(n, x) - ref) / ref);
      }
    }
    // The reference is a product and quotient of library functions, each good to a few ulp;
    // the worst case seen is ≈4e-15, so 1e-14 is a real check.
    expect(worst).toBeLessThan(1e-14);
  });

  it('matches at grid points, midpoints and around the method switch', () => {
    for (const x of [0.05, 0.1, 0.15, 1.25, 7.35, 39.95, 39.999, 40, 40.001, 55.5]) {
      for (const n of [0, 1, 4, 9, 16]) {
        const ref = boysReference(n, x); // @stdlib reference as above
        expect(Math.abs(boysFunction(n, x) - ref) / ref).toBeLessThan(1e-13);
      }
    }
  });

  it('fills all orders consistently with the single-order call', () => {
    const out = new Float64Array(17);
    boysValues(16, 3.7, out);
    for (let n = 0; n <= 16; n++) expect(out[n]).toBeCloseTo(boysReference(n, 3.7), 14); // @stdlib reference
  });
});
