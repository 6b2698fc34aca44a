import type { RunFile } from '../runFile/schema';
import type { ProgressSink } from '../types';
import { badInput, SolverError } from '../errors';
import { toJsonSafe } from '../runFile/jsonSafety';
import { prepareSystem } from '../run/prepareSystem';
import { moleculeProblem, moleculeReference, type ReferenceOrbitals } from '../run/scfStage';
import { runCalculation } from '../run/runCalculation';
import { chooseScfSolution } from './chooseScfSolution';
import type { GuessOrbitals, PointMethodResult, PointResult, ScanMethodPlan, ScfReferenceName, ScfSolutionRecord } from './types';

/** Leading determinants kept per root for following states between points. */
export const FOLLOWING_DETERMINANTS = 30;

export interface ScanPointOptions {
  /** The neighbouring point's kept orbitals per reference (from its PointResult.solutions). */
  guessOrbitals?: GuessOrbitals;
  onProgress?: ProgressSink;
  shouldCancel?: () => boolean;
  /** The coordinate value in the scan's units, copied into the result. */
  value?: number;
}

/**
 * One scan point: the integrals once, the right SCF solution for each reference the methods
 * use (see chooseScfSolution), then each method's CI on those orbitals through the ordinary
 * run pipeline. A singlet scan with a UHF method also gets its RHF solution, so the RHF→UHF
 * instability (the Coulson–Fischer point) can be found. Returns plain JSON.
 */
export async function runScanPoint(pointRunFile: RunFile, methods: ScanMethodPlan[], options: ScanPointOptions = {}): Promise<PointResult> {
  const started = performance.now();
  if (pointRunFile.system.type !== 'molecule') throw badInput('a scan point needs a molecule', 'system.type');
  if (methods.length === 0) throw badInput('a scan point needs at least one method', 'methods');
  const prepared = prepareSystem(pointRunFile);
  if (prepared.kind !== 'molecule') throw badInput('a scan point needs a molecule', 'system.type');
  const problem = moleculeProblem(prepared, options.onProgress);

  const references = new Set<ScfReferenceName>(methods.map((m) => m.reference));
  if (references.has('UHF') && prepared.twoS === 0) references.add('RHF');

  const solutions: Partial<Record<ScfReferenceName, ScfSolutionRecord>> = {};
  const orbitals: Partial<Record<ScfReferenceName, ReferenceOrbitals>> = {};
  const warnings: string[] = [];
  for (const reference of ['RHF', 'ROHF', 'UHF'] as const) {
    if (!references.has(reference)) continue;
    if (options.shouldCancel?.()) throw cancelled();
    const guess = options.guessOrbitals?.[reference];
    const chosen = chooseScfSolution(problem, pointRunFile, reference, {
      neighbour: guess ? { alpha: Float64Array.from(guess.alpha), beta: Float64Array.from(guess.beta) } : undefined,
      onProgress: options.onProgress,
    });
    solutions[reference] = chosen.record;
    orbitals[reference] = moleculeReference(prepared, problem, chosen.scf, chosen.stability, chosen.warnings);
  }

  const methodResults: PointMethodResult[] = [];
  // CISD and CISD+Q are one CI: methods that differ only in plusQ or label share the calculation.
  const ciRuns = new Map<string, Awaited<ReturnType<typeof runCalculation>>>();
  for (const method of methods) {
    if (options.shouldCancel?.()) throw cancelled();
    const reference = orbitals[method.reference]!;
    if (!method.ci) {
      methodResults.push({
        energies: [reference.scf.energyHartree],
        s2: [reference.scf.s2],
        multiplicities: [Math.round(Math.sqrt(1 + 4 * Math.max(0, reference.scf.s2)))],
        irreps: [null],
        leading: [[]],
        referenceEnergy: reference.scf.energyHartree,
        determinantCount: 1,
        warnings: [...reference.warnings],
      });
      continue;
    }
    const methodRun = {
      ...pointRunFile,
      reference: method.reference,
      ci: method.ci,
      output: { leadingDeterminants: FOLLOWING_DETERMINANTS, vectors: false, orbitals: false, densities: false },
    } as RunFile;
    const key = JSON.stringify([method.reference, method.ci]);
    let result = ciRuns.get(key);
    if (!result) {
      result = await runCalculation(methodRun, {
        precomputed: { prepared, reference },
        onProgress: options.onProgress,
        shouldCancel: options.shouldCancel,
      });
      ciRuns.set(key, result);
    }
    const roots = result.ci!.roots;
    const energies = [...result.energies.roots];
    const methodWarnings = [...result.warnings];
    if (method.plusQ) {
      if (result.energies.plusQ !== null) energies[0] = result.energies.plusQ;
      else methodWarnings.push(`the +Q correction does not apply here (the space is already full CI for these electrons): ${method.label} is the plain CI energy`);
    }
    methodResults.push({
      energies,
      s2: roots.map((r) => r.s2),
      multiplicities: roots.map((r) => r.multiplicity),
      irreps: roots.map((r) => r.irrep),
      leading: roots.map((r) => r.leadingDeterminants.map((d) => ({ alpha: d.alpha, beta: d.beta, coefficient: d.coefficient }))),
      referenceEnergy: result.energies.reference,
      determinantCount: result.determinantCount,
      warnings: methodWarnings,
    });
  }
  for (const m of methodResults) for (const w of m.warnings) if (!warnings.includes(w)) warnings.push(w);

  const point: PointResult = {
    value: options.value ?? 0,
    pointGroup: prepared.pointGroup,
    atomsBohr: prepared.molecule.atoms.map((a) => [a.ghost ? `${a.symbol}:ghost` : a.symbol, ...a.positionBohr] as [string, number, number, number]),
    solutions,
    methods: methodResults,
    warnings,
    timingsMs: performance.now() - started,
  };
  return toJsonSafe(point) as PointResult;
}

function cancelled(): SolverError {
  return new SolverError('cancelled', 'the scan point was cancelled');
}
