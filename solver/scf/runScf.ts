import { SolverError, badInput } from '../errors';
import { eriLength } from '../integrals/eriIndex';
import { coulombExchange } from './coulombExchange';
import { multiply, transpose, frobeniusNorm, traceProduct } from './denseAlgebra';
import { DiisExtrapolator } from './diis';
import { guessFock } from './initialGuess';
import { levelShiftedFock } from './levelShift';
import { aufbauOccupations, densityFromOrbitals, diagonaliseFock, rotateOrbitalPair } from './orbitals';
import { symmetricOrthogonaliser } from './orthogonaliser';
import { rohfEffectiveFock } from './rohfFock';
import { determinantSpinSquared } from './spinSquared';
import type { ScfIteration, ScfOptions, ScfProblem, ScfResult } from './scfTypes';

/**
 * Stall test window: if the lowest error within this many iterations is not below half the
 * error at the window's start, DIIS (or plain iteration) is stalled or oscillating.
 */
const STALL_ITERATIONS = 12;
const STALL_REDUCTION = 0.5;
/** First level shift used when iterations stall, hartree; doubled on each further stall. */
const INITIAL_LEVEL_SHIFT_HARTREE = 0.5;
/** HOMO–LUMO mixing angle of the symmetry-breaking UHF guess. */
const SYMMETRY_BREAKING_ANGLE = Math.PI / 4;

interface FockState {
  fockAlpha: Float64Array;
  fockBeta: Float64Array;
  electronicEnergyHartree: number;
}

function validate(problem: ScfProblem, options: ScfOptions): void {
  const n = problem.nBasis;
  if (!Number.isInteger(n) || n < 1) throw badInput('the SCF needs at least one basis function');
  if (problem.overlap.length !== n * n || problem.coreHamiltonian.length !== n * n) {
    throw badInput(`overlap and core Hamiltonian must hold ${n}×${n} entries`);
  }
  if (problem.eri.length !== eriLength(n)) throw badInput(`packed ERIs must hold ${eriLength(n)} entries for ${n} functions`);
  const { nAlpha, nBeta } = problem;
  if (!Number.isInteger(nAlpha) || !Number.isInteger(nBeta) || nAlpha < 0 || nBeta < 0) {
    throw badInput('electron counts per spin must be non-negative integers');
  }
  if (nAlpha > n || nBeta > n) throw badInput(`${n} orbitals cannot hold ${nAlpha} α and ${nBeta} β electrons`);
  if (options.reference === 'RHF' && nAlpha !== nBeta) throw badInput('RHF needs a closed shell (as many α as β electrons)', 'reference');
  if (options.reference === 'ROHF' && nAlpha < nBeta) throw badInput('high-spin ROHF needs at least as many α as β electrons', 'reference');
  if (options.initialOrbitals) {
    const { alpha, beta } = options.initialOrbitals;
    if (alpha.length !== n * n || beta.length !== n * n) throw badInput(`initial orbitals must be ${n}×${n} coefficient matrices`);
  }
}

/** Fα = H + J[Dα+Dβ] − K[Dα] (and β alike); RHF uses F = H + 2J[D] − K[D] with D = Dα = Dβ. */
function buildFock(problem: ScfProblem, restrictedClosed: boolean, dAlpha: Float64Array, dBeta: Float64Array): FockState {
  const n = problem.nBasis;
  const h = problem.coreHamiltonian;
  let fockAlpha: Float64Array;
  let fockBeta: Float64Array;
  if (restrictedClosed) {
    const { coulomb, exchange } = coulombExchange(problem.eri, n, [dAlpha]);
    fockAlpha = new Float64Array(n * n);
    for (let i = 0; i < n * n; i++) fockAlpha[i] = h[i] + 2 * coulomb[0][i] - exchange[0][i];
    fockBeta = fockAlpha;
  } else {
    const { coulomb, exchange } = coulombExchange(problem.eri, n, [dAlpha, dBeta]);
    fockAlpha = new Float64Array(n * n);
    fockBeta = new Float64Array(n * n);
    for (let i = 0; i < n * n; i++) {
      const j = h[i] + coulomb[0][i] + coulomb[1][i];
      fockAlpha[i] = j - exchange[0][i];
      fockBeta[i] = j - exchange[1][i];
    }
  }
  // E = ½ Σ [(Dα+Dβ) H + Dα Fα + Dβ Fβ], the UHF energy of Pople & Nesbet (1954); RHF is the case Dα = Dβ.
  const electronicEnergyHartree =
    0.5 * (traceProduct(dAlpha, h) + traceProduct(dBeta, h) + traceProduct(dAlpha, fockAlpha) + traceProduct(dBeta, fockBeta));
  return { fockAlpha, fockBeta, electronicEnergyHartree };
}

/** Xᵀ(F D S − S D F)X: zero exactly when F and D commute, i.e. at an SCF solution. */
function commutatorError(fock: Float64Array, density: Float64Array, overlap: Float64Array, x: Float64Array, n: number): Float64Array {
  const fds = multiply(multiply(fock, density, n), overlap, n);
  const e = new Float64Array(n * n);
  // S D F = (F D S)ᵀ for symmetric F, D, S.
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) e[i * n + j] = fds[i * n + j] - fds[j * n + i];
  return multiply(transpose(x, n), multiply(e, x, n), n);
}

/**
 * Self-consistent field for RHF, UHF (Pople & Nesbet, J. Chem. Phys. 22, 571 (1954)) and
 * high-spin ROHF with a single effective Fock operator (see rohfFock.ts for its blocks and
 * the Guest–Saunders canonicalisation of the orbital energies).
 *
 * Iterations use Pulay DIIS on the Fock matrices with the error Xᵀ(FDS − SDF)X in the
 * Löwdin-orthogonal basis. If the error does not halve within 12 iterations (DIIS stalled or
 * oscillating, or plain iterations oscillating) we restart DIIS and level-shift the virtuals
 * (Saunders & Hillier 1973), doubling the shift at each further stall. Convergence needs
 * both |ΔE| < energyTolerance and the error norm < commutatorTolerance. The reported
 * orbitals are the canonical ones of the converged, unshifted Fock matrix, with MOs in
 * ascending energy and each MO's largest-|c| coefficient positive.
 */
export function runScf(problem: ScfProblem, options: ScfOptions): ScfResult {
  validate(problem, options);
  const reference = options.reference;
  const maxIterations = options.maxIterations ?? 200;
  const energyTolerance = options.energyTolerance ?? 1e-10;
  const commutatorTolerance = options.commutatorTolerance ?? 1e-8;
  const useDiis = options.diis ?? true;
  const { nBasis: n, overlap, nAlpha, nBeta } = problem;
  const restrictedClosed = reference === 'RHF';

  const x = symmetricOrthogonaliser(overlap, n);
  let cAlpha: Float64Array;
  let cBeta: Float64Array;
  if (options.initialOrbitals) {
    cAlpha = Float64Array.from(options.initialOrbitals.alpha);
    cBeta = reference === 'UHF' ? Float64Array.from(options.initialOrbitals.beta) : cAlpha;
  } else {
    cAlpha = diagonaliseFock(guessFock(options.guess ?? 'huckel', problem.coreHamiltonian, overlap, n, problem.functionAtom), x, n).coefficients;
    cBeta = cAlpha;
  }
  if (options.breakSymmetry && reference === 'UHF' && nAlpha >= 1 && nAlpha < n) {
    cAlpha = rotateOrbitalPair(cAlpha, n, nAlpha - 1, nAlpha, SYMMETRY_BREAKING_ANGLE);
  }

  const occAlpha = aufbauOccupations(n, nAlpha);
  const occBeta = restrictedClosed ? occAlpha : aufbauOccupations(n, nBeta);
  let dAlpha = densityFromOrbitals(cAlpha, occAlpha, n);
  let dBeta = restrictedClosed ? dAlpha : densityFromOrbitals(cBeta, occBeta, n);

  const diis = new DiisExtrapolator();
  const iterations: ScfIteration[] = [];
  let previousEnergy = 0;
  let windowStartIteration = 1;
  let windowStartError = Infinity;
  let windowBestError = Infinity;
  let levelShift = 0;
  let converged = false;
  let lastFocks: Float64Array[] = [];

  for (let iteration = 1; iteration <= maxIterations; iteration++) {
    const state = buildFock(problem, restrictedClosed, dAlpha, dBeta);
    const energyHartree = state.electronicEnergyHartree + problem.nuclearRepulsionHartree;

    // The matrices whose eigenvectors give the next orbitals, and their errors.
    let focks: Float64Array[];
    let errors: Float64Array[];
    if (reference === 'ROHF') {
      const effective = rohfEffectiveFock(state.fockAlpha, state.fockBeta, cAlpha, overlap, n, nAlpha, nBeta);
      const dTotal = new Float64Array(n * n);
      for (let i = 0; i < n * n; i++) dTotal[i] = dAlpha[i] + dBeta[i];
      focks = [effective];
      errors = [commutatorError(effective, dTotal, overlap, x, n)];
    } else if (reference === 'RHF') {
      focks = [state.fockAlpha];
      errors = [commutatorError(state.fockAlpha, dAlpha, overlap, x, n)];
    } else {
      focks = [state.fockAlpha, state.fockBeta];
      errors = [commutatorError(state.fockAlpha, dAlpha, overlap, x, n), commutatorError(state.fockBeta, dBeta, overlap, x, n)];
    }
    const errorNorm = Math.sqrt(errors.reduce((sum, e) => sum + frobeniusNorm(e) ** 2, 0));
    const deltaEnergy = energyHartree - previousEnergy;
    previousEnergy = energyHartree;
    iterations.push({ iteration, energyHartree, deltaEnergy, commutatorNorm: errorNorm });
    options.onProgress?.({ iteration, energyHartree, error: errorNorm });
    if (!Number.isFinite(energyHartree) || !Number.isFinite(errorNorm)) break;
    lastFocks = focks;

    if (iteration > 1 && Math.abs(deltaEnergy) < energyTolerance && errorNorm < commutatorTolerance) {
      converged = true;
      break;
    }

    if (iteration === windowStartIteration) windowStartError = errorNorm;
    windowBestError = Math.min(windowBestError, errorNorm);
    if (iteration - windowStartIteration >= STALL_ITERATIONS) {
      if (windowBestError > STALL_REDUCTION * windowStartError) {
        levelShift = levelShift === 0 ? INITIAL_LEVEL_SHIFT_HARTREE : 2 * levelShift;
        diis.reset();
      }
      windowStartIteration = iteration;
      windowStartError = errorNorm;
      windowBestError = errorNorm;
    }

    // Shift first, then extrapolate: the shift leaves the fixed point alone, so DIIS over
    // shifted matrices still converges to the unshifted solution.
    let next = focks;
    if (levelShift > 0) {
      next =
        reference === 'ROHF'
          ? [rohfEffectiveFock(state.fockAlpha, state.fockBeta, cAlpha, overlap, n, nAlpha, nBeta, levelShift)]
          : reference === 'RHF'
            ? [levelShiftedFock(focks[0], cAlpha, overlap, n, nAlpha, levelShift)]
            : [levelShiftedFock(focks[0], cAlpha, overlap, n, nAlpha, levelShift), levelShiftedFock(focks[1], cBeta, overlap, n, nBeta, levelShift)];
    }
    if (useDiis) {
      diis.push(next, errors);
      next = diis.extrapolate() ?? next;
    }
    cAlpha = diagonaliseFock(next[0], x, n).coefficients;
    cBeta = reference === 'UHF' ? diagonaliseFock(next[1], x, n).coefficients : cAlpha;
    dAlpha = densityFromOrbitals(cAlpha, occAlpha, n);
    dBeta = restrictedClosed ? dAlpha : densityFromOrbitals(cBeta, occBeta, n);
  }

  if (!converged) {
    const last = iterations[iterations.length - 1];
    throw new SolverError(
      'not-converged',
      `SCF did not converge in ${iterations.length} iterations (last ΔE ${last ? last.deltaEnergy.toExponential(2) : 'n/a'}, error ${last ? last.commutatorNorm.toExponential(2) : 'n/a'})`,
      { details: { iterations } },
    );
  }

  // Canonical orbitals of the converged, unshifted, unextrapolated Fock matrix.
  const alphaOrbitals = diagonaliseFock(lastFocks[0], x, n);
  const betaOrbitals = reference === 'UHF' ? diagonaliseFock(lastFocks[1], x, n) : alphaOrbitals;
  dAlpha = densityFromOrbitals(alphaOrbitals.coefficients, occAlpha, n);
  dBeta = restrictedClosed ? dAlpha : densityFromOrbitals(betaOrbitals.coefficients, occBeta, n);
  const final = buildFock(problem, restrictedClosed, dAlpha, dBeta);

  return {
    reference,
    converged: true,
    energyHartree: final.electronicEnergyHartree + problem.nuclearRepulsionHartree,
    electronicEnergyHartree: final.electronicEnergyHartree,
    nuclearRepulsionHartree: problem.nuclearRepulsionHartree,
    iterations,
    orbitalEnergies: { alpha: alphaOrbitals.energies, beta: betaOrbitals.energies },
    coefficients: { alpha: alphaOrbitals.coefficients, beta: betaOrbitals.coefficients },
    occupations: { alpha: occAlpha, beta: occBeta },
    density: { alpha: dAlpha, beta: dBeta },
    s2: restrictedClosed ? 0 : determinantSpinSquared(dAlpha, dBeta, overlap, n, nAlpha, nBeta),
  };
}
