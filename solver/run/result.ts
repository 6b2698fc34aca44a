/**
 * The result document, `"format": "ketbook-result/1"`. All energies are total energies in
 * `energyUnit` (hartree for molecules and integral files, t for Hubbard models).
 * Conventions that fix every number's sign and order are in DEVELOPERS.md ("Conventions").
 */
export interface DeterminantEntry {
  /** α occupation bit string over the active orbitals, active orbital 0 first. */
  alpha: string;
  beta: string;
  coefficient: number;
  weight: number;
  excitationLevel: number;
}

export interface RootResult {
  energy: number;
  correlationEnergy: number;
  /** Excitation energy from root 0 (0 for root 0). */
  excitationEnergy: number;
  s2: number;
  /** Multiplicity implied by ⟨S²⟩ (2S+1 with S(S+1) = ⟨S²⟩), rounded. */
  multiplicity: number;
  irrep: string | null;
  referenceWeight: number;
  leadingDeterminants: DeterminantEntry[];
  /** Natural-orbital occupations of the active orbitals, descending. */
  naturalOccupations: number[];
}

export interface ScfSummary {
  reference: 'RHF' | 'UHF' | 'ROHF' | 'none';
  converged: boolean;
  energy: number;
  iterations: { iteration: number; energy: number; deltaEnergy: number; commutatorNorm: number }[];
  orbitalEnergies: { alpha: number[]; beta: number[] };
  occupations: { alpha: number[]; beta: number[] };
  orbitalIrreps: string[] | null;
  s2: number;
  mullikenCharges: number[] | null;
  dipole: { vectorAu: number[]; magnitudeDebye: number } | null;
  stability: { rhfToRhf?: number; rhfToUhf?: number; uhfToUhf?: number; stable: boolean } | null;
}

export interface RunResult {
  format: 'ketbook-result/1';
  energyUnit: 'hartree' | 't';
  energies: {
    nuclearRepulsion: number;
    coreEnergy: number;
    reference: number;
    roots: number[];
    correlation: number[];
    plusQ: number | null;
  };
  s2: number[];
  determinantCount: number;
  system: {
    type: 'molecule' | 'hubbard' | 'integrals';
    electrons: number;
    orbitals: number;
    pointGroup: string | null;
    basisFunctions: string[] | null;
    /** Coordinates as the solver used them (bohr, in the symmetry frame). */
    atomsBohr: [string, number, number, number][] | null;
  };
  scf: ScfSummary | null;
  ci: {
    space: string;
    maxExcitation: number | null;
    coreOrbitals: number[];
    activeOrbitals: number[];
    outsideOrbitals: number[];
    nAlpha: number;
    nBeta: number;
    twoMs: number;
    method: 'dense' | 'davidson';
    iterations: { iteration: number; energies: number[]; residualNorms: number[] }[];
    roots: RootResult[];
    densities?: { oneParticle: number[]; twoParticle: number[] };
    vectors?: number[][];
  } | null;
  orbitals?: { coefficients: number[]; nBasis: number };
  warnings: string[];
  provenance: {
    solverVersion: string;
    runFileHash: string;
    startedAt: string;
    timingsMs: Record<string, number>;
  };
}

export interface RunEstimate {
  determinants: number;
  bytes: number;
  budgetBytes: number;
  withinBudget: boolean;
  orbitals: number;
  activeOrbitals: number;
  message: string;
}
