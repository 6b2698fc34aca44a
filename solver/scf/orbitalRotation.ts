import { multiply } from './denseAlgebra';

/**
 * exp(K) for a real antisymmetric n×n K (an orthogonal matrix), by scaling and squaring with
 * a Taylor series (Moler & Van Loan, SIAM Rev. 20, 801 (1978)): scale K by 2^-s until its
 * norm is below ½, sum 16 terms, square s times.
 */
export function expAntisymmetric(k: Float64Array, n: number): Float64Array {
  let norm = 0;
  for (let i = 0; i < k.length; i++) norm = Math.max(norm, Math.abs(k[i]));
  norm *= n;
  let squarings = 0;
  while (norm / 2 ** squarings > 0.5) squarings++;
  const scale = 1 / 2 ** squarings;
  const a = new Float64Array(n * n);
  for (let i = 0; i < n * n; i++) a[i] = k[i] * scale;
  const result = new Float64Array(n * n);
  for (let i = 0; i < n; i++) result[i * n + i] = 1;
  let term: Float64Array = Float64Array.from(result);
  for (let order = 1; order <= 16; order++) {
    term = multiply(term, a, n);
    for (let i = 0; i < n * n; i++) {
      term[i] /= order;
      result[i] += term[i];
    }
  }
  let u: Float64Array = result;
  for (let s = 0; s < squarings; s++) u = multiply(u, u, n);
  return u;
}

/**
 * Rotate MOs by occupied–virtual amplitudes: C' = C exp(K) with K_ai = κ_ia, K_ia = −κ_ia
 * (i < nOccupied ≤ a), so each occupied MO i gains Σ_a κ_ia φ_a to first order.
 * `amplitudes` is indexed i·nVirtual + (a − nOccupied).
 */
export function rotateOccupiedVirtual(
  coefficients: Float64Array,
  n: number,
  nOccupied: number,
  amplitudes: Float64Array,
  scale: number,
): Float64Array {
  const nVirtual = n - nOccupied;
  const k = new Float64Array(n * n);
  for (let i = 0; i < nOccupied; i++) {
    for (let v = 0; v < nVirtual; v++) {
      const a = nOccupied + v;
      const x = scale * amplitudes[i * nVirtual + v];
      k[a * n + i] = x;
      k[i * n + a] = -x;
    }
  }
  return multiply(coefficients, expAntisymmetric(k, n), n);
}
