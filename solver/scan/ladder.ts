import type { RunFile } from '../runFile/schema';
import type { ProgressSink } from '../types';
import { badInput, SolverError } from '../errors';
import { toJsonSafe } from '../runFile/jsonSafety';
import { planMethods, withoutScan } from './planScan';
import { runScanPoint } from './runScanPoint';
import type { PointResult, ScanMethodPlan } from './types';

/** A full-CI correlation energy smaller than this (hartree) leaves no share to report (one electron; common practice, no source). */
export const NO_CORRELATION_HARTREE = 1e-10;

export interface LadderPlan {
  /** One label per basis: its name, or "even-tempered set k" / "custom set k". */
  bases: string[];
  /** The run file of each basis (no ladder, methods or ci). */
  basisRunFiles: RunFile[];
  methods: ScanMethodPlan[];
  /** The method whose correlation energy is the 100 %: a plain full CI, added at the end when the list has none. */
  fullCiMethod: number;
  fullCiAdded: boolean;
}

export interface LadderRow {
  basis: string;
  basisFunctions: number;
  /** The SCF energy of the full CI's reference (RHF for singlets, ROHF otherwise), hartree: the zero of correlation. */
  referenceEnergy: number;
  fullCiEnergy: number;
  fullCiCorrelation: number;
  /** Per method: total energy, correlation energy (energy − referenceEnergy) and the share of the full-CI correlation, %. */
  methods: { energy: number; correlation: number; percentOfFullCi: number | null }[];
}

export interface AssembledLadder {
  format: 'ketbook-ladder/1';
  bases: string[];
  methods: ScanMethodPlan[];
  fullCiMethod: number;
  rows: (LadderRow | null)[];
  warnings: string[];
}

const isPlainFci = (m: ScanMethodPlan) =>
  m.ci?.space === 'FCI' && !m.ci.frozenCore && !m.ci.deletedVirtuals && !m.ci.ras && !m.ci.irrep && m.ci.twoMs === undefined && m.reference !== 'UHF';

/** The bases and methods of a ladder; a plain full CI is added when the methods have none. */
export function planLadder(runFile: RunFile): LadderPlan {
  if (!runFile.ladder) throw badInput('the run file has no ladder', 'ladder');
  const system = runFile.system;
  if (system.type !== 'molecule') throw badInput('a ladder changes the basis: it needs a molecule', 'system.type');
  const methods = planMethods(runFile);
  let fullCiMethod = methods.findIndex(isPlainFci);
  const fullCiAdded = fullCiMethod < 0;
  if (fullCiAdded) {
    fullCiMethod = methods.length;
    const ci = { space: 'FCI', frozenCore: 0, deletedVirtuals: 0, roots: 1, method: 'auto' } as ScanMethodPlan['ci'];
    methods.push({ index: fullCiMethod, label: 'FCI', reference: system.multiplicity === 1 ? 'RHF' : 'ROHF', ci, plusQ: false, roots: 1 });
  }
  const counters = { 'even-tempered': 0, custom: 0 };
  const bases = runFile.ladder.bases.map((basis) => {
    if (typeof basis === 'string') return basis;
    counters[basis.type]++;
    return basis.name ?? `${basis.type} set ${counters[basis.type]}`;
  });
  const base = withoutScan(runFile);
  const basisRunFiles = runFile.ladder.bases.map((basis) => ({ ...base, system: { ...system, basis } }) as RunFile);
  return { bases, basisRunFiles, methods, fullCiMethod, fullCiAdded };
}

/** One rung: every method in one basis, through the same point runner as a scan. */
export function runLadderBasis(basisRunFile: RunFile, methods: ScanMethodPlan[], options: { onProgress?: ProgressSink; shouldCancel?: () => boolean } = {}) {
  return runScanPoint(basisRunFile, methods, options);
}

/**
 * The ladder's table: for each basis, each method's share of the full-CI correlation energy,
 * 100 · (E − E_ref) / (E_FCI − E_ref), with E_ref the SCF energy the full CI starts from.
 * A variational method inside the full-CI space lies between 0 % (the reference) and 100 %;
 * +Q corrections and UHF may fall outside.
 */
export function assembleLadder(plan: LadderPlan, results: (PointResult | null)[]): AssembledLadder {
  const warnings: string[] = [];
  const rows = results.map((result, b): LadderRow | null => {
    if (!result) return null;
    const fci = result.methods[plan.fullCiMethod];
    const referenceEnergy = fci.referenceEnergy;
    const fullCiEnergy = fci.energies[0];
    const fullCiCorrelation = fullCiEnergy - referenceEnergy;
    if (Math.abs(fullCiCorrelation) < NO_CORRELATION_HARTREE) {
      warnings.push(`${plan.bases[b]}: full CI has no correlation energy to share out (one electron or one orbital per electron)`);
    }
    const basisFunctions = result.solutions[plan.methods[plan.fullCiMethod].reference]?.orbitals.nBasis ?? 0;
    return {
      basis: plan.bases[b],
      basisFunctions,
      referenceEnergy,
      fullCiEnergy,
      fullCiCorrelation,
      methods: result.methods.map((m) => {
        const correlation = m.energies[0] - referenceEnergy;
        return {
          energy: m.energies[0],
          correlation,
          percentOfFullCi: Math.abs(fullCiCorrelation) < NO_CORRELATION_HARTREE ? null : (100 * correlation) / fullCiCorrelation,
        };
      }),
    };
  });
  if (plan.fullCiAdded) warnings.push('the methods had no plain full CI: one was added as the 100 %');
  return toJsonSafe({ format: 'ketbook-ladder/1', bases: plan.bases, methods: plan.methods, fullCiMethod: plan.fullCiMethod, rows, warnings }) as AssembledLadder;
}

/** A whole ladder, one basis after another; a basis whose SCF or CI does not converge gets an empty row. */
export async function runLadder(
  runFile: RunFile,
  options: { onBasis?: (index: number, result: PointResult | null, plan: LadderPlan) => void; shouldCancel?: () => boolean } = {},
): Promise<AssembledLadder> {
  const plan = planLadder(runFile);
  const results: (PointResult | null)[] = [];
  for (let b = 0; b < plan.basisRunFiles.length; b++) {
    try {
      results.push(await runLadderBasis(plan.basisRunFiles[b], plan.methods, { shouldCancel: options.shouldCancel }));
    } catch (error) {
      if (!(error instanceof SolverError && error.code === 'not-converged')) throw error;
      results.push(null);
    }
    options.onBasis?.(b, results[b], plan);
  }
  return assembleLadder(plan, results);
}
