import { multiply } from './denseAlgebra';

/**
 * ⟨S²⟩ of a single determinant with α and β spin-orbital densities in a non-orthogonal AO basis:
 *   ⟨S²⟩ = S_z(S_z+1) + N_β − Σ_ij |⟨φ_iα|φ_jβ⟩|² = S_z(S_z+1) + N_β − tr(Dα S Dβ S)
 * (the UHF spin-contamination formula, e.g. Szabo & Ostlund (1996) ch. 3, from memory).
 */
export function determinantSpinSquared(
  densityAlpha: Float64Array,
  densityBeta: Float64Array,
  overlap: Float64Array,
  n: number,
  nAlpha: number,
  nBeta: number,
): number {
  const sz = 0.5 * (nAlpha - nBeta);
  const a = multiply(densityAlpha, overlap, n);
  const b = multiply(densityBeta, overlap, n);
  let trace = 0;
  for (let i = 0; i < n; i++) for (let k = 0; k < n; k++) trace += a[i * n + k] * b[k * n + i];
  return sz * (sz + 1) + nBeta - trace;
}
