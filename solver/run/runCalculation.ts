import type { RunFile } from '../runFile/schema';
import { DEFAULT_BUDGET_BYTES } from '../runFile/schema';
import type { ProgressSink } from '../types';
import { runFileHash } from '../runFile/canonical';
import { toJsonSafe } from '../runFile/jsonSafety';
import { SOLVER_VERSION } from '../version';
import { badInput } from '../errors';
import { slaterCondonElement } from '../ci';
import { lowestOrbitalsPattern } from '../ci/bits';
import { prepareSystem, type PreparedSystem } from './prepareSystem';
import type { SpinPair } from '../scf';
import { moleculeScf, modelScf, type ReferenceOrbitals } from './scfStage';
import { runCiStage } from './ciStage';
import type { RunResult } from './result';

export interface RunOptions {
  onProgress?: ProgressSink;
  /** Polled between iterations; returning true stops the run with a 'cancelled' error. */
  shouldCancel?: () => boolean;
  /**
   * Return the full CI vectors even when the run file does not ask for them (the browser
   * keeps them to save with the run). Not part of the run file, so it leaves its hash alone.
   */
  includeVectors?: boolean;
  /** Starting MO coefficients for the SCF (a scan passes its neighbour's); not part of the run file. */
  initialOrbitals?: SpinPair<Float64Array>;
  /**
   * The system already prepared from this run file and its SCF solution already chosen (a scan
   * runs several methods on one geometry and picks the SCF solution itself). Both must come
   * from this run file's system; the SCF stage is then skipped.
   */
  precomputed?: { prepared: PreparedSystem; reference: ReferenceOrbitals | null };
}

function identity(n: number): Float64Array {
  const m = new Float64Array(n * n);
  for (let i = 0; i < n; i++) m[i * n + i] = 1;
  return m;
}

export async function runCalculation(runFile: RunFile, options: RunOptions = {}): Promise<RunResult> {
  const startedAt = new Date().toISOString();
  const timingsMs: Record<string, number> = {};
  let clock = performance.now();
  const lap = (name: string) => {
    const now = performance.now();
    timingsMs[name] = now - clock;
    clock = now;
  };

  const runFileHashHex = await runFileHash(runFile);
  const prepared = options.precomputed?.prepared ?? prepareSystem(runFile);
  lap('setup');

  const warnings: string[] = [];
  let reference: ReferenceOrbitals | null = null;
  if (options.precomputed) {
    reference = options.precomputed.reference;
  } else if (prepared.kind === 'molecule') {
    reference = moleculeScf(prepared, runFile, options);
    lap('scf');
  } else if (runFile.reference) {
    reference = modelScf(prepared, runFile, options);
    lap('scf');
  }

  if (reference) warnings.push(...reference.warnings);
  const nOrbitals = prepared.kind === 'molecule' ? prepared.basis.nFunctions : prepared.hamiltonian.nOrbitals;
  const nuclearRepulsion = prepared.kind === 'molecule' ? prepared.nuclearRepulsionHartree : 0;
  const coreEnergyOfSystem = prepared.kind === 'molecule' ? prepared.nuclearRepulsionHartree : prepared.hamiltonian.coreEnergy;

  let referenceEnergy: number;
  if (reference) {
    referenceEnergy = reference.scf.energyHartree;
  } else {
    // No SCF asked for: the given orbitals are used as they are; the reference is the
    // aufbau determinant of those orbitals.
    const model = prepared as Extract<typeof prepared, { kind: 'model' }>;
    const nAlpha = (model.nElectrons + model.twoS) / 2;
    const nBeta = (model.nElectrons - model.twoS) / 2;
    const aufbau = { alpha: lowestOrbitalsPattern(nAlpha), beta: lowestOrbitalsPattern(nBeta) };
    referenceEnergy = slaterCondonElement(model.hamiltonian, aufbau, aufbau).value;
  }

  let ci: RunResult['ci'] = null;
  let plusQ: number | null = null;
  let determinantCount = 1;
  let rootEnergies = [referenceEnergy];
  let s2 = [reference ? reference.scf.s2 : prepared.twoS / 2 * (prepared.twoS / 2 + 1)];
  let coreEnergy = coreEnergyOfSystem;

  if (runFile.ci) {
    if (reference && reference.scf.reference === 'UHF') {
      throw badInput(
        'following the RHF→UHF instability gave UHF orbitals, and CI needs RHF or ROHF orbitals: turn scf.followInstability off for a CI run',
        'scf.followInstability',
      );
    }
    if (runFile.ci.twoMs !== undefined && runFile.ci.twoMs !== prepared.twoS) {
      warnings.push(
        `the CI space has 2Ms = ${runFile.ci.twoMs} while the reference has 2S = ${prepared.twoS}: correlation energies are measured from a reference of a different spin`,
      );
    }
    const stage = runCiStage({
      ci: runFile.ci,
      coreHamiltonian: reference ? reference.problem.coreHamiltonian : (prepared as Extract<typeof prepared, { kind: 'model' }>).hamiltonian.h,
      eri: reference ? reference.problem.eri : (prepared as Extract<typeof prepared, { kind: 'model' }>).hamiltonian.eri,
      coefficients: reference ? reference.coefficients : identity(nOrbitals),
      nBasis: nOrbitals,
      nOrbitals,
      coreEnergy: coreEnergyOfSystem,
      nElectrons: prepared.nElectrons,
      twoS: prepared.twoS,
      orbitalEnergies: reference?.orbitalEnergies,
      irreps: reference?.irreps ?? null,
      pointGroup: prepared.kind === 'molecule' ? prepared.pointGroup : null,
      referenceEnergy,
      budgetBytes: runFile.budget?.memoryBytes ?? DEFAULT_BUDGET_BYTES,
      leadingCount: runFile.output?.leadingDeterminants ?? 20,
      includeVectors: options.includeVectors || (runFile.output?.vectors ?? false),
      includeDensities: runFile.output?.densities ?? false,
      onProgress: options.onProgress,
      shouldCancel: options.shouldCancel,
    });
    lap('ci');
    const { plusQ: q, warnings: ciWarnings, determinantCount: count, coreEnergy: ciCoreEnergy, ...ciResult } = stage;
    ci = ciResult;
    plusQ = q;
    warnings.push(...ciWarnings);
    determinantCount = count;
    rootEnergies = ci.roots.map((r) => r.energy);
    s2 = ci.roots.map((r) => r.s2);
    // The core energy the CI actually used: nuclear repulsion (or the model's constant) plus any frozen core.
    coreEnergy = ciCoreEnergy;
  }

  const result: RunResult = {
    format: 'ketbook-result/1',
    energyUnit: prepared.kind === 'model' && prepared.type === 'hubbard' ? 't' : 'hartree',
    energies: {
      nuclearRepulsion,
      coreEnergy,
      reference: referenceEnergy,
      roots: rootEnergies,
      correlation: rootEnergies.map((e) => e - referenceEnergy),
      plusQ,
    },
    s2,
    determinantCount,
    system: {
      type: runFile.system.type,
      electrons: prepared.nElectrons,
      orbitals: nOrbitals,
      pointGroup: prepared.kind === 'molecule' ? prepared.pointGroup : null,
      basisFunctions: prepared.kind === 'molecule' ? prepared.basis.functionLabels : null,
      atomsBohr:
        prepared.kind === 'molecule'
          ? prepared.molecule.atoms.map((a) => [a.ghost ? `${a.symbol}:ghost` : a.symbol, ...a.positionBohr] as [string, number, number, number])
          : null,
    },
    scf: reference ? reference.summary : null,
    ci,
    orbitals:
      runFile.output?.orbitals && reference ? { coefficients: Array.from(reference.coefficients), nBasis: nOrbitals } : undefined,
    warnings,
    provenance: { solverVersion: SOLVER_VERSION, runFileHash: runFileHashHex, startedAt, timingsMs },
  };
  return toJsonSafe(result) as RunResult;
}
