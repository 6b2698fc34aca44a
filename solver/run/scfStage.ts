import type { RunFile } from '../runFile/schema';
import type { ProgressSink } from '../types';
import { overlapMatrix, kineticMatrix, nuclearAttractionMatrix, electronRepulsionIntegrals, dipoleMatrices } from '../integrals';
import { runScf, stabilityAnalysis, followInstability, type ScfProblem, type ScfResult, type SpinPair, type StabilityResult } from '../scf';
import { mullikenCharges, dipoleMomentDebye } from '../properties';
import { centreOfMassBohr } from '../system/molecule';
import { orbitalIrreps, irrepLabel } from '../symmetry';
import type { PreparedMolecule, PreparedModel } from './prepareSystem';
import type { ScfSummary } from './result';

/** What later stages need from the SCF, in the orbital basis it produced. */
export interface ReferenceOrbitals {
  problem: ScfProblem;
  scf: ScfResult;
  /** MO coefficients used for CI (α orbitals; the same as β for RHF and ROHF). */
  coefficients: Float64Array;
  orbitalEnergies: Float64Array;
  /** Irrep index per MO (XOR-multiplying), when the molecule's symmetry is used. */
  irreps: Int32Array | null;
  summary: ScfSummary;
  warnings: string[];
}

export interface ScfStageOptions {
  onProgress?: ProgressSink;
  /** Starting MO coefficients (e.g. a neighbouring scan point's) instead of the run file's guess. */
  initialOrbitals?: SpinPair<Float64Array>;
}

export function scfOptionsFor(runFile: RunFile, reference: 'RHF' | 'UHF' | 'ROHF', onProgress?: ProgressSink, initialOrbitals?: SpinPair<Float64Array>) {
  const s = runFile.scf;
  return {
    reference,
    initialOrbitals,
    guess: s?.guess ?? 'huckel',
    maxIterations: s?.maxIterations ?? 200,
    energyTolerance: s?.energyTolerance ?? 1e-10,
    commutatorTolerance: s?.commutatorTolerance ?? 1e-8,
    diis: s?.diis ?? true,
    breakSymmetry: s?.breakSymmetry ?? false,
    onProgress: onProgress
      ? (ev: { iteration: number; energyHartree: number; error: number }) =>
          onProgress({ phase: 'scf', iteration: ev.iteration, energyHartree: ev.energyHartree, error: ev.error })
      : undefined,
  } as const;
}

export function defaultReference(twoS: number): 'RHF' | 'ROHF' {
  return twoS === 0 ? 'RHF' : 'ROHF';
}

/** The stability figures a result reports, and the warnings an unstable or unchecked solution gets. */
export function judgeStability(analysis: StabilityResult, reference: 'RHF' | 'UHF' | 'ROHF'): { stability: ScfSummary['stability']; warnings: string[] } {
  const warnings: string[] = [];
  const stability = {
    rhfToRhf: analysis.rhfToRhf?.lowestEigenvalue,
    rhfToUhf: analysis.rhfToUhf?.lowestEigenvalue,
    uhfToUhf: analysis.uhfToUhf?.lowestEigenvalue,
    stable: analysis.stable,
  };
  if (!analysis.analysed) {
    warnings.push(`stability analysis is not available for ${reference}; the solution was not checked`);
  } else if (!analysis.stable) {
    const kind = analysis.instability?.kind;
    const eigenvalue = analysis.instability?.lowestEigenvalue.toExponential(3);
    warnings.push(
      kind === 'rhf-to-uhf'
        ? `the RHF solution is unstable towards UHF (lowest triplet orbital-Hessian eigenvalue ${eigenvalue} Eh): a lower, spin-broken UHF solution exists; the RHF orbitals remain a valid CI reference`
        : `the ${reference} solution is unstable (${kind ?? 'orbital'} instability, lowest orbital-Hessian eigenvalue ${eigenvalue} Eh): a lower solution of the same kind exists; set scf.followInstability to follow it`,
    );
  }
  return { stability, warnings };
}

function solveReference(
  problem: ScfProblem,
  runFile: RunFile,
  reference: 'RHF' | 'UHF' | 'ROHF',
  onProgress?: ProgressSink,
  initialOrbitals?: SpinPair<Float64Array>,
) {
  let scf = runScf(problem, scfOptionsFor(runFile, reference, onProgress, initialOrbitals));
  let stability: ScfSummary['stability'] = null;
  const warnings: string[] = [];
  if (runFile.scf?.stability ?? true) {
    let analysis = stabilityAnalysis(problem, scf);
    if (!analysis.stable && runFile.scf?.followInstability) {
      scf = followInstability(problem, scf, scfOptionsFor(runFile, reference, onProgress));
      analysis = stabilityAnalysis(problem, scf);
    }
    const judged = judgeStability(analysis, reference);
    stability = judged.stability;
    warnings.push(...judged.warnings);
  }
  return { scf, stability, warnings };
}

function summarise(scf: ScfResult, stability: ScfSummary['stability'], extra: Partial<ScfSummary>): ScfSummary {
  return {
    reference: scf.reference,
    converged: scf.converged,
    energy: scf.energyHartree,
    iterations: scf.iterations.map((it) => ({
      iteration: it.iteration,
      energy: it.energyHartree,
      deltaEnergy: it.deltaEnergy,
      commutatorNorm: it.commutatorNorm,
    })),
    orbitalEnergies: { alpha: Array.from(scf.orbitalEnergies.alpha), beta: Array.from(scf.orbitalEnergies.beta) },
    occupations: { alpha: Array.from(scf.occupations.alpha), beta: Array.from(scf.occupations.beta) },
    orbitalIrreps: null,
    s2: scf.s2,
    mullikenCharges: null,
    dipole: null,
    stability,
    ...extra,
  };
}

/** The AO integrals and electron counts of a prepared molecule: everything the SCF needs. */
export function moleculeProblem(prepared: PreparedMolecule, onProgress?: ProgressSink): ScfProblem {
  const { basis, molecule } = prepared;
  const n = basis.nFunctions;
  const overlap = overlapMatrix(basis);
  const kinetic = kineticMatrix(basis);
  const attraction = nuclearAttractionMatrix(basis, molecule);
  const coreHamiltonian = new Float64Array(n * n);
  for (let i = 0; i < n * n; i++) coreHamiltonian[i] = kinetic[i] + attraction[i];
  const eri = electronRepulsionIntegrals(basis, {
    onProgress: onProgress ? (done: number, total: number) => onProgress({ phase: 'integrals', done, total }) : undefined,
  });
  const nAlpha = (prepared.nElectrons + prepared.twoS) / 2;
  const nBeta = (prepared.nElectrons - prepared.twoS) / 2;
  const problem: ScfProblem = {
    nBasis: n,
    overlap,
    coreHamiltonian,
    eri,
    nuclearRepulsionHartree: prepared.nuclearRepulsionHartree,
    nAlpha,
    nBeta,
    functionAtom: basis.functionAtom,
  };
  return problem;
}

export function moleculeScf(prepared: PreparedMolecule, runFile: RunFile, { onProgress, initialOrbitals }: ScfStageOptions): ReferenceOrbitals {
  const problem = moleculeProblem(prepared, onProgress);
  const reference = runFile.reference ?? defaultReference(prepared.twoS);
  const { scf, stability, warnings } = solveReference(problem, runFile, reference, onProgress, initialOrbitals);
  return moleculeReference(prepared, problem, scf, stability, warnings);
}

/**
 * Orbital labels, Mulliken charges and the dipole of a converged molecular SCF solution, and
 * the orbitals a CI uses. Split from `moleculeScf` so a scan can choose among several SCF
 * solutions of one geometry and still hand the CI the same kind of reference.
 */
export function moleculeReference(
  prepared: PreparedMolecule,
  problem: ScfProblem,
  scf: ScfResult,
  stability: ScfSummary['stability'],
  warningsIn: string[],
): ReferenceOrbitals {
  const { basis, molecule } = prepared;
  const n = basis.nFunctions;
  const overlap = problem.overlap;
  const warnings = [...warningsIn];

  let irreps: Int32Array | null = null;
  let coefficients = scf.coefficients.alpha;
  let orbitalIrrepLabels: string[] | null = null;
  if (prepared.symmetry && scf.reference !== 'UHF') {
    const labelled = orbitalIrreps(basis, prepared.symmetry, coefficients, overlap, n, scf.orbitalEnergies.alpha);
    coefficients = labelled.coefficients ?? coefficients;
    if (labelled.impureOrbitals.length > 0) {
      // Orbitals that mix irreps (a symmetry-broken SCF) cannot label roots or restrict the CI.
      warnings.push(
        `SCF orbitals ${labelled.impureOrbitals.join(', ')} do not belong to one irrep of ${prepared.pointGroup}: the SCF broke the molecule's symmetry, so orbital and root labels are left out`,
      );
    } else {
      irreps = labelled.irreps;
      orbitalIrrepLabels = labelled.labels;
    }
  } else if (prepared.symmetry) {
    // UHF orbitals of a symmetry-broken solution need not carry irreps; label only when pure.
    orbitalIrrepLabels = null;
  }

  const densityTotal = new Float64Array(n * n);
  for (let i = 0; i < n * n; i++) densityTotal[i] = scf.density.alpha[i] + scf.density.beta[i];
  const origin = centreOfMassBohr(molecule);
  const dipole = dipoleMomentDebye(densityTotal, dipoleMatrices(basis, origin), molecule, origin);
  const charges = mullikenCharges(densityTotal, overlap, basis.functionAtom, molecule);

  return {
    problem,
    scf,
    coefficients,
    orbitalEnergies: scf.orbitalEnergies.alpha,
    irreps,
    summary: summarise(scf, stability, {
      orbitalIrreps: orbitalIrrepLabels,
      mullikenCharges: Array.from(charges),
      dipole: { vectorAu: Array.from(dipole.vectorAu), magnitudeDebye: dipole.magnitudeDebye },
    }),
    warnings,
  };
}

/**
 * A model Hamiltonian with a requested reference: SCF in its own orthonormal orbitals
 * (overlap = identity), then the CI uses the SCF orbitals like any molecule would.
 */
export function modelScf(prepared: PreparedModel, runFile: RunFile, { onProgress }: ScfStageOptions): ReferenceOrbitals {
  const { hamiltonian } = prepared;
  const n = hamiltonian.nOrbitals;
  const overlap = new Float64Array(n * n);
  for (let i = 0; i < n; i++) overlap[i * n + i] = 1;
  const problem: ScfProblem = {
    nBasis: n,
    overlap,
    coreHamiltonian: hamiltonian.h,
    eri: hamiltonian.eri,
    nuclearRepulsionHartree: hamiltonian.coreEnergy,
    nAlpha: (prepared.nElectrons + prepared.twoS) / 2,
    nBeta: (prepared.nElectrons - prepared.twoS) / 2,
  };
  const { scf, stability, warnings } = solveReference(problem, runFile, runFile.reference!, onProgress);
  return {
    problem,
    scf,
    coefficients: scf.coefficients.alpha,
    orbitalEnergies: scf.orbitalEnergies.alpha,
    irreps: null,
    summary: summarise(scf, stability, {}),
    warnings,
  };
}

export { irrepLabel };
