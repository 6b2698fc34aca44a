import { SolverError } from '../errors';
import { pairIndex } from '../integrals/eriIndex';
import { transformEri } from '../transform/transformEri';
import { symmetricEigen } from './denseAlgebra';
import { coulombExchange } from './coulombExchange';
import { multiply, transpose } from './denseAlgebra';
import { densityFromOrbitals, rotateOrbitalPair } from './orbitals';
import { rotateOccupiedVirtual } from './orbitalRotation';
import { runScf } from './runScf';
import type { ScfOptions, ScfProblem, ScfResult } from './scfTypes';

/** An orbital-Hessian eigenvalue below this (hartree) counts as an instability (common practice, no source). */
export const INSTABILITY_THRESHOLD = -1e-6;

export type InstabilityKind = 'rhf-to-rhf' | 'rhf-to-uhf' | 'uhf-to-uhf' | 'rohf-to-rohf';

export interface StabilityInstability {
  kind: InstabilityKind;
  lowestEigenvalue: number;
  /**
   * Unit eigenvector of the lowest Hessian eigenvalue, amplitudes indexed i·nVirtual + (a − nOcc);
   * for 'uhf-to-uhf' the α amplitudes come first, then the β ones; for 'rohf-to-rohf' the
   * entries follow the rotation pairs of rohfRotationPairs (doubly occupied→singly occupied,
   * doubly occupied→virtual, singly occupied→virtual).
   */
  direction: Float64Array;
}

export interface StabilityResult {
  rhfToRhf?: { lowestEigenvalue: number };
  rhfToUhf?: { lowestEigenvalue: number };
  uhfToUhf?: { lowestEigenvalue: number };
  rohfToRohf?: { lowestEigenvalue: number };
  /** Whether the solution was analysed (every reference is; kept for callers that check). */
  analysed: boolean;
  stable: boolean;
  instability?: StabilityInstability;
}

/** Full (pq|rs) lookup over all MOs of a pair of coefficient sets. */
function moTensor(problem: ScfProblem, left: Float64Array, right: Float64Array): (p: number, q: number, r: number, s: number) => number {
  const n = problem.nBasis;
  const pairs = (n * (n + 1)) / 2;
  const t = transformEri(problem.eri, n, left, n, right, n);
  return (p, q, r, s) => t[pairIndex(p, q) * pairs + pairIndex(r, s)];
}

function lowest(matrix: Float64Array, dim: number): { value: number; vector: Float64Array } {
  const { values, vectors } = symmetricEigen(matrix, dim);
  const vector = new Float64Array(dim);
  for (let i = 0; i < dim; i++) vector[i] = vectors[i * dim];
  return { value: values[0], vector };
}

/**
 * Real RHF singlet and triplet Hessians A+B over occupied→virtual rotations
 * (Seeger & Pople, J. Chem. Phys. 66, 3045 (1977); Čížek & Paldus, J. Chem. Phys. 47, 3976 (1967)):
 *   singlet (RHF→RHF): δ_ij δ_ab (ε_a − ε_i) + 4(ia|jb) − (ib|ja) − (ij|ab)
 *   triplet (RHF→UHF): δ_ij δ_ab (ε_a − ε_i)           − (ib|ja) − (ij|ab)
 */
function rhfHessians(problem: ScfProblem, result: ScfResult) {
  const n = problem.nBasis;
  const nOcc = problem.nAlpha;
  const nVir = n - nOcc;
  const dim = nOcc * nVir;
  const g = moTensor(problem, result.coefficients.alpha, result.coefficients.alpha);
  const eps = result.orbitalEnergies.alpha;
  const singlet = new Float64Array(dim * dim);
  const triplet = new Float64Array(dim * dim);
  for (let i = 0; i < nOcc; i++) {
    for (let a = nOcc; a < n; a++) {
      const ia = i * nVir + (a - nOcc);
      for (let j = 0; j < nOcc; j++) {
        for (let b = nOcc; b < n; b++) {
          const jb = j * nVir + (b - nOcc);
          const diagonal = i === j && a === b ? eps[a] - eps[i] : 0;
          const exchangeLike = g(i, b, j, a) + g(i, j, a, b);
          singlet[ia * dim + jb] = diagonal + 4 * g(i, a, j, b) - exchangeLike;
          triplet[ia * dim + jb] = diagonal - exchangeLike;
        }
      }
    }
  }
  return { singlet, triplet, dim };
}

/**
 * Real UHF Hessian A+B over α and β occupied→virtual rotations (Seeger & Pople 1977):
 *   (A+B)_{iaσ,jbτ} = δ_στ δ_ij δ_ab (ε_a − ε_i) + 2(ia|jb) − δ_στ [(ib|ja) + (ij|ab)],
 * with i, a of spin σ and j, b of spin τ.
 */
function uhfHessian(problem: ScfProblem, result: ScfResult) {
  const n = problem.nBasis;
  const spins = [
    { c: result.coefficients.alpha, eps: result.orbitalEnergies.alpha, nOcc: problem.nAlpha },
    { c: result.coefficients.beta, eps: result.orbitalEnergies.beta, nOcc: problem.nBeta },
  ];
  const offsets = [0, spins[0].nOcc * (n - spins[0].nOcc)];
  const dim = offsets[1] + spins[1].nOcc * (n - spins[1].nOcc);
  const tensors = [
    [moTensor(problem, spins[0].c, spins[0].c), moTensor(problem, spins[0].c, spins[1].c)],
    [null, moTensor(problem, spins[1].c, spins[1].c)],
  ];
  const hessian = new Float64Array(dim * dim);
  for (let s = 0; s < 2; s++) {
    for (let t = s; t < 2; t++) {
      const g = tensors[s][t]!;
      const A = spins[s];
      const B = spins[t];
      const nVirA = n - A.nOcc;
      const nVirB = n - B.nOcc;
      for (let i = 0; i < A.nOcc; i++) {
        for (let a = A.nOcc; a < n; a++) {
          const row = offsets[s] + i * nVirA + (a - A.nOcc);
          for (let j = 0; j < B.nOcc; j++) {
            for (let b = B.nOcc; b < n; b++) {
              const col = offsets[t] + j * nVirB + (b - B.nOcc);
              let v = 2 * g(i, a, j, b);
              if (s === t) {
                v -= g(i, b, j, a) + g(i, j, a, b);
                if (i === j && a === b) v += A.eps[a] - A.eps[i];
              }
              hessian[row * dim + col] = v;
              hessian[col * dim + row] = v;
            }
          }
        }
      }
    }
  }
  return { hessian, dim, alphaLength: offsets[1] };
}

/** The (occupied-like i, virtual-like a) MO pairs of the ROHF rotations: d→s, d→v, s→v. */
export function rohfRotationPairs(n: number, nAlpha: number, nBeta: number): [number, number][] {
  const pairs: [number, number][] = [];
  for (let i = 0; i < nBeta; i++) for (let a = nBeta; a < n; a++) pairs.push([i, a]);
  for (let i = nBeta; i < nAlpha; i++) for (let a = nAlpha; a < n; a++) pairs.push([i, a]);
  return pairs;
}

/** Rotation angle of the finite differences, radians (central differences: error ∝ step²). */
const ROHF_HESSIAN_STEP = 1e-4;

/**
 * ROHF energy gradient over the rotations `pairs` of the orbitals C (columns = MOs, the
 * first nBeta doubly occupied, then nAlpha − nBeta singly occupied α):
 *   ∂E/∂θ_ia = 2 Σ_σ (Cᵀ F^σ C)_ai (n^σ_i − n^σ_a)
 * for the rotation i' = cos θ i + sin θ a, a' = −sin θ i + cos θ a (rotateOrbitalPair), with
 * F^σ the UHF-form Fock matrices of the ROHF densities — the first derivative of the
 * one-determinant energy (common practice, no source).
 */
function rohfGradient(problem: ScfProblem, c: Float64Array, pairs: [number, number][]): Float64Array {
  const n = problem.nBasis;
  const occAlpha = new Float64Array(n);
  const occBeta = new Float64Array(n);
  for (let i = 0; i < problem.nAlpha; i++) occAlpha[i] = 1;
  for (let i = 0; i < problem.nBeta; i++) occBeta[i] = 1;
  const dAlpha = densityFromOrbitals(c, occAlpha, n);
  const dBeta = densityFromOrbitals(c, occBeta, n);
  const { coulomb, exchange } = coulombExchange(problem.eri, n, [dAlpha, dBeta]);
  const fAlpha = new Float64Array(n * n);
  const fBeta = new Float64Array(n * n);
  for (let k = 0; k < n * n; k++) {
    const j = problem.coreHamiltonian[k] + coulomb[0][k] + coulomb[1][k];
    fAlpha[k] = j - exchange[0][k];
    fBeta[k] = j - exchange[1][k];
  }
  const ct = transpose(c, n);
  const moAlpha = multiply(ct, multiply(fAlpha, c, n), n);
  const moBeta = multiply(ct, multiply(fBeta, c, n), n);
  return Float64Array.from(pairs, ([i, a]) => 2 * (moAlpha[a * n + i] * (occAlpha[i] - occAlpha[a]) + moBeta[a * n + i] * (occBeta[i] - occBeta[a])));
}

/**
 * ROHF→ROHF stability: the Hessian of the ROHF energy over real rotations of the one set of
 * orbitals (d→s, d→v, s→v), each column by central differences of the analytic gradient
 * along one rotation, then symmetrised. At a stationary point this is the second derivative
 * of the energy (the rotation parametrisation only matters through the gradient, which
 * vanishes there), the criterion of Seeger & Pople, J. Chem. Phys. 66, 3045 (1977), for the
 * restricted open-shell functional. For a closed shell it is 4 × the singlet A+B of
 * rhfHessians (checked in the tests). Reported eigenvalues are divided by 4 so that they are
 * on the scale of the RHF and UHF ones.
 */
function rohfHessian(problem: ScfProblem, result: ScfResult) {
  const n = problem.nBasis;
  const pairs = rohfRotationPairs(n, problem.nAlpha, problem.nBeta);
  const dim = pairs.length;
  const c = result.coefficients.alpha;
  const hessian = new Float64Array(dim * dim);
  const h = ROHF_HESSIAN_STEP;
  pairs.forEach(([i, a], col) => {
    const plus = rohfGradient(problem, rotateOrbitalPair(c, n, i, a, h), pairs);
    const minus = rohfGradient(problem, rotateOrbitalPair(c, n, i, a, -h), pairs);
    for (let row = 0; row < dim; row++) hessian[row * dim + col] = (plus[row] - minus[row]) / (2 * h);
  });
  for (let r = 0; r < dim; r++) {
    for (let q = 0; q < r; q++) {
      const v = 0.125 * (hessian[r * dim + q] + hessian[q * dim + r]);
      hessian[r * dim + q] = v;
      hessian[q * dim + r] = v;
    }
    hessian[r * dim + r] *= 0.25;
  }
  return { hessian, dim };
}

/**
 * Is the SCF solution a minimum with respect to real orbital rotations? RHF is checked
 * against RHF (singlet) and UHF (triplet) rotations, UHF against UHF rotations, ROHF against
 * ROHF rotations (rohfHessian). An RHF→RHF instability is reported ahead of an RHF→UHF one,
 * since it can be removed without leaving the reference. ROHF→UHF is not a stability
 * question: the ROHF orbitals are not a stationary point of the UHF energy (its gradient
 * there is the α–β Fock difference), so UHF lies lower for any open shell whose orbitals can
 * spin-polarise.
 */
export function stabilityAnalysis(problem: ScfProblem, result: ScfResult): StabilityResult {
  if (result.reference === 'ROHF') {
    const { hessian, dim } = rohfHessian(problem, result);
    if (dim === 0) return { analysed: true, stable: true };
    const r = lowest(hessian, dim);
    const out: StabilityResult = { analysed: true, rohfToRohf: { lowestEigenvalue: r.value }, stable: r.value >= INSTABILITY_THRESHOLD };
    if (!out.stable) out.instability = { kind: 'rohf-to-rohf', lowestEigenvalue: r.value, direction: r.vector };
    return out;
  }
  const n = problem.nBasis;
  if (result.reference === 'RHF') {
    const { singlet, triplet, dim } = rhfHessians(problem, result);
    if (dim === 0) return { analysed: true, stable: true };
    const s = lowest(singlet, dim);
    const t = lowest(triplet, dim);
    const out: StabilityResult = {
      analysed: true,
      rhfToRhf: { lowestEigenvalue: s.value },
      rhfToUhf: { lowestEigenvalue: t.value },
      stable: s.value >= INSTABILITY_THRESHOLD && t.value >= INSTABILITY_THRESHOLD,
    };
    if (s.value < INSTABILITY_THRESHOLD) out.instability = { kind: 'rhf-to-rhf', lowestEigenvalue: s.value, direction: s.vector };
    else if (t.value < INSTABILITY_THRESHOLD) out.instability = { kind: 'rhf-to-uhf', lowestEigenvalue: t.value, direction: t.vector };
    return out;
  }
  const { hessian, dim } = uhfHessian(problem, result);
  if (dim === 0 || n === 0) return { analysed: true, stable: true };
  const u = lowest(hessian, dim);
  const out: StabilityResult = { analysed: true, uhfToUhf: { lowestEigenvalue: u.value }, stable: u.value >= INSTABILITY_THRESHOLD };
  if (!out.stable) out.instability = { kind: 'uhf-to-uhf', lowestEigenvalue: u.value, direction: u.vector };
  return out;
}

/** Rotation sizes (radians along the unit eigenvector) tried in turn until the energy drops. */
const FOLLOW_STEPS = [0.5, 1.0, 0.2];
const MAX_FOLLOW_ROUNDS = 5;
/** A followed solution must lower the energy by at least this much (hartree) to count. */
const FOLLOW_MIN_DROP = 1e-9;

function rotatedStart(problem: ScfProblem, result: ScfResult, instability: StabilityInstability, step: number) {
  const n = problem.nBasis;
  const v = instability.direction;
  if (instability.kind === 'rhf-to-rhf') {
    const c = rotateOccupiedVirtual(result.coefficients.alpha, n, problem.nAlpha, v, step);
    return { reference: 'RHF' as const, alpha: c, beta: c };
  }
  if (instability.kind === 'rhf-to-uhf') {
    // A triplet rotation moves α and β oppositely: that is what breaks spin symmetry.
    return {
      reference: 'UHF' as const,
      alpha: rotateOccupiedVirtual(result.coefficients.alpha, n, problem.nAlpha, v, step),
      beta: rotateOccupiedVirtual(result.coefficients.beta, n, problem.nBeta, v, -step),
    };
  }
  if (instability.kind === 'rohf-to-rohf') {
    // one orbital set: every rotation pair turned by step·(its amplitude), in sequence
    let c = result.coefficients.alpha;
    rohfRotationPairs(n, problem.nAlpha, problem.nBeta).forEach(([i, a], k) => {
      if (v[k] !== 0) c = rotateOrbitalPair(c, n, i, a, step * v[k]);
    });
    return { reference: 'ROHF' as const, alpha: c, beta: c };
  }
  const alphaLength = problem.nAlpha * (n - problem.nAlpha);
  return {
    reference: 'UHF' as const,
    alpha: rotateOccupiedVirtual(result.coefficients.alpha, n, problem.nAlpha, v.subarray(0, alphaLength), step),
    beta: rotateOccupiedVirtual(result.coefficients.beta, n, problem.nBeta, v.subarray(alphaLength), step),
  };
}

/**
 * Rotate the orbitals along the lowest unstable Hessian eigenvector and reconverge, until
 * the analysis finds the solution stable (at most 5 rounds). An RHF→UHF instability gives a
 * UHF solution. `options` supplies tolerances and DIIS settings; its reference, guess and
 * symmetry breaking are replaced by the rotated orbitals. If no trial step lowers the
 * energy the current solution is returned as it is.
 */
export function followInstability(problem: ScfProblem, result: ScfResult, options: ScfOptions): ScfResult {
  let current = result;
  for (let round = 0; round < MAX_FOLLOW_ROUNDS; round++) {
    const analysis = stabilityAnalysis(problem, current);
    if (analysis.stable || !analysis.instability) return current;
    let improved: ScfResult | null = null;
    for (const step of FOLLOW_STEPS) {
      const start = rotatedStart(problem, current, analysis.instability, step);
      let candidate: ScfResult;
      try {
        candidate = runScf(problem, {
          ...options,
          reference: start.reference,
          breakSymmetry: false,
          initialOrbitals: { alpha: start.alpha, beta: start.beta },
        });
      } catch (error) {
        // A trial start that does not converge is just a bad step; try the next one.
        if (error instanceof SolverError && error.code === 'not-converged') continue;
        throw error;
      }
      if (candidate.energyHartree < current.energyHartree - FOLLOW_MIN_DROP) {
        improved = candidate;
        break;
      }
    }
    if (!improved) return current;
    current = improved;
  }
  return current;
}
