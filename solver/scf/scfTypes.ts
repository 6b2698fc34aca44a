import type { GuessKind } from './initialGuess';

export type ScfReference = 'RHF' | 'UHF' | 'ROHF';

/** Everything the SCF needs, in the AO basis: n·n row-major matrices and packed ERIs (eriIndex). */
export interface ScfProblem {
  nBasis: number;
  overlap: Float64Array;
  /** T + V_nuc. */
  coreHamiltonian: Float64Array;
  /** Packed 8-fold AO integrals (μν|λσ). */
  eri: Float64Array;
  nuclearRepulsionHartree: number;
  nAlpha: number;
  nBeta: number;
  /**
   * Optional: the atom of each basis function. The Hückel guess then keeps one-centre
   * elements from the core Hamiltonian (see initialGuess.ts); without it every pair gets
   * the two-centre formula.
   */
  functionAtom?: ArrayLike<number>;
}

export interface SpinPair<T> {
  alpha: T;
  beta: T;
}

export interface ScfProgress {
  iteration: number;
  energyHartree: number;
  /** Norm of the orbital-gradient (commutator) error, as in ScfIteration.commutatorNorm. */
  error: number;
}

export interface ScfOptions {
  reference: ScfReference;
  /** Starting orbitals when `initialOrbitals` is absent; default 'huckel'. */
  guess?: GuessKind;
  /** Starting MO coefficients (n×n row-major, columns = MOs), e.g. a neighbouring scan point's. */
  initialOrbitals?: SpinPair<Float64Array>;
  /** UHF only: rotate the α HOMO and LUMO by 45° before the first iteration so spatial symmetry can break. */
  breakSymmetry?: boolean;
  maxIterations?: number;
  /** |ΔE| between iterations, hartree. */
  energyTolerance?: number;
  /** Frobenius norm of Xᵀ(FDS − SDF)X, summed over spins. */
  commutatorTolerance?: number;
  diis?: boolean;
  onProgress?: (ev: ScfProgress) => void;
}

export interface ScfIteration {
  iteration: number;
  energyHartree: number;
  /** Change from the previous iteration (the first iteration reports its change from zero). */
  deltaEnergy: number;
  commutatorNorm: number;
}

export interface ScfResult {
  reference: ScfReference;
  converged: true;
  /** Total energy including nuclear repulsion. */
  energyHartree: number;
  electronicEnergyHartree: number;
  nuclearRepulsionHartree: number;
  iterations: ScfIteration[];
  orbitalEnergies: SpinPair<Float64Array>;
  /** n×n row-major, column j = MO j, MOs in ascending orbital energy; largest-|c| entry of each MO positive. */
  coefficients: SpinPair<Float64Array>;
  occupations: SpinPair<Float64Array>;
  density: SpinPair<Float64Array>;
  /** ⟨S²⟩ of the single determinant. */
  s2: number;
}
