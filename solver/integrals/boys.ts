/**
 * The Boys function F_n(x) = ∫₀¹ t^{2n} exp(−x t²) dt, needed for every Coulomb integral
 * over Gaussians (Boys, Proc. R. Soc. A 200, 542 (1950)).
 *
 * Method (aims at ≈1e-14 relative for n ≤ MAX_BOYS_ORDER, all x ≥ 0):
 *  - x < ASYMPTOTIC_X: F_N at the highest order wanted from a Taylor expansion about the
 *    nearest point x₀ of a grid with spacing GRID_STEP, using dF_n/dx = −F_{n+1}:
 *    F_N(x₀+δ) = Σ_k F_{N+k}(x₀) (−δ)^k / k!, |δ| ≤ GRID_STEP/2, TAYLOR_TERMS terms
 *    (truncation ≤ 0.05⁹/9! ≈ 5e-18 relative). Lower orders by downward recursion
 *    F_n = (2x F_{n+1} + e^{−x}) / (2n+1), which only adds positive terms and so is stable.
 *    The grid itself is filled once, at load, from the convergent series
 *    F_n(x) = e^{−x} Σ_k (2x)^k / [(2n+1)(2n+3)…(2n+2k+1)], whose terms are all positive.
 *  - x ≥ ASYMPTOTIC_X: F_0 = ½√(π/x) (the dropped erfc(√x) term is below 1e-17 of it),
 *    then upward recursion F_{n+1} = ((2n+1)F_n − e^{−x}) / (2x), stable there because e^{−x}
 *    is negligible beside (2n+1)F_n.
 */

export const MAX_BOYS_ORDER = 32;
const GRID_STEP = 0.1;
const ASYMPTOTIC_X = 40;
const TAYLOR_TERMS = 9;
const GRID_POINTS = Math.round(ASYMPTOTIC_X / GRID_STEP) + 2;
const GRID_ORDERS = MAX_BOYS_ORDER + TAYLOR_TERMS + 1;

function boysBySeries(n: number, x: number): number {
  let term = 1 / (2 * n + 1);
  let sum = term;
  for (let k = 1; k < 1000; k++) {
    term *= (2 * x) / (2 * n + 2 * k + 1);
    sum += term;
    if (term < sum * 1e-17) break;
  }
  return Math.exp(-x) * sum;
}

/** Grid of F_n(x_i), row i holds orders 0 … GRID_ORDERS−1 at x_i = i·GRID_STEP. */
const GRID = (() => {
  const table = new Float64Array(GRID_POINTS * GRID_ORDERS);
  for (let i = 0; i < GRID_POINTS; i++) {
    const x = i * GRID_STEP;
    const top = GRID_ORDERS - 1;
    table[i * GRID_ORDERS + top] = boysBySeries(top, x);
    const ex = Math.exp(-x);
    for (let n = top - 1; n >= 0; n--) {
      table[i * GRID_ORDERS + n] = (2 * x * table[i * GRID_ORDERS + n + 1] + ex) / (2 * n + 1);
    }
  }
  return table;
})();

const INVERSE_FACTORIAL = (() => {
  const f = new Float64Array(TAYLOR_TERMS);
  f[0] = 1;
  for (let k = 1; k < TAYLOR_TERMS; k++) f[k] = f[k - 1] / k;
  return f;
})();

/** Fills out[0 … nMax] with F_0(x) … F_nMax(x). */
export function boysValues(nMax: number, x: number, out: Float64Array): Float64Array {
  if (x >= ASYMPTOTIC_X) {
    const ex = Math.exp(-x);
    const inv2x = 0.5 / x;
    out[0] = 0.5 * Math.sqrt(Math.PI / x);
    for (let n = 0; n < nMax; n++) out[n + 1] = ((2 * n + 1) * out[n] - ex) * inv2x;
    return out;
  }
  const i = Math.round(x / GRID_STEP);
  const delta = i * GRID_STEP - x;
  const row = i * GRID_ORDERS + nMax;
  let value = 0;
  let power = 1;
  for (let k = 0; k < TAYLOR_TERMS; k++) {
    value += GRID[row + k] * power * INVERSE_FACTORIAL[k];
    power *= delta;
  }
  out[nMax] = value;
  if (nMax > 0) {
    const ex = Math.exp(-x);
    for (let n = nMax - 1; n >= 0; n--) out[n] = (2 * x * out[n + 1] + ex) / (2 * n + 1);
  }
  return out;
}

const SCRATCH = new Float64Array(MAX_BOYS_ORDER + 1);

/** F_n(x) for 0 ≤ n ≤ MAX_BOYS_ORDER, x ≥ 0. */
export function boysFunction(n: number, x: number): number {
  return boysValues(n, x, SCRATCH)[n];
}
