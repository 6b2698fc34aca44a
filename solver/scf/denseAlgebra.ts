/**
 * Small dense helpers for square row-major Float64Array matrices used by the SCF.
 * Sizes are tens of functions, so plain triple loops are fast enough and allocate once.
 */
import { Matrix, EigenvalueDecomposition } from 'ml-matrix';

/** C = A·B for n×n matrices. */
export function multiply(a: Float64Array, b: Float64Array, n: number): Float64Array {
  const c = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const rowC = i * n;
    for (let k = 0; k < n; k++) {
      const aik = a[i * n + k];
      if (aik === 0) continue;
      const rowB = k * n;
      for (let j = 0; j < n; j++) c[rowC + j] += aik * b[rowB + j];
    }
  }
  return c;
}

/** Aᵀ for an n×n matrix. */
export function transpose(a: Float64Array, n: number): Float64Array {
  const t = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) t[j * n + i] = a[i * n + j];
  return t;
}

/** Bᵀ·A·B, the congruence used to change basis (e.g. AO → orthogonal or MO). */
export function congruence(a: Float64Array, b: Float64Array, n: number): Float64Array {
  return multiply(transpose(b, n), multiply(a, b, n), n);
}

/** Frobenius norm √Σ a². */
export function frobeniusNorm(a: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < a.length; i++) sum += a[i] * a[i];
  return Math.sqrt(sum);
}

/** Σ_ij a_ij b_ij (the trace of Aᵀ·B). */
export function traceProduct(a: Float64Array, b: Float64Array): number {
  let sum = 0;
  for (let i = 0; i < a.length; i++) sum += a[i] * b[i];
  return sum;
}

export interface SymmetricEigen {
  /** Ascending eigenvalues. */
  values: Float64Array;
  /** Row-major n×n, column j the eigenvector of values[j]. */
  vectors: Float64Array;
}

/**
 * Eigen-decomposition of a real symmetric matrix (ml-matrix, assumed symmetric), with the
 * eigenpairs sorted by ascending eigenvalue. The input is symmetrised first so round-off
 * asymmetry from earlier products cannot leak into the result.
 */
export function symmetricEigen(a: Float64Array, n: number): SymmetricEigen {
  const m = new Matrix(n, n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) m.set(i, j, 0.5 * (a[i * n + j] + a[j * n + i]));
  const evd = new EigenvalueDecomposition(m, { assumeSymmetric: true });
  const raw = evd.realEigenvalues;
  const vecs = evd.eigenvectorMatrix;
  const order = Array.from({ length: n }, (_, i) => i).sort((x, y) => raw[x] - raw[y]);
  const values = new Float64Array(n);
  const vectors = new Float64Array(n * n);
  for (let j = 0; j < n; j++) {
    const src = order[j];
    values[j] = raw[src];
    for (let i = 0; i < n; i++) vectors[i * n + j] = vecs.get(i, src);
  }
  return { values, vectors };
}

/** Solve the small dense system A·x = b (Gaussian elimination with partial pivoting); null if singular. */
export function solveLinear(a: Float64Array, b: Float64Array, n: number): Float64Array | null {
  const m = Float64Array.from(a);
  const x = Float64Array.from(b);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r * n + col]) > Math.abs(m[pivot * n + col])) pivot = r;
    if (Math.abs(m[pivot * n + col]) < 1e-300) return null;
    if (pivot !== col) {
      for (let c = 0; c < n; c++) {
        const tmp = m[col * n + c];
        m[col * n + c] = m[pivot * n + c];
        m[pivot * n + c] = tmp;
      }
      const tb = x[col];
      x[col] = x[pivot];
      x[pivot] = tb;
    }
    for (let r = col + 1; r < n; r++) {
      const f = m[r * n + col] / m[col * n + col];
      if (f === 0) continue;
      for (let c = col; c < n; c++) m[r * n + c] -= f * m[col * n + c];
      x[r] -= f * x[col];
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = x[r];
    for (let c = r + 1; c < n; c++) s -= m[r * n + c] * x[c];
    x[r] = s / m[r * n + r];
  }
  for (let i = 0; i < n; i++) if (!Number.isFinite(x[i])) return null;
  return x;
}
