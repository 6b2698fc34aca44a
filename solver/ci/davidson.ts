/**
 * Block Davidson eigensolver for the lowest roots of a large real symmetric matrix known
 * only through its action (Davidson, J. Comput. Phys. 17, 87 (1975); block form after
 * Liu, report NRCC LBL-8158 (1978)).
 *
 * Storage: the orthonormal subspace V and its images AV live in two flat Float64Arrays of
 * capacity·N entries (vector i at [i·N, (i+1)·N)), and the subspace matrix G = Vᵀ·A·V in a
 * small row-major array. Adding a vector costs one matrix product plus O(N·m) dot products
 * for its new row and column of G; nothing already in G is recomputed.
 *
 * Each iteration: Rayleigh–Ritz in the subspace, then for every tracked root one pass over
 * V and AV forms its Ritz vector x and residual r = A x − θ x together. Corrections:
 *   'davidson'  δ = r / (θ − D), D the diagonal (Davidson 1975);
 *   'olsen'     δ = (θ − D)⁻¹ (r − ε x), ε = xᵀ(θ − D)⁻¹r / xᵀ(θ − D)⁻¹x, which removes the
 *               component along x that the plain correction would reproduce
 *               (Olsen, Jørgensen & Simons, Chem. Phys. Lett. 169, 463 (1990)).
 * With a P space (options.pSpace) the diagonal D is replaced by the zeroth-order matrix A0
 * that is exact on P, in both formulas. Denominators are kept at least 1e-8 away from zero. Each correction is orthogonalised
 * twice (classical Gram–Schmidt) against V and normalised; if it lies in the span the
 * residual is tried instead.
 *
 * When the subspace would exceed maxSubspace it collapses in place (thick restart) to its
 * lowest max(2·roots, maxSubspace/2) Ritz vectors; their images are the same combinations
 * of the stored AV, so the restart costs no matrix products, and G becomes diagonal.
 *
 * A root is converged when its residual norm ≤ residualTolerance AND its energy changed by
 * ≤ energyTolerance since the previous iteration. Work arrays are allocated once.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { SolverError } from '../errors';

export interface DavidsonIteration {
  iteration: number;
  energies: number[];
  residualNorms: number[];
}

export type DavidsonCorrection = 'davidson' | 'olsen';

export interface DavidsonOptions {
  roots: number;
  maxIterations: number;
  residualTolerance: number;
  energyTolerance: number;
  maxSubspace: number;
  /** Correction vector formula (default 'olsen'). */
  correction?: DavidsonCorrection;
  /** Projector onto the invariant subspace being searched (applied to every new vector before orthogonalisation). */
  project?: (v: Float64Array) => void;
  /** Dimension of that subspace (default N): the search ends when V spans it. */
  dimension?: number;
  /** Exact block of A on a few chosen coordinates, used in the preconditioner (see PSpace). */
  pSpace?: PSpace;
  onIteration?: (record: DavidsonIteration) => void;
  shouldCancel?: () => boolean;
}

/**
 * A P space for the preconditioner: coordinates `indices` (m of them) on which A is known
 * exactly, A_PP = U·diag(values)·Uᵀ with U = vectors (row-major m×m, column k = eigenvector k).
 * The zeroth-order matrix is then A_PP on P and the diagonal elsewhere, with no P–Q coupling,
 * and (θ − A0)⁻¹ is applied exactly (Olsen, Jørgensen & Simons, Chem. Phys. Lett. 169, 463
 * (1990), who use such an explicit P space in their preconditioner). P must be invariant
 * under the searched sector's projector (a set closed under the symmetry), so that the
 * preconditioner keeps vectors in the sector.
 */
export interface PSpace {
  indices: Int32Array;
  values: Float64Array;
  vectors: Float64Array;
}

export interface DavidsonResult {
  energies: number[];
  vectors: Float64Array[];
  history: DavidsonIteration[];
  matrixProducts: number;
}

/** Σ a[ao + t]·b[bo + t] for t < len. */
function dotAt(a: Float64Array, ao: number, b: Float64Array, bo: number, len: number): number {
  let s0 = 0;
  let s1 = 0;
  let t = 0;
  for (; t + 1 < len; t += 2) {
    s0 += a[ao + t] * b[bo + t];
    s1 += a[ao + t + 1] * b[bo + t + 1];
  }
  if (t < len) s0 += a[ao + t] * b[bo + t];
  return s0 + s1;
}

/** Symmetric eigenproblem of the leading m×m block of a row-major array (ascending values). */
function smallEigen(G: Float64Array, stride: number, m: number): { values: Float64Array; vectors: Float64Array } {
  const rows: number[][] = [];
  for (let i = 0; i < m; i++) {
    const row = new Array<number>(m);
    // symmetrise against round-off
    for (let j = 0; j < m; j++) row[j] = 0.5 * (G[i * stride + j] + G[j * stride + i]);
    rows.push(row);
  }
  const eig = new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true });
  const raw = eig.realEigenvalues;
  const E = eig.eigenvectorMatrix;
  const order = raw.map((_, i) => i).sort((a, b) => raw[a] - raw[b]);
  const values = new Float64Array(m);
  // vectors[r·m + i] = component i of the r-th lowest eigenvector
  const vectors = new Float64Array(m * m);
  order.forEach((col, r) => {
    values[r] = raw[col];
    for (let i = 0; i < m; i++) vectors[r * m + i] = E.get(i, col);
  });
  return { values, vectors };
}

export function davidson(
  apply: (x: Float64Array, out: Float64Array) => void,
  diagonal: Float64Array,
  guesses: Float64Array[],
  options: DavidsonOptions,
): DavidsonResult {
  const N = diagonal.length;
  const k = options.roots;
  const dimension = Math.min(N, options.dimension ?? N);
  const maxSubspace = Math.min(dimension, Math.max(options.maxSubspace, 2 * k));
  const capacity = Math.min(dimension, Math.max(maxSubspace, guesses.length));
  const useOlsen = (options.correction ?? 'olsen') === 'olsen';
  const V = new Float64Array(capacity * N);
  const AV = new Float64Array(capacity * N);
  const G = new Float64Array(capacity * capacity);
  const ritzX = Array.from({ length: k }, () => new Float64Array(N));
  const residual = Array.from({ length: k }, () => new Float64Array(N));
  const candidate = new Float64Array(N);
  const overlaps = new Float64Array(capacity);
  const pSpace = options.pSpace && options.pSpace.indices.length > 0 ? options.pSpace : undefined;
  const shifted = pSpace ? new Float64Array(N) : candidate;
  const pIn = pSpace ? new Float64Array(pSpace.indices.length) : null;
  const pOut = pSpace ? new Float64Array(pSpace.indices.length) : null;
  /** out = (θ − A0)⁻¹ v: the diagonal outside P, U·diag(1/(θ − λ))·Uᵀ on P. */
  const applyInverse = (th: number, v: Float64Array, out: Float64Array): void => {
    for (let t = 0; t < N; t++) out[t] = v[t] / clampedDenominator(th - diagonal[t]);
    if (!pSpace || !pIn || !pOut) return;
    const { indices, values, vectors } = pSpace;
    const p = indices.length;
    for (let k = 0; k < p; k++) {
      let s = 0;
      for (let a = 0; a < p; a++) s += vectors[a * p + k] * v[indices[a]];
      pIn[k] = s / clampedDenominator(th - values[k]);
    }
    pOut.fill(0);
    for (let a = 0; a < p; a++) {
      let s = 0;
      const row = a * p;
      for (let k = 0; k < p; k++) s += vectors[row + k] * pIn[k];
      pOut[a] = s;
    }
    for (let a = 0; a < p; a++) out[indices[a]] = pOut[a];
  };
  let m = 0; // vectors in V (with images in AV and rows in G)
  let pending = 0; // orthonormal vectors in V[m … m+pending) still without images
  let products = 0;

  /** Orthogonalise `candidate` against V[0 … m+pending), normalise and append it; false if it lies in the span. */
  const appendCandidate = (): boolean => {
    const count = m + pending;
    if (count >= capacity) return false;
    options.project?.(candidate);
    let norm = Math.sqrt(dotAt(candidate, 0, candidate, 0, N));
    if (!(norm > 0)) return false;
    for (let t = 0; t < N; t++) candidate[t] /= norm;
    for (let pass = 0; pass < 2; pass++) {
      for (let i = 0; i < count; i++) overlaps[i] = dotAt(V, i * N, candidate, 0, N);
      for (let i = 0; i < count; i++) {
        const o = overlaps[i];
        const off = i * N;
        for (let t = 0; t < N; t++) candidate[t] -= o * V[off + t];
      }
    }
    norm = Math.sqrt(dotAt(candidate, 0, candidate, 0, N));
    if (norm < 1e-8) return false;
    const off = count * N;
    for (let t = 0; t < N; t++) V[off + t] = candidate[t] / norm;
    pending++;
    return true;
  };

  for (const g of guesses) {
    candidate.set(g);
    appendCandidate();
  }
  if (pending < k) throw new SolverError('internal', `Davidson needs ${k} independent start vectors, got ${pending}`);

  const history: DavidsonIteration[] = [];
  const previous = new Float64Array(k).fill(Number.POSITIVE_INFINITY);
  const theta = new Float64Array(k);
  const residualNorms = new Float64Array(k);

  for (let iteration = 1; iteration <= options.maxIterations; iteration++) {
    if (options.shouldCancel?.()) throw new SolverError('cancelled', 'the CI calculation was cancelled');
    // images of the pending vectors and their new rows/columns of G
    for (; pending > 0; pending--, m++) {
      const vj = V.subarray(m * N, (m + 1) * N);
      const avj = AV.subarray(m * N, (m + 1) * N);
      avj.fill(0);
      apply(vj, avj);
      products++;
      for (let i = 0; i <= m; i++) {
        const gij = dotAt(V, i * N, AV, m * N, N);
        G[m * capacity + i] = gij;
        G[i * capacity + m] = gij;
      }
    }
    const { values, vectors: y } = smallEigen(G, capacity, m);
    for (let r = 0; r < k; r++) {
      theta[r] = values[r];
      // one pass over V and AV: x = V y, r = AV y − θ x
      const x = ritzX[r];
      const res = residual[r];
      x.fill(0);
      res.fill(0);
      for (let i = 0; i < m; i++) {
        const yi = y[r * m + i];
        if (yi === 0) continue;
        const off = i * N;
        for (let t = 0; t < N; t++) {
          x[t] += yi * V[off + t];
          res[t] += yi * AV[off + t];
        }
      }
      const th = theta[r];
      for (let t = 0; t < N; t++) res[t] -= th * x[t];
      residualNorms[r] = Math.sqrt(dotAt(res, 0, res, 0, N));
    }
    const record: DavidsonIteration = { iteration, energies: Array.from(theta), residualNorms: Array.from(residualNorms) };
    history.push(record);
    options.onIteration?.(record);
    let allConverged = true;
    const needsCorrection: number[] = [];
    for (let r = 0; r < k; r++) {
      const small = residualNorms[r] <= options.residualTolerance;
      if (!(small && Math.abs(theta[r] - previous[r]) <= options.energyTolerance)) allConverged = false;
      // a small residual with the energy still to settle needs no new direction: the next iteration decides
      if (!small) needsCorrection.push(r);
    }
    previous.set(theta);
    if (allConverged || m >= dimension) {
      return { energies: Array.from(theta), vectors: ritzX.map((x) => Float64Array.from(x)), history, matrixProducts: products };
    }
    if (m + needsCorrection.length > maxSubspace) {
      const keep = Math.min(m, Math.max(2 * k, Math.floor(maxSubspace / 2)));
      collapse(V, N, m, keep, y);
      collapse(AV, N, m, keep, y);
      G.fill(0);
      for (let r = 0; r < keep; r++) G[r * capacity + r] = values[r];
      m = keep;
    }
    for (const r of needsCorrection) {
      const th = theta[r];
      const res = residual[r];
      let epsilon = 0;
      if (pSpace) {
        // candidate = M r − ε M x with M = (θ − A0)⁻¹; ε = xᵀM r / xᵀM x (Olsen et al. 1990)
        const x = ritzX[r];
        applyInverse(th, res, candidate);
        if (useOlsen) {
          applyInverse(th, x, shifted);
          const xx = dotAt(x, 0, shifted, 0, N);
          epsilon = xx !== 0 ? dotAt(x, 0, candidate, 0, N) / xx : 0;
          for (let t = 0; t < N; t++) candidate[t] -= epsilon * shifted[t];
        }
      } else if (useOlsen) {
        const x = ritzX[r];
        let xr = 0;
        let xx = 0;
        for (let t = 0; t < N; t++) {
          const inv = 1 / clampedDenominator(th - diagonal[t]);
          xr += x[t] * inv * res[t];
          xx += x[t] * inv * x[t];
        }
        epsilon = xx !== 0 ? xr / xx : 0;
        for (let t = 0; t < N; t++) candidate[t] = (res[t] - epsilon * x[t]) / clampedDenominator(th - diagonal[t]);
      } else {
        for (let t = 0; t < N; t++) candidate[t] = res[t] / clampedDenominator(th - diagonal[t]);
      }
      if (!appendCandidate()) {
        candidate.set(res);
        appendCandidate(); // fallback when the preconditioned vector lies in the span
      }
    }
    // With every residual already small, the next iteration only confirms the energies.
    if (pending === 0 && needsCorrection.length > 0) {
      throw new SolverError('not-converged', 'Davidson found no new direction to add (the subspace stopped growing)', { details: history });
    }
  }
  throw new SolverError('not-converged', `Davidson did not converge in ${options.maxIterations} iterations`, { details: history });
}

function clampedDenominator(d: number): number {
  if (Math.abs(d) < 1e-8) return d < 0 ? -1e-8 : 1e-8;
  return d;
}

const COLLAPSE_CHUNK = 512;

/**
 * In place: the first `keep` vectors of the flat store become Σ_i y[r·m + i]·old_i, r < keep.
 * Works on chunks of COLLAPSE_CHUNK entries so the old values of every vector in a chunk are
 * read before any is overwritten, with one small scratch block instead of a second store.
 */
function collapse(store: Float64Array, N: number, m: number, keep: number, y: Float64Array): void {
  const scratch = new Float64Array(m * COLLAPSE_CHUNK);
  for (let t0 = 0; t0 < N; t0 += COLLAPSE_CHUNK) {
    const len = Math.min(COLLAPSE_CHUNK, N - t0);
    for (let i = 0; i < m; i++) scratch.set(store.subarray(i * N + t0, i * N + t0 + len), i * COLLAPSE_CHUNK);
    for (let r = 0; r < keep; r++) {
      const out = r * N + t0;
      store.fill(0, out, out + len);
      for (let i = 0; i < m; i++) {
        const yi = y[r * m + i];
        if (yi === 0) continue;
        const src = i * COLLAPSE_CHUNK;
        for (let t = 0; t < len; t++) store[out + t] += yi * scratch[src + t];
      }
    }
  }
}
