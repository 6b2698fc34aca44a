/**
 * The data that crosses module boundaries inside the solver. Matrices are dense,
 * row-major Float64Arrays of n·n entries; two-electron integrals over real orbitals
 * are stored once per 8-fold-symmetric class, addressed through `eriIndex` in
 * solver/integrals/eriIndex.ts. Every coordinate is in bohr and every energy in
 * hartree (or in units of t for a Hubbard model).
 */

export type Vec3 = [number, number, number];

export interface Atom {
  /** Element symbol, e.g. "He". */
  symbol: string;
  /** Nuclear charge; a ghost atom keeps its element's Z for the basis but contributes no charge. */
  atomicNumber: number;
  positionBohr: Vec3;
  /** A ghost carries basis functions only: no nucleus, no electrons. */
  ghost: boolean;
}

export interface Molecule {
  atoms: Atom[];
  charge: number;
  multiplicity: number;
}

/** One contracted Cartesian Gaussian shell of angular momentum l. */
export interface Shell {
  l: number;
  centerBohr: Vec3;
  atomIndex: number;
  exponents: Float64Array;
  /** Contraction coefficients multiplying *normalised* primitives (see solver/basis/normalise.ts). */
  coefficients: Float64Array;
  /** Human label, e.g. "2sp" or "3d". */
  label: string;
}

export interface BasisSet {
  name: string;
  shells: Shell[];
  /** Index of each shell's first function in the function list. */
  shellOffsets: Int32Array;
  nFunctions: number;
  /** One label per function, e.g. "O1 2px". */
  functionLabels: string[];
  functionAtom: Int32Array;
}

/**
 * A Hamiltonian over an orthonormal set of spatial orbitals: the input of the CI engine.
 * E = coreEnergy + Σ h_pq γ_pq + ½ Σ (pq|rs) Γ_pqrs.
 */
export interface OrbitalHamiltonian {
  nOrbitals: number;
  /** Nuclear repulsion plus the energy of any frozen core. */
  coreEnergy: number;
  /** One-electron integrals h_pq, row-major n·n. */
  h: Float64Array;
  /** (pq|rs) in chemists' notation, 8-fold packed (eriIndex). */
  eri: Float64Array;
  /** Optional irreducible-representation index of each orbital (abelian group: product is XOR). */
  orbitalIrreps?: Int32Array;
}

export type ProgressEvent =
  | { phase: 'integrals'; done: number; total: number }
  | { phase: 'scf'; iteration: number; energyHartree: number; error: number }
  | { phase: 'transform' }
  | { phase: 'ci-setup'; determinants: number }
  | { phase: 'davidson'; iteration: number; energies: number[]; residualNorms: number[] }
  | { phase: 'properties' };

export type ProgressSink = (event: ProgressEvent) => void;
