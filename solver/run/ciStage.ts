import type { CiSettings } from '../runFile/schema';
import type { OrbitalHamiltonian, ProgressSink } from '../types';
import { orbitalHamiltonian } from '../transform';
import {
  solveCi,
  estimateCiSpace,
  checkBudget,
  leadingDeterminants,
  oneParticleDensity,
  twoParticleDensity,
  naturalOrbitals,
  langhoffDavidson,
  spinCompleteWarning,
  type CiSpaceSpec,
} from '../ci';
import { irrepLabel, irrepIndex, rootIrrep } from '../symmetry';
import { badInput } from '../errors';
import { selectOrbitals, maxExcitationOf, type OrbitalSelection } from './orbitalSelection';
import type { RootResult, RunResult } from './result';

export interface CiStageInput {
  ci: CiSettings;
  /** AO (or model-orbital) one- and two-electron integrals and the MO coefficients. */
  coreHamiltonian: Float64Array;
  eri: Float64Array;
  coefficients: Float64Array;
  nBasis: number;
  nOrbitals: number;
  coreEnergy: number;
  nElectrons: number;
  twoS: number;
  orbitalEnergies?: Float64Array;
  irreps: Int32Array | null;
  pointGroup: string | null;
  referenceEnergy: number;
  budgetBytes: number;
  leadingCount: number;
  includeVectors: boolean;
  includeDensities: boolean;
  onProgress?: ProgressSink;
  shouldCancel?: () => boolean;
}

export interface CiStagePlan {
  selection: OrbitalSelection;
  spec: CiSpaceSpec;
  activeIrreps: Int32Array | undefined;
}

/** The CI space a run asks for, checked against the orbitals it has; allocates nothing large. */
export function planCi(input: Pick<CiStageInput, 'ci' | 'nOrbitals' | 'nElectrons' | 'twoS' | 'orbitalEnergies' | 'irreps' | 'pointGroup'>): CiStagePlan {
  const selection = selectOrbitals({
    nOrbitals: input.nOrbitals,
    nElectrons: input.nElectrons,
    twoS: input.twoS,
    ci: input.ci,
    orbitalEnergies: input.orbitalEnergies,
  });
  const activeIrreps = input.irreps ? Int32Array.from(selection.active, (p) => input.irreps![p]) : undefined;
  let targetIrrep: number | undefined;
  if (input.ci.irrep) {
    if (!activeIrreps || !input.pointGroup) {
      throw badInput('an irrep restriction needs a molecule with symmetry turned on', 'ci.irrep');
    }
    targetIrrep = irrepIndex(input.pointGroup, input.ci.irrep);
  }
  const spec: CiSpaceSpec = {
    nOrbitals: selection.active.length,
    nAlpha: selection.nAlpha,
    nBeta: selection.nBeta,
    maxExcitation: maxExcitationOf(input.ci),
    ras: selection.ras,
    targetIrrep,
  };
  return { selection, spec, activeIrreps };
}

/**
 * Whether the Langhoff–Davidson +Q correction applies: a truncated excitation space that
 * contains the SCF reference determinant itself, without RAS or irrep filters, and below the
 * level at which it would already be full CI.
 */
function plusQApplies(ci: CiSettings, spec: CiSpaceSpec, twoS: number): boolean {
  if (spec.maxExcitation === null || spec.maxExcitation < 2 || spec.ras || spec.targetIrrep !== undefined) return false;
  if (ci.twoMs !== undefined && ci.twoMs !== twoS) return false;
  const highestLevel = Math.min(spec.nAlpha, spec.nOrbitals - spec.nAlpha) + Math.min(spec.nBeta, spec.nOrbitals - spec.nBeta);
  return spec.maxExcitation < highestLevel;
}

/**
 * The spin parity of the state a run asks for when it names no target multiplicity: the
 * ground state (one root) of a singlet run with nα = nβ in the CI is sought among the
 * states of singlet parity (S = 0, 2, …), which halves the Davidson work through the Ms = 0
 * transpose symmetry. With more roots every spin state still counts, as documented for
 * `ci.roots`.
 */
function groundStateSpinParity(input: CiStageInput, spec: CiSpaceSpec): 1 | undefined {
  if (input.ci.targetMultiplicity !== undefined || (input.ci.roots ?? 1) !== 1) return undefined;
  return input.twoS === 0 && spec.nAlpha === spec.nBeta ? 1 : undefined;
}

export function runCiStage(input: CiStageInput): NonNullable<RunResult['ci']> & { plusQ: number | null; warnings: string[]; determinantCount: number; coreEnergy: number } {
  const { selection, spec, activeIrreps } = planCi(input);
  const estimate = estimateCiSpace(spec, { orbitalIrreps: activeIrreps, roots: input.ci.roots });
  checkBudget(estimate, input.budgetBytes);
  if (estimate.determinants === 0) {
    throw badInput('the CI space is empty: no determinant satisfies the restrictions (irrep, RAS limits)', 'ci');
  }
  input.onProgress?.({ phase: 'ci-setup', determinants: estimate.determinants });

  const ham: OrbitalHamiltonian = orbitalHamiltonian({
    coreHamiltonianAO: input.coreHamiltonian,
    eriAO: input.eri,
    coefficients: input.coefficients,
    nBasis: input.nBasis,
    nuclearRepulsionHartree: input.coreEnergy,
    frozenOrbitals: selection.core,
    activeOrbitals: selection.active,
  });
  if (activeIrreps) ham.orbitalIrreps = activeIrreps;

  input.onProgress?.({ phase: 'transform' });
  const convergence = input.ci.convergence;
  const solution = solveCi(ham, spec, {
    roots: input.ci.roots,
    targetMultiplicity: input.ci.targetMultiplicity,
    spinParity: groundStateSpinParity(input, spec),
    method: input.ci.method,
    residualTolerance: convergence?.residualNorm ?? 1e-7,
    energyTolerance: convergence?.energyChange ?? 1e-12,
    maxIterations: convergence?.maxIterations ?? 200,
    onProgress: input.onProgress
      ? (ev: { iteration: number; energies: number[]; residualNorms: number[] }) =>
          input.onProgress!({ phase: 'davidson', iteration: ev.iteration, energies: ev.energies, residualNorms: ev.residualNorms })
      : undefined,
    shouldCancel: input.shouldCancel,
    budgetBytes: input.budgetBytes,
  });

  input.onProgress?.({ phase: 'properties' });
  const warnings = [...selection.warnings];
  const spinReport = spinCompleteWarning(spec);
  if (spinReport.warning && spinReport.message) warnings.push(spinReport.message);

  const e0 = solution.energies[0];
  const roots: RootResult[] = solution.energies.map((energy, k) => {
    const vector = solution.vectors[k];
    const gamma = oneParticleDensity(solution.space, vector);
    const natural = naturalOrbitals(gamma);
    const leading = leadingDeterminants(solution.space, vector, input.leadingCount);
    const s2 = solution.s2[k];
    const spin = (-1 + Math.sqrt(1 + 4 * Math.max(0, s2))) / 2;
    let irrep: string | null = null;
    if (activeIrreps && input.pointGroup && leading.length > 0) {
      // A root of a symmetry-adapted space has the irrep of each of its determinants.
      irrep = irrepLabel(input.pointGroup, rootIrrep(activeIrreps, leading[0]));
    }
    return {
      energy,
      correlationEnergy: energy - input.referenceEnergy,
      excitationEnergy: energy - e0,
      s2,
      multiplicity: Math.round(2 * spin + 1),
      irrep,
      referenceWeight: solution.referenceWeight[k],
      leadingDeterminants: leading.map((d) => ({
        alpha: d.alpha,
        beta: d.beta,
        coefficient: d.coefficient,
        weight: d.weight,
        excitationLevel: d.excitationLevel,
      })),
      naturalOccupations: Array.from(natural.occupations),
    };
  });

  const plusQ =
    plusQApplies(input.ci, spec, input.twoS) && solution.referenceWeight[0] > 0
      ? langhoffDavidson(e0, input.referenceEnergy, solution.referenceWeight[0])
      : null;

  let densities: { oneParticle: number[]; twoParticle: number[] } | undefined;
  if (input.includeDensities) {
    densities = {
      oneParticle: Array.from(oneParticleDensity(solution.space, solution.vectors[0])),
      twoParticle: Array.from(twoParticleDensity(solution.space, solution.vectors[0])),
    };
  }

  return {
    space: input.ci.space,
    maxExcitation: spec.maxExcitation,
    coreOrbitals: selection.core,
    activeOrbitals: selection.active,
    outsideOrbitals: selection.outside,
    nAlpha: spec.nAlpha,
    nBeta: spec.nBeta,
    twoMs: spec.nAlpha - spec.nBeta,
    method: solution.method,
    iterations: solution.iterations,
    roots,
    densities,
    vectors: input.includeVectors ? solution.vectors.map((v) => Array.from(v)) : undefined,
    plusQ,
    warnings,
    determinantCount: solution.determinantCount,
    coreEnergy: ham.coreEnergy,
  };
}
