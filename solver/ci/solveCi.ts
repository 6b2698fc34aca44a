/**
 * Lowest CI roots of a Hamiltonian in a determinant space.
 *
 * Method: 'dense' diagonalises the full matrix from denseHamiltonian (ml-matrix, symmetric);
 * 'davidson' runs the matrix-free Davidson solver (davidson.ts) on the sigma build;
 * 'auto' (default) picks dense up to denseLimit (400) determinants.
 *
 * targetMultiplicity: roots of that spin only, judged by |⟨S²⟩ − S(S+1)| ≤ 1e-6 with
 * S = (multiplicity − 1)/2. Dense: eigenvectors are scanned upwards until `roots` of them
 * qualify. Davidson: it solves for more and more roots (adding the shortfall plus two each
 * round) until `roots` of them qualify or the space is exhausted. Accidentally degenerate
 * states of different spin can mix and then fail the test. The multiplicity must be
 * reachable: multiplicity − 1 ≥ |nα − nβ|.
 *
 * With nα = nβ and a space symmetric under α ↔ β, Davidson works in transpose-parity
 * sectors (transposeSymmetry.ts) when a targetMultiplicity or a spinParity is given: only
 * the sector of parity (−1)^S is searched, and its sigma build costs about half of the
 * plain one. spinParity alone (no target multiplicity) restricts the dense solve to that
 * sector too, so both methods count the same states.
 *
 * Energies are totals (coreEnergy included). Each vector is normalised with its largest
 * |c| made positive. referenceWeight is c0² of the aufbau determinant (0 if not in the space).
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { badInput, SolverError } from '../errors';
import type { OrbitalHamiltonian } from '../types';
import { davidson, DavidsonCorrection, DavidsonIteration, PSpace } from './davidson';
import { DENSE_LIMIT_DETERMINANTS, defaultMaxSubspace } from './davidsonSettings';
import { denseHamiltonian } from './denseHamiltonian';
import { spinSquared } from './densities';
import { checkBudget, estimateCiSpace } from './estimate';
import { hamiltonianDiagonal, sigma } from './sigma';
import { buildCiSpace, CiSpace, determinantIndex, determinantPatterns, determinantStrings } from './space';
import { slaterCondonElement } from './slaterCondon';
import type { CiSpaceSpec } from './spaceSpec';
import { parityOfMultiplicity, projectOntoParity, sectorDimension, TransposeParity, transposePermutation } from './transposeSymmetry';

export interface SolveCiOptions {
  method?: 'auto' | 'dense' | 'davidson';
  roots?: number;
  targetMultiplicity?: number;
  denseLimit?: number;
  maxIterations?: number;
  residualTolerance?: number;
  energyTolerance?: number;
  maxSubspace?: number;
  /**
   * Use the Ms = 0 transpose symmetry when the space has it and the spin parity of the
   * wanted states is known, from targetMultiplicity or spinParity (default true): Davidson
   * then runs in that parity sector only.
   */
  transposeSymmetry?: boolean;
  /**
   * Without targetMultiplicity: look for roots among the states of this transpose parity
   * only, +1 for S = 0, 2, … and −1 for S = 1, 3, … (nα = nβ; ignored when the space has no
   * transpose symmetry). Dense and Davidson then both count only states of that parity.
   */
  spinParity?: TransposeParity;
  /** Davidson correction formula, default 'olsen' (see davidson.ts). */
  correction?: DavidsonCorrection;
  /**
   * Davidson preconditioner: 'p-space' (default) is exact on the P_SPACE_SIZE lowest-diagonal
   * determinants (with their spin-flip partners) and diagonal elsewhere; 'diagonal' is the
   * diagonal alone.
   */
  preconditioner?: 'p-space' | 'diagonal';
  budgetBytes?: number;
  onProgress?: (event: { phase: 'davidson'; iteration: number; energies: number[]; residualNorms: number[] }) => void;
  shouldCancel?: () => boolean;
}

export interface CiSolution {
  determinantCount: number;
  energies: number[];
  vectors: Float64Array[];
  s2: number[];
  iterations: DavidsonIteration[];
  method: 'dense' | 'davidson';
  referenceWeight: number[];
  space: CiSpace;
}

const SPIN_TOLERANCE = 1e-6;

/**
 * Determinants of the Davidson P space (and of the start-vector diagonalisation). Measured on
 * the 10-site Hubbard ring and 10-orbital molecule-like full CI (tests/bench/ci-bench.ts).
 */
const P_SPACE_SIZE = 240;

/** Normalise and make the largest-magnitude coefficient positive. */
export function normaliseWithSignRule(v: Float64Array): Float64Array {
  let norm = 0;
  let largest = 0;
  for (let i = 0; i < v.length; i++) {
    norm += v[i] * v[i];
    if (Math.abs(v[i]) > Math.abs(v[largest])) largest = i;
  }
  const scale = (v[largest] < 0 ? -1 : 1) / Math.sqrt(norm);
  const out = new Float64Array(v.length);
  for (let i = 0; i < v.length; i++) out[i] = v[i] * scale;
  return out;
}

/**
 * Start vectors: unit vectors on the lowest diagonal elements. With nα = nβ a determinant
 * and its spin-flipped partner of equal diagonal enter as the pair (|D⟩ ± |D̄⟩)/√2, which
 * separates singlet-like and triplet-like combinations from the start.
 */
function initialGuesses(space: CiSpace, diagonal: Float64Array, count: number, project?: (v: Float64Array) => void): Float64Array[] {
  const N = diagonal.length;
  const order = Array.from({ length: N }, (_, i) => i).sort((a, b) => diagonal[a] - diagonal[b] || a - b);
  const used = new Uint8Array(N);
  const guesses: Float64Array[] = [];
  const spinFlipPossible = space.nAlpha === space.nBeta;
  for (const i of order) {
    if (guesses.length >= count) break;
    if (used[i]) continue;
    used[i] = 1;
    let partner = -1;
    if (spinFlipPossible) {
      const { alphaString, betaString } = determinantStrings(space, i);
      const a = space.beta.lookup.get(space.alpha.patterns[alphaString]);
      const b = space.alpha.lookup.get(space.beta.patterns[betaString]);
      if (a !== undefined && b !== undefined && alphaString !== b) {
        const j = determinantIndex(space, b, a);
        if (j >= 0 && !used[j] && Math.abs(diagonal[j] - diagonal[i]) < 1e-10) partner = j;
      }
    }
    const keep = (v: Float64Array): void => {
      if (project) {
        project(v);
        if (!v.some((x) => x !== 0)) return; // no component in the searched sector
      }
      guesses.push(v);
    };
    if (partner < 0) {
      const v = new Float64Array(N);
      v[i] = 1;
      keep(v);
    } else {
      used[partner] = 1;
      for (const sign of [1, -1]) {
        const v = new Float64Array(N);
        v[i] = Math.SQRT1_2;
        v[partner] = sign * Math.SQRT1_2;
        keep(v);
      }
    }
  }
  return guesses;
}

/**
 * Start vectors from a small full diagonalisation: H in the space of the lowest-diagonal
 * determinants (with their spin-flipped partners, so spin stays pure) is solved densely and
 * its lowest eigenvectors seed Davidson. Unit vectors on the lowest diagonals alone can miss
 * a root whose spatial or spin symmetry none of them carries — the sigma build conserves
 * symmetry, so such a root would never appear. Common practice (no source) for Davidson guesses.
 */
function subspaceGuesses(
  ham: OrbitalHamiltonian,
  space: CiSpace,
  diagonal: Float64Array,
  count: number,
  project?: (v: Float64Array) => void,
  pSpaceSize = P_SPACE_SIZE,
): { guesses: Float64Array[]; pSpace?: PSpace } {
  const N = diagonal.length;
  const size = Math.min(N, Math.max(Math.min(Math.max(64, 8 * count), 240), pSpaceSize));
  if (size <= count) return { guesses: initialGuesses(space, diagonal, count, project) };
  const order = Array.from({ length: N }, (_, i) => i).sort((a, b) => diagonal[a] - diagonal[b] || a - b);
  const chosen: number[] = [];
  const inSet = new Set<number>();
  const take = (i: number) => {
    if (!inSet.has(i)) {
      inSet.add(i);
      chosen.push(i);
    }
  };
  for (const i of order) {
    if (chosen.length >= size) break;
    take(i);
    if (space.nAlpha === space.nBeta) {
      const { alphaString, betaString } = determinantStrings(space, i);
      const a = space.beta.lookup.get(space.alpha.patterns[alphaString]);
      const b = space.alpha.lookup.get(space.beta.patterns[betaString]);
      if (a !== undefined && b !== undefined) {
        const j = determinantIndex(space, b, a);
        if (j >= 0) take(j);
      }
    }
  }
  const m = chosen.length;
  const patterns = chosen.map((i) => determinantPatterns(space, i));
  const rows: number[][] = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  for (let r = 0; r < m; r++) {
    for (let c = 0; c <= r; c++) {
      const value = r === c ? diagonal[chosen[r]] : slaterCondonElement(ham, patterns[r], patterns[c]).value;
      rows[r][c] = value;
      rows[c][r] = value;
    }
  }
  const eig = new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const V = eig.eigenvectorMatrix;
  const byEnergy = values.map((_, k) => k).sort((a, b) => values[a] - values[b]);
  const guesses: Float64Array[] = [];
  for (const k of byEnergy) {
    if (guesses.length >= count) break;
    const v = new Float64Array(N);
    for (let r = 0; r < m; r++) v[chosen[r]] = V.get(r, k);
    if (project) {
      project(v);
      if (!v.some((x) => Math.abs(x) > 1e-12)) continue;
    }
    guesses.push(v);
  }
  const pSpace: PSpace = { indices: Int32Array.from(chosen), values: Float64Array.from(values), vectors: new Float64Array(m * m) };
  for (let a = 0; a < m; a++) for (let k = 0; k < m; k++) pSpace.vectors[a * m + k] = V.get(a, k);
  return { guesses: guesses.length > 0 ? guesses : initialGuesses(space, diagonal, count, project), pSpace };
}

function denseSolve(ham: OrbitalHamiltonian, space: CiSpace, sector?: { perm: Int32Array; parity: TransposeParity }): { energies: number[]; vectors: Float64Array[] } {
  const N = space.determinantCount;
  const H = denseHamiltonian(ham, space);
  if (sector) return denseSectorSolve(H, N, sector.perm, sector.parity);
  const rows = Array.from({ length: N }, (_, i) => Array.from(H.subarray(i * N, (i + 1) * N)));
  const eig = new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const order = values.map((_, i) => i).sort((a, b) => values[a] - values[b]);
  const V = eig.eigenvectorMatrix;
  return {
    energies: order.map((i) => values[i]),
    vectors: order.map((col) => Float64Array.from({ length: N }, (_, r) => V.get(r, col))),
  };
}

/**
 * Dense eigenpairs inside one transpose-parity sector: H in the basis of the sector's
 * symmetric combinations (|D⟩ + parity·|D̄⟩)/√2 and, for parity +1, the self-transposed
 * determinants; the eigenvectors are expanded back over the determinants. Exactly degenerate
 * states of the two parities can then not mix.
 */
function denseSectorSolve(H: Float64Array, N: number, perm: Int32Array, parity: TransposeParity): { energies: number[]; vectors: Float64Array[] } {
  const first: number[] = [];
  const second: number[] = [];
  for (let i = 0; i < N; i++) {
    const j = perm[i];
    if (j < i) continue;
    if (j === i) {
      if (parity > 0) {
        first.push(i);
        second.push(-1);
      }
      continue;
    }
    first.push(i);
    second.push(j);
  }
  const d = first.length;
  const weight = (k: number): number => (second[k] < 0 ? 1 : Math.SQRT1_2);
  const rows: number[][] = Array.from({ length: d }, () => new Array<number>(d).fill(0));
  for (let a = 0; a < d; a++) {
    for (let b = 0; b <= a; b++) {
      const xa = first[a];
      const ya = second[a];
      const xb = first[b];
      const yb = second[b];
      let value = H[xa * N + xb];
      if (yb >= 0) value += parity * H[xa * N + yb];
      if (ya >= 0) value += parity * H[ya * N + xb];
      if (ya >= 0 && yb >= 0) value += H[ya * N + yb];
      value *= weight(a) * weight(b);
      rows[a][b] = value;
      rows[b][a] = value;
    }
  }
  if (d === 0) return { energies: [], vectors: [] };
  const eig = new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const order = values.map((_, i) => i).sort((a, b) => values[a] - values[b]);
  const V = eig.eigenvectorMatrix;
  return {
    energies: order.map((i) => values[i]),
    vectors: order.map((col) => {
      const v = new Float64Array(N);
      for (let a = 0; a < d; a++) {
        const x = V.get(a, col) * weight(a);
        v[first[a]] = x;
        if (second[a] >= 0) v[second[a]] = parity * x;
      }
      return v;
    }),
  };
}

export function solveCi(ham: OrbitalHamiltonian, spec: CiSpaceSpec, options: SolveCiOptions = {}): CiSolution {
  if (spec.nOrbitals !== ham.nOrbitals) throw badInput(`the CI space has ${spec.nOrbitals} orbitals but the Hamiltonian ${ham.nOrbitals}`);
  const roots = options.roots ?? 1;
  if (!Number.isInteger(roots) || roots < 1) throw badInput(`roots must be a positive integer, got ${roots}`, 'roots');
  const target = options.targetMultiplicity;
  let targetS2: number | null = null;
  if (target !== undefined) {
    const twoS = target - 1;
    if (!Number.isInteger(target) || twoS < Math.abs(spec.nAlpha - spec.nBeta) || (twoS - Math.abs(spec.nAlpha - spec.nBeta)) % 2 !== 0) {
      throw badInput(`multiplicity ${target} cannot occur with ${spec.nAlpha} alpha and ${spec.nBeta} beta electrons`, 'targetMultiplicity');
    }
    targetS2 = (twoS / 2) * (twoS / 2 + 1);
  }
  checkBudget(estimateCiSpace(spec, { orbitalIrreps: ham.orbitalIrreps, roots }), options.budgetBytes);
  const space = buildCiSpace(spec, ham.orbitalIrreps);
  const N = space.determinantCount;
  if (N === 0) throw badInput('the CI space is empty (no determinant satisfies the restrictions)');
  if (roots > N) throw badInput(`asked for ${roots} roots but the space has only ${N} determinants`, 'roots');
  const denseLimit = options.denseLimit ?? DENSE_LIMIT_DETERMINANTS;
  const method = options.method === 'dense' || (options.method !== 'davidson' && N <= denseLimit) ? 'dense' : 'davidson';
  const isTarget = (s2: number): boolean => targetS2 === null || Math.abs(s2 - targetS2) <= SPIN_TOLERANCE;

  let energies: number[] = [];
  let vectors: Float64Array[] = [];
  let s2: number[] = [];
  const iterations: DavidsonIteration[] = [];

  if (method === 'dense') {
    if (options.shouldCancel?.()) throw new SolverError('cancelled', 'the CI calculation was cancelled');
    const perm = target === undefined && options.spinParity !== undefined && options.transposeSymmetry !== false ? transposePermutation(space) : null;
    const all = denseSolve(ham, space, perm ? { perm, parity: options.spinParity! } : undefined);
    if (all.energies.length < roots) throw badInput(`asked for ${roots} roots but the spin-parity sector has only ${all.energies.length} states`, 'roots');
    for (let i = 0; i < all.energies.length && energies.length < roots; i++) {
      const v = normaliseWithSignRule(all.vectors[i]);
      const spin = spinSquared(space, v);
      if (!isTarget(spin)) continue;
      energies.push(all.energies[i]);
      vectors.push(v);
      s2.push(spin);
    }
  } else {
    const diagonal = hamiltonianDiagonal(ham, space);
    const perm = options.transposeSymmetry === false ? null : transposePermutation(space);
    // With the transpose symmetry: search the wanted spin parity's sector only. Without a
    // known parity both sectors would be needed, which measured no cheaper than the
    // whole-space search (the triplet sector converges more slowly).
    const knownParity = target !== undefined ? parityOfMultiplicity(target) : options.spinParity;
    const sectors: (TransposeParity | undefined)[] = [perm ? knownParity : undefined];
    const usePSpace = (options.preconditioner ?? 'p-space') === 'p-space';
    const found: { energy: number; vector: Float64Array; s2: number }[] = [];
    for (const parity of sectors) {
      const dimension = perm && parity !== undefined ? sectorDimension(perm, parity) : N;
      const project = perm && parity !== undefined ? (v: Float64Array) => projectOntoParity(perm, v, parity) : undefined;
      // Two Ritz pairs beyond the roots asked for: converging only the requested number can
      // stop on a higher eigenvalue while a lower root of another character has not yet
      // entered the subspace (common practice, no source).
      const buffer = roots > 1 ? 2 : 0;
      let tracked = Math.min(dimension, roots + buffer);
      if (tracked === 0) continue;
      let previousVectors: Float64Array[] = [];
      let sectorFound: typeof found = [];
      for (;;) {
        const start = subspaceGuesses(ham, space, diagonal, tracked + 2, project, usePSpace ? P_SPACE_SIZE : 0);
        const guesses = [...previousVectors, ...start.guesses];
        const result = davidson((x, out) => sigma(ham, space, x, out, { transposeParity: parity }), diagonal, guesses, {
          roots: tracked,
          maxIterations: options.maxIterations ?? 200,
          residualTolerance: options.residualTolerance ?? 1e-7,
          energyTolerance: options.energyTolerance ?? 1e-12,
          maxSubspace: Math.min(dimension, options.maxSubspace ?? defaultMaxSubspace(tracked)),
          correction: options.correction,
          pSpace: usePSpace ? start.pSpace : undefined,
          project,
          dimension,
          shouldCancel: options.shouldCancel,
          onIteration: (record) => {
            const entry = { iteration: iterations.length + 1, energies: record.energies, residualNorms: record.residualNorms };
            iterations.push(entry);
            options.onProgress?.({ phase: 'davidson', ...entry });
          },
        });
        sectorFound = [];
        for (let r = 0; r < result.energies.length && sectorFound.length < roots; r++) {
          const v = normaliseWithSignRule(result.vectors[r]);
          const spin = spinSquared(space, v);
          if (!isTarget(spin)) continue;
          sectorFound.push({ energy: result.energies[r], vector: v, s2: spin });
        }
        if (sectorFound.length >= roots || tracked >= dimension) break;
        previousVectors = result.vectors;
        tracked = Math.min(dimension, tracked + (roots - sectorFound.length) + 2);
      }
      found.push(...sectorFound);
    }
    found.sort((a, b) => a.energy - b.energy);
    const chosen = found.slice(0, roots);
    energies = chosen.map((f) => f.energy);
    vectors = chosen.map((f) => f.vector);
    s2 = chosen.map((f) => f.s2);
  }
  if (energies.length < roots) {
    throw new SolverError('not-converged', `found only ${energies.length} of ${roots} roots with multiplicity ${target} in this space`, {
      details: iterations,
    });
  }
  const referenceWeight = vectors.map((v) => (space.referenceIndex >= 0 ? v[space.referenceIndex] ** 2 : 0));
  return { determinantCount: N, energies, vectors, s2, iterations, method, referenceWeight, space };
}
