import type { RunFile } from '../runFile/schema';
import type { ProgressSink } from '../types';
import { SolverError } from '../errors';
import { planScan, scanPointRunFile, fragmentMethod } from './planScan';
import { runScanPoint } from './runScanPoint';
import { assembleScan } from './assembleScan';
import type { AssembledScan, GuessOrbitals, PointResult, ScanPlan } from './types';

export interface RunScanOptions {
  /** Called as each point finishes (its result can be saved at once). */
  onPoint?: (index: number, result: PointResult | null, plan: ScanPlan) => void;
  onProgress?: ProgressSink;
  shouldCancel?: () => boolean;
  /** Results saved from an earlier, interrupted run of the same scan: those points are not recomputed. */
  resume?: (PointResult | null)[];
}

function guessFrom(result: PointResult | null | undefined): GuessOrbitals | undefined {
  if (!result) return undefined;
  const guess: GuessOrbitals = {};
  for (const [reference, record] of Object.entries(result.solutions)) guess[reference as keyof GuessOrbitals] = record!.orbitals;
  return guess;
}

/**
 * A whole scan, one point after another, for the CLI and the tests: each point starts from
 * its neighbour's orbitals; a point whose SCF or CI does not converge is left empty and
 * flagged, anything else stops the scan. The direct minimisation and the fragments run here
 * too, through the same callbacks a browser pool would route to its workers.
 */
export async function runScan(runFile: RunFile, options: RunScanOptions = {}): Promise<AssembledScan> {
  const plan = planScan(runFile);
  const results: (PointResult | null)[] = plan.points.map((_, p) => options.resume?.[p] ?? null);
  for (let p = 0; p < plan.points.length; p++) {
    if (results[p]) continue;
    if (options.shouldCancel?.()) throw new SolverError('cancelled', `the scan was cancelled before point ${p}`);
    try {
      results[p] = await runScanPoint(plan.pointRunFiles[p], plan.methods, {
        guessOrbitals: guessFrom(results[p - 1]),
        onProgress: options.onProgress,
        shouldCancel: options.shouldCancel,
        value: plan.points[p],
      });
    } catch (error) {
      if (!(error instanceof SolverError && error.code === 'not-converged')) throw error;
      results[p] = null;
    }
    options.onPoint?.(p, results[p], plan);
  }

  const nearest = (value: number) => {
    let best = -1;
    results.forEach((r, p) => {
      if (r && (best < 0 || Math.abs(plan.points[p] - value) < Math.abs(plan.points[best] - value))) best = p;
    });
    return best >= 0 ? results[best] : null;
  };

  return assembleScan(plan, results, {
    evaluate: async (methodIndex, root, value) => {
      const point = await runScanPoint(scanPointRunFile(runFile, value), [plan.methods[methodIndex]], {
        guessOrbitals: guessFrom(nearest(value)),
        shouldCancel: options.shouldCancel,
        value,
      });
      const energy = point.methods[0].energies[root];
      if (energy === undefined) throw new SolverError('internal', `root ${root} missing at ${value}`);
      return energy;
    },
    fragmentEnergy: async (methodIndex) => {
      if (!plan.fragments) return { energy: null, note: null };
      let sum = 0;
      const notes: string[] = [];
      for (const fragment of plan.fragments) {
        const { method, note } = fragmentMethod(plan.methods[methodIndex], fragment);
        if (note) notes.push(note);
        if (!method) return { energy: null, note: `no fragment energy: ${notes.join('; ')}` };
        const point = await runScanPoint(fragment.runFile, [method], { shouldCancel: options.shouldCancel });
        sum += point.methods[0].energies[0];
      }
      return { energy: sum, note: notes.length > 0 ? notes.join('; ') : null };
    },
  });
}
