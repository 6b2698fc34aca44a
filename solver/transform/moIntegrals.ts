import { eriLength, pairIndex } from '../integrals/eriIndex';
import { selectColumns, transformEri, transformOneIndexPair } from './transformEri';

export interface MoIntegrals {
  /** h_pq over the chosen orbitals, m×m row-major. */
  h: Float64Array;
  /** (pq|rs) over the chosen orbitals, 8-fold packed (eriIndex). */
  eri: Float64Array;
}

/**
 * One- and two-electron integrals over the MOs `orbitals` (columns of C, in the order given):
 * h' = Cᵀ h C and (pq|rs) by quarter transformations, O(n⁵).
 */
export function moIntegrals(
  hAO: Float64Array,
  eriAO: Float64Array,
  coefficients: Float64Array,
  nBasis: number,
  orbitals: readonly number[],
): MoIntegrals {
  const m = orbitals.length;
  const c = selectColumns(coefficients, nBasis, orbitals);
  const h = transformOneIndexPair(hAO, c, nBasis, m);
  const pairs = (m * (m + 1)) / 2;
  const full = transformEri(eriAO, nBasis, c, m, c, m);
  const eri = new Float64Array(eriLength(m));
  for (let pq = 0; pq < pairs; pq++) for (let rs = 0; rs <= pq; rs++) eri[pairIndex(pq, rs)] = full[pq * pairs + rs];
  return { h, eri };
}
