/**
 * Compound index of (pq|rs) under the 8-fold permutational symmetry of real orbitals:
 * (pq|rs) = (qp|rs) = (pq|sr) = (rs|pq) = … . Pairs pq are packed as p(p+1)/2 + q with
 * p ≥ q, then pairs of pairs the same way (common practice, no source).
 */
export function pairIndex(p: number, q: number): number {
  return p >= q ? (p * (p + 1)) / 2 + q : (q * (q + 1)) / 2 + p;
}

export function eriIndex(p: number, q: number, r: number, s: number): number {
  return pairIndex(pairIndex(p, q), pairIndex(r, s));
}

/** Length of the packed array for n orbitals. */
export function eriLength(n: number): number {
  const pairs = (n * (n + 1)) / 2;
  return (pairs * (pairs + 1)) / 2;
}
