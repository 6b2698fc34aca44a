import type { CiSettings, RunFile, ScanCoordinate } from '../runFile/schema';

/**
 * The data a scan passes between its steps. Everything here is JSON-safe (plain numbers,
 * strings, arrays), so a browser pool can send plans, point results and assembled scans
 * between workers and the page and save each point as it finishes.
 */

export type ScfReferenceName = 'RHF' | 'UHF' | 'ROHF';

/** One method of the scan, with its defaults resolved. */
export interface ScanMethodPlan {
  index: number;
  /** Ketbook's short name for the method, e.g. "RHF", "CISD+Q", "CAS(2,2)". */
  label: string;
  reference: ScfReferenceName;
  /** The CI settings; null for SCF only. */
  ci: CiSettings | null;
  plusQ: boolean;
  roots: number;
}

export interface FragmentPlan {
  /** Indices of the fragment's atoms in the scanned molecule. */
  atoms: number[];
  charge: number;
  multiplicity: number;
  /** The fragment alone, at its geometry in the scan's first point (no scan, no methods). */
  runFile: RunFile;
}

export interface ScanPlan {
  coordinate: ScanCoordinate;
  units: 'bohr' | 'angstrom' | 'degree';
  /** Coordinate values in the scan's units, in the order given. */
  points: number[];
  /** One plain run file per point (the molecule moved; no scan, methods or ci). */
  pointRunFiles: RunFile[];
  methods: ScanMethodPlan[];
  /** Index of the method errors are measured against, or null. */
  referenceMethod: number | null;
  dissociation: 'fragments' | 'far-end' | 'none';
  fragments: FragmentPlan[] | null;
  /** Reduced mass of the two fragments of a distance scan, electron masses; null otherwise. */
  reducedMassElectron: number | null;
  fit: 'spline' | 'polynomial';
  refine: boolean;
  warnings: string[];
}

export interface DeterminantWeight {
  alpha: string;
  beta: string;
  coefficient: number;
}

export interface ScfCandidate {
  /** Where the SCF started: the neighbouring point's orbitals, the Hückel-like or core guess, or a spin-symmetry-broken guess. */
  source: 'neighbour' | 'huckel' | 'core' | 'broken-symmetry';
  converged: boolean;
  energy: number | null;
  s2: number | null;
  /** Stable against rotations of its own kind (RHF→RHF, UHF→UHF); null when not analysed. */
  stable: boolean | null;
  /** Whether an instability was followed to reach it. */
  followed: boolean;
}

export interface ScfSolutionRecord {
  reference: ScfReferenceName;
  energy: number;
  s2: number;
  source: ScfCandidate['source'];
  /** Lowest orbital-Hessian eigenvalues (hartree) of the kept solution. */
  stability: { rhfToRhf?: number; rhfToUhf?: number; uhfToUhf?: number; stable: boolean } | null;
  candidates: ScfCandidate[];
  /** Why this solution was kept, in words. */
  reason: string;
  /** The kept MO coefficients (n×n row-major, MO j in column j), to start the neighbouring point from. */
  orbitals: { nBasis: number; alpha: number[]; beta: number[] };
}

export interface PointMethodResult {
  /** Total energy per root, hartree (root 0 is +Q corrected for a plusQ method). */
  energies: number[];
  s2: number[];
  multiplicities: number[];
  irreps: (string | null)[];
  /** The leading determinants of each root, for following states between points. */
  leading: DeterminantWeight[][];
  /** The SCF energy the CI was built on, hartree. */
  referenceEnergy: number;
  determinantCount: number;
  warnings: string[];
}

export interface PointResult {
  /** The coordinate value in the scan's units. */
  value: number;
  pointGroup: string | null;
  atomsBohr: [string, number, number, number][];
  /** The SCF solution kept for each reference the methods use. */
  solutions: Partial<Record<ScfReferenceName, ScfSolutionRecord>>;
  /** One entry per method, in the order of the plan's methods. */
  methods: PointMethodResult[];
  warnings: string[];
  timingsMs: number;
}

export type GuessOrbitals = Partial<Record<ScfReferenceName, { nBasis: number; alpha: number[]; beta: number[] }>>;

export interface ScanFlag {
  type: 'solution-switch' | 'coulson-fischer' | 'crossing' | 'avoided-crossing' | 'state-lost' | 'not-converged';
  /** The two neighbouring points (indices) the flag lies between; equal for a flag at one point. */
  between: [number, number];
  /** Interpolated coordinate value in the scan's units, where it applies. */
  value?: number;
  methods?: number[];
  curves?: number[];
  message: string;
}

export interface ScanCurve {
  method: ScanMethodPlan;
  root: number;
  label: string;
  /** Total energy per point, hartree; null where the state was not among the computed roots or the point failed. */
  energies: (number | null)[];
  /** Which energy-ordered root of its method the curve follows at each point. */
  rootAtPoint: (number | null)[];
  /** Symmetry label of the followed state ("Ag", "B1u", …) and multiplicity, from the first point. */
  irrep: string | null;
  multiplicity: number | null;
  /** Energy minus the reference method's curve of the same root, hartree; absent without a reference method. */
  errors?: (number | null)[];
}

export interface ScanConstants {
  method: number;
  root: number;
  /** Position of the minimum: bohr for a distance or stretch, degrees for an angle. */
  Re: number | null;
  ReUnit: 'bohr' | 'degree';
  /** Energy at the minimum, hartree. */
  Emin: number | null;
  /** Dissociation energy, hartree. */
  De: number | null;
  /** What D_e is measured against: "fragments" (their summed energies), "far-end" (the last point) or null. */
  DeReference: 'fragments' | 'far-end' | null;
  /** Summed fragment energies in the same method and basis, hartree. */
  fragmentEnergy: number | null;
  /** Harmonic wavenumber, cm⁻¹ (distance scans between two fragments only). */
  omegaE: number | null;
  /** Curvature d²E/dR² at the minimum, hartree/bohr² (hartree/degree² for an angle). */
  curvature: number | null;
  /** How the minimum was found: the fit alone, or the fit refined by extra solver calls. */
  fit: 'spline' | 'polynomial' | 'spline+refined' | 'polynomial+refined' | null;
  /** Spread (max − min) of the error against the reference method, hartree. */
  nonParallelityError: number | null;
  /** Largest |error| against the reference method, hartree. */
  maxError: number | null;
  warnings: string[];
}

export interface SizeExtensivityRow {
  method: number;
  /** E(A···B) − [E(A) + E(B)] per point, milli-hartree and kcal/mol; null where the point is missing. */
  differenceMilliHartree: (number | null)[];
  differenceKcalPerMol: (number | null)[];
}

export interface AssembledScan {
  format: 'ketbook-scan/1';
  coordinate: ScanCoordinate;
  units: ScanPlan['units'];
  points: number[];
  methods: ScanMethodPlan[];
  curves: ScanCurve[];
  constants: ScanConstants[];
  flags: ScanFlag[];
  /** The Coulson–Fischer point (RHF→UHF instability) in the scan's units, when the scan passes one. */
  coulsonFischer: { value: number; between: [number, number] } | null;
  sizeExtensivity: SizeExtensivityRow[] | null;
  warnings: string[];
}
