/**
 * Coulomb and exchange matrices from packed 8-fold ERIs in one pass:
 *   J[D]_pq = Σ_rs (pq|rs) D_rs,   K[D]_pr = Σ_qs (pq|rs) D_qs,
 * for symmetric densities D. Each unique integral is weighted by ½ for every index
 * coincidence (p=q, r=s, pq=rs), which makes the sum over its eight permutations count
 * every distinct permutation once; half of the permutations are transposes of the other
 * half, so we accumulate one triangle-ish half and symmetrise at the end
 * (common practice, no source).
 */
export interface CoulombExchange {
  /** J[D_k] for each density passed in. */
  coulomb: Float64Array[];
  /** K[D_k] for each density passed in. */
  exchange: Float64Array[];
}

export function coulombExchange(eri: Float64Array, n: number, densities: Float64Array[]): CoulombExchange {
  const nd = densities.length;
  const jHalf = densities.map(() => new Float64Array(n * n));
  const kHalf = densities.map(() => new Float64Array(n * n));
  let index = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      for (let k = 0; k <= i; k++) {
        const lMax = k === i ? j : k;
        for (let l = 0; l <= lMax; l++, index++) {
          let v = eri[index];
          if (v === 0) continue;
          if (i === j) v *= 0.5;
          if (k === l) v *= 0.5;
          if (i === k && j === l) v *= 0.5;
          const ij = i * n + j;
          const kl = k * n + l;
          for (let d = 0; d < nd; d++) {
            const D = densities[d];
            const J = jHalf[d];
            const K = kHalf[d];
            J[ij] += 2 * D[kl] * v;
            J[kl] += 2 * D[ij] * v;
            K[i * n + k] += D[j * n + l] * v;
            K[j * n + k] += D[i * n + l] * v;
            K[i * n + l] += D[j * n + k] * v;
            K[j * n + l] += D[i * n + k] * v;
          }
        }
      }
    }
  }
  const symmetrise = (half: Float64Array): Float64Array => {
    const full = new Float64Array(n * n);
    for (let p = 0; p < n; p++) for (let q = 0; q < n; q++) full[p * n + q] = half[p * n + q] + half[q * n + p];
    return full;
  };
  return { coulomb: jHalf.map(symmetrise), exchange: kHalf.map(symmetrise) };
}
