import { multiply, transpose, congruence } from './denseAlgebra';

/**
 * High-spin ROHF effective Fock operator, built in the MO basis of the current orbitals C
 * (closed 0..nβ−1, open nβ..nα−1, virtual nα..n−1) and returned in the AO basis as S C R Cᵀ S
 * so it can be diagonalised like any Fock matrix.
 *
 * Off-diagonal blocks are the ones fixed by the energy's stationarity conditions:
 * closed–open Fβ, open–virtual Fα, closed–virtual ½(Fα+Fβ). The diagonal blocks are a free
 * choice that only fixes the canonical orbitals and their energies; we use ½(Fα+Fβ) in all
 * three (closed, open, virtual), the canonicalisation of Guest & Saunders, Mol. Phys. 28, 819
 * (1974). A level shift adds ½b to the open block and b to the virtual block.
 */
export function rohfEffectiveFock(
  fockAlpha: Float64Array,
  fockBeta: Float64Array,
  coefficients: Float64Array,
  overlap: Float64Array,
  n: number,
  nAlpha: number,
  nBeta: number,
  levelShift = 0,
): Float64Array {
  const fa = congruence(fockAlpha, coefficients, n);
  const fb = congruence(fockBeta, coefficients, n);
  const r = new Float64Array(n * n);
  const block = (p: number): number => (p < nBeta ? 0 : p < nAlpha ? 1 : 2);
  for (let p = 0; p < n; p++) {
    const bp = block(p);
    for (let q = 0; q < n; q++) {
      const bq = block(q);
      const pq = p * n + q;
      if ((bp === 0 && bq === 1) || (bp === 1 && bq === 0)) r[pq] = fb[pq];
      else if ((bp === 1 && bq === 2) || (bp === 2 && bq === 1)) r[pq] = fa[pq];
      else r[pq] = 0.5 * (fa[pq] + fb[pq]);
    }
    if (bp === 1) r[p * n + p] += 0.5 * levelShift;
    if (bp === 2) r[p * n + p] += levelShift;
  }
  const sc = multiply(overlap, coefficients, n);
  return multiply(multiply(sc, r, n), transpose(sc, n), n);
}
