/**
 * Block Davidson eigensolver for the lowest roots of a large real symmetric matrix known
 * only through its action (Davidson, J. Comput. Phys. 17, 87 (1975)).
 *
 * Each iteration: Rayleigh–Ritz in the subspace V (G = Vᵀ·A·V), residuals
 * r = A x − θ x for the tracked roots, corrections δ = r / (θ − D) with the diagonal
 * preconditioner D (denominators kept away from zero), two passes of Gram–Schmidt against
 * V, and new vectors appended. When the subspace would exceed maxSubspace it collapses
 * (thick restart) to its lowest max(2·roots, maxSubspace/2) Ritz vectors, whose A-images are
 * formed from the stored ones, no extra matrix products. A root is converged when its residual norm ≤ residualTolerance AND its
 * energy changed by ≤ energyTolerance since the previous iteration.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { SolverError } from '../errors';

export interface DavidsonIteration {
  iteration: number;
  energies: number[];
  residualNorms: number[];
}

export interface DavidsonOptions {
  roots: number;
  maxIterations: number;
  residualTolerance: number;
  energyTolerance: number;
  maxSubspace: number;
  onIteration?: (record: DavidsonIteration) => void;
  shouldCancel?: () => boolean;
}

export interface DavidsonResult {
  energies: number[];
  vectors: Float64Array[];
  history: DavidsonIteration[];
  matrixProducts: number;
}

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

/** Orthogonalise v against basis (two passes) and normalise; returns false when v lies in its span. */
function orthonormaliseAgainst(v: Float64Array, basis: Float64Array[]): boolean {
  let norm = Math.sqrt(dot(v, v));
  if (!(norm > 0)) return false;
  for (let i = 0; i < v.length; i++) v[i] /= norm;
  for (let pass = 0; pass < 2; pass++) {
    for (const b of basis) {
      const overlap = dot(b, v);
      for (let i = 0; i < v.length; i++) v[i] -= overlap * b[i];
    }
  }
  norm = Math.sqrt(dot(v, v));
  if (norm < 1e-8) return false;
  for (let i = 0; i < v.length; i++) v[i] /= norm;
  return true;
}

function symmetricEigen(G: number[][]): { values: number[]; vectors: number[][] } {
  const m = G.length;
  const eig = new EigenvalueDecomposition(new Matrix(G), { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const V = eig.eigenvectorMatrix;
  const order = values.map((_, i) => i).sort((a, b) => values[a] - values[b]);
  return {
    values: order.map((i) => values[i]),
    vectors: order.map((i) => Array.from({ length: m }, (_, r) => V.get(r, i))),
  };
}

export function davidson(
  apply: (x: Float64Array, out: Float64Array) => void,
  diagonal: Float64Array,
  guesses: Float64Array[],
  options: DavidsonOptions,
): DavidsonResult {
  const N = diagonal.length;
  const k = options.roots;
  const maxSubspace = Math.max(options.maxSubspace, 2 * k);
  const V: Float64Array[] = [];
  const S: Float64Array[] = [];
  const G: number[][] = [];
  let products = 0;
  const pending: Float64Array[] = [];
  for (const g of guesses) {
    const v = Float64Array.from(g);
    if (orthonormaliseAgainst(v, [...V, ...pending])) pending.push(v);
  }
  if (pending.length < k) throw new SolverError('internal', `Davidson needs ${k} independent start vectors, got ${pending.length}`);
  const history: DavidsonIteration[] = [];
  let previous: number[] = new Array(k).fill(Number.POSITIVE_INFINITY);
  let ritzX: Float64Array[] = [];
  let ritzAX: Float64Array[] = [];
  let theta: number[] = [];

  for (let iteration = 1; iteration <= options.maxIterations; iteration++) {
    if (options.shouldCancel?.()) throw new SolverError('cancelled', 'the CI calculation was cancelled');
    // extend the subspace with the pending vectors
    for (const v of pending) {
      const av = new Float64Array(N);
      apply(v, av);
      products++;
      V.push(v);
      S.push(av);
      const j = V.length - 1;
      G.push(new Array(j + 1).fill(0));
      for (let i = 0; i <= j; i++) {
        const gij = dot(V[i], av);
        G[j][i] = gij;
        if (i < j) G[i][j] = gij;
      }
    }
    pending.length = 0;
    const m = V.length;
    // symmetrise against round-off before the small eigenproblem
    const Gs = G.map((row, i) => row.map((_, j) => 0.5 * (G[i][j] + G[j][i])));
    const { values, vectors: y } = symmetricEigen(Gs);
    theta = values.slice(0, k);
    ritzX = [];
    ritzAX = [];
    const residualNorms: number[] = [];
    const residuals: Float64Array[] = [];
    for (let r = 0; r < k; r++) {
      const x = new Float64Array(N);
      const ax = new Float64Array(N);
      for (let i = 0; i < m; i++) {
        const yi = y[r][i];
        if (yi === 0) continue;
        const vi = V[i];
        const si = S[i];
        for (let t = 0; t < N; t++) {
          x[t] += yi * vi[t];
          ax[t] += yi * si[t];
        }
      }
      const res = new Float64Array(N);
      for (let t = 0; t < N; t++) res[t] = ax[t] - theta[r] * x[t];
      ritzX.push(x);
      ritzAX.push(ax);
      residuals.push(res);
      residualNorms.push(Math.sqrt(dot(res, res)));
    }
    const record = { iteration, energies: theta.slice(), residualNorms };
    history.push(record);
    options.onIteration?.(record);
    const converged = theta.map(
      (e, r) => residualNorms[r] <= options.residualTolerance && Math.abs(e - previous[r]) <= options.energyTolerance,
    );
    previous = theta.slice();
    if (converged.every(Boolean) || m >= N) {
      return { energies: theta, vectors: ritzX, history, matrixProducts: products };
    }
    // corrections for the roots still moving
    const corrections: Float64Array[] = [];
    for (let r = 0; r < k; r++) {
      if (converged[r]) continue;
      if (residualNorms[r] <= options.residualTolerance) {
        continue; // residual already small: only the energy test is pending, which the next iteration settles
      }
      const delta = new Float64Array(N);
      for (let t = 0; t < N; t++) {
        let denom = theta[r] - diagonal[t];
        if (Math.abs(denom) < 1e-8) denom = denom < 0 ? -1e-8 : 1e-8;
        delta[t] = residuals[r][t] / denom;
      }
      corrections.push(delta);
      corrections.push(residuals[r]); // fallback when the preconditioned vector lies in the span
    }
    if (m + corrections.length / 2 > maxSubspace) {
      // thick restart: keep the lowest `keep` Ritz vectors (orthonormal, images known from
      // the stored products), which retains more than the tracked roots' directions
      const keep = Math.min(m, Math.max(2 * k, Math.floor(maxSubspace / 2)));
      const keptX = ritzX.slice();
      const keptAX = ritzAX.slice();
      for (let r = k; r < keep; r++) {
        const x = new Float64Array(N);
        const ax = new Float64Array(N);
        for (let i = 0; i < m; i++) {
          const yi = y[r][i];
          const vi = V[i];
          const si = S[i];
          for (let t = 0; t < N; t++) {
            x[t] += yi * vi[t];
            ax[t] += yi * si[t];
          }
        }
        keptX.push(x);
        keptAX.push(ax);
      }
      V.length = 0;
      S.length = 0;
      G.length = 0;
      for (let r = 0; r < keep; r++) {
        V.push(keptX[r]);
        S.push(keptAX[r]);
        G.push(Array.from({ length: r + 1 }, (_, i) => (i === r ? values[r] : 0)));
        for (let i = 0; i < r; i++) G[i].push(0);
      }
    }
    for (let c = 0; c < corrections.length; c += 2) {
      const delta = corrections[c];
      if (orthonormaliseAgainst(delta, [...V, ...pending])) pending.push(delta);
      else {
        const res = Float64Array.from(corrections[c + 1]);
        if (orthonormaliseAgainst(res, [...V, ...pending])) pending.push(res);
      }
    }
  }
  throw new SolverError('not-converged', `Davidson did not converge in ${options.maxIterations} iterations`, { details: history });
}
