import { doubleFactorialOdd } from './cartesian';

/**
 * Norm of the primitive x^l·exp(−αr²): N² = (2α/π)^{3/2} (4α)^l / (2l−1)!!
 * (from ∫x^{2l}e^{−2αx²}dx = (2l−1)!!/(4α)^l·√(π/2α); analytic result).
 */
export function primitiveNorm(exponent: number, l: number): number {
  return Math.pow((2 * exponent) / Math.PI, 0.75) * Math.sqrt(Math.pow(4 * exponent, l) / doubleFactorialOdd(l));
}

/** Overlap of two normalised primitives of the same l on one centre: (2√(αβ)/(α+β))^{l+3/2}. */
export function normalisedPrimitiveOverlap(a: number, b: number, l: number): number {
  return Math.pow((2 * Math.sqrt(a * b)) / (a + b), l + 1.5);
}

/**
 * Scales contraction coefficients (over normalised primitives) so the contracted function
 * has unit norm. The shape of the contraction (the ratios) is kept as given.
 */
export function normaliseContraction(exponents: ArrayLike<number>, coefficients: ArrayLike<number>, l: number): Float64Array {
  const n = exponents.length;
  let norm2 = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      norm2 += coefficients[i] * coefficients[j] * normalisedPrimitiveOverlap(exponents[i], exponents[j], l);
    }
  }
  const out = new Float64Array(n);
  const scale = 1 / Math.sqrt(norm2);
  for (let i = 0; i < n; i++) out[i] = coefficients[i] * scale;
  return out;
}
