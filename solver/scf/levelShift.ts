import { multiply } from './denseAlgebra';

/**
 * Level shifting (Saunders & Hillier, Int. J. Quantum Chem. 7, 699 (1973)): raise the
 * virtual orbitals of the current iterate by b, F' = F + b S C_v C_vᵀ S. Occupied–virtual
 * mixing per iteration shrinks as the gap grows, which damps oscillations; the fixed point
 * (a zero occupied–virtual Fock block) is unchanged.
 */
export function levelShiftedFock(
  fock: Float64Array,
  coefficients: Float64Array,
  overlap: Float64Array,
  n: number,
  nOccupied: number,
  shiftHartree: number,
): Float64Array {
  if (shiftHartree === 0 || nOccupied >= n) return fock;
  const sc = multiply(overlap, coefficients, n);
  const shifted = Float64Array.from(fock);
  for (let v = nOccupied; v < n; v++) {
    for (let mu = 0; mu < n; mu++) {
      const a = sc[mu * n + v] * shiftHartree;
      if (a === 0) continue;
      for (let nu = 0; nu < n; nu++) shifted[mu * n + nu] += a * sc[nu * n + v];
    }
  }
  return shifted;
}

