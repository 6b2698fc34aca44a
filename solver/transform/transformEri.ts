import { pairIndex } from '../integrals/eriIndex';

/**
 * Columns `orbitals` of an n×n row-major coefficient matrix, as an n×m row-major block.
 */
export function selectColumns(coefficients: Float64Array, nBasis: number, orbitals: readonly number[]): Float64Array {
  const m = orbitals.length;
  const out = new Float64Array(nBasis * m);
  for (let mu = 0; mu < nBasis; mu++) for (let k = 0; k < m; k++) out[mu * m + k] = coefficients[mu * nBasis + orbitals[k]];
  return out;
}

/** Cᵀ·A·C for a symmetric n×n A and an n×m C; returns m×m. */
export function transformOneIndexPair(a: Float64Array, c: Float64Array, n: number, m: number): Float64Array {
  const ac = new Float64Array(n * m);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const aik = a[i * n + k];
      if (aik === 0) continue;
      for (let q = 0; q < m; q++) ac[i * m + q] += aik * c[k * m + q];
    }
  }
  const out = new Float64Array(m * m);
  for (let i = 0; i < n; i++) {
    for (let p = 0; p < m; p++) {
      const cip = c[i * m + p];
      if (cip === 0) continue;
      for (let q = 0; q < m; q++) out[p * m + q] += cip * ac[i * m + q];
    }
  }
  return out;
}

/**
 * (pq|rs) = Σ C^L_μp C^L_νq C^R_λr C^R_σs (μν|λσ) for packed AO integrals, by four quarter
 * transformations done as two index-pair transformations (each a pair of n³·m matrix
 * products), so the cost is O(n⁴m) rather than O(n⁸) (common practice, no source).
 * The left pair uses cLeft (n×mLeft), the right pair cRight (n×mRight), which lets UHF
 * analyses mix α and β orbitals. Returns a pairsLeft × pairsRight array indexed
 * [pairIndex(p,q) · pairsRight + pairIndex(r,s)].
 */
export function transformEri(
  eriAO: Float64Array,
  n: number,
  cLeft: Float64Array,
  mLeft: number,
  cRight: Float64Array,
  mRight: number,
): Float64Array {
  const aoPairs = (n * (n + 1)) / 2;
  const leftPairs = (mLeft * (mLeft + 1)) / 2;
  const rightPairs = (mRight * (mRight + 1)) / 2;
  const half = new Float64Array(aoPairs * rightPairs);
  const block = new Float64Array(n * n);
  for (let mu = 0; mu < n; mu++) {
    for (let nu = 0; nu <= mu; nu++) {
      const munu = pairIndex(mu, nu);
      for (let la = 0; la < n; la++) {
        for (let si = 0; si <= la; si++) {
          const v = eriAO[pairIndex(munu, pairIndex(la, si))];
          block[la * n + si] = v;
          block[si * n + la] = v;
        }
      }
      const t = transformOneIndexPair(block, cRight, n, mRight);
      const row = munu * rightPairs;
      for (let r = 0; r < mRight; r++) for (let s = 0; s <= r; s++) half[row + pairIndex(r, s)] = t[r * mRight + s];
    }
  }
  const out = new Float64Array(leftPairs * rightPairs);
  for (let rs = 0; rs < rightPairs; rs++) {
    for (let mu = 0; mu < n; mu++) {
      for (let nu = 0; nu <= mu; nu++) {
        const v = half[pairIndex(mu, nu) * rightPairs + rs];
        block[mu * n + nu] = v;
        block[nu * n + mu] = v;
      }
    }
    const t = transformOneIndexPair(block, cLeft, n, mLeft);
    for (let p = 0; p < mLeft; p++) for (let q = 0; q <= p; q++) out[pairIndex(p, q) * rightPairs + rs] = t[p * mLeft + q];
  }
  return out;
}
