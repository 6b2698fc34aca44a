import type { RunFile } from '../runFile/schema';
import type { ProgressSink } from '../types';
import { SolverError } from '../errors';
import { runScf, stabilityAnalysis, followInstability, type ScfProblem, type ScfResult, type SpinPair, type StabilityResult } from '../scf';
import { scfOptionsFor, judgeStability } from '../run/scfStage';
import type { ScfCandidate, ScfSolutionRecord, ScfReferenceName } from './types';

/** Two SCF energies closer than this (hartree) are one solution (common practice, no source). */
export const SAME_SOLUTION_HARTREE = 1e-8;

interface Trial {
  candidate: ScfCandidate;
  scf: ScfResult;
  analysis: StabilityResult | null;
}

/** Stable within its own kind: an RHF→UHF instability does not make RHF a wrong RHF solution. */
function ownKindStable(analysis: StabilityResult | null, reference: ScfReferenceName): boolean | null {
  if (!analysis || !analysis.analysed) return null;
  if (reference === 'RHF') return (analysis.rhfToRhf?.lowestEigenvalue ?? 0) >= -1e-6;
  return analysis.stable;
}

export interface ChosenScf {
  scf: ScfResult;
  stability: ScfSolutionRecord['stability'];
  warnings: string[];
  record: ScfSolutionRecord;
}

/**
 * The right SCF solution at one scan point. Several starts are converged — the neighbouring
 * point's orbitals (continuity along the curve), the run file's guess and the other built-in
 * guess, and for UHF a
 * spin-symmetry-broken guess (HOMO–LUMO mixing, so H2 can dissociate into two atoms) — each is
 * checked by the orbital-Hessian stability analysis (Seeger & Pople, J. Chem. Phys. 66, 3045
 * (1977)) and an instability of its own kind is followed down. The lowest stable solution is
 * kept; within 1e-8 Eh the neighbour's wins, so the curve stays on one solution.
 */
export function chooseScfSolution(
  problem: ScfProblem,
  runFile: RunFile,
  reference: ScfReferenceName,
  options: { neighbour?: SpinPair<Float64Array>; onProgress?: ProgressSink } = {},
): ChosenScf {
  const analyse = runFile.scf?.stability ?? true;
  const starts: { source: ScfCandidate['source']; initial?: SpinPair<Float64Array>; guess?: 'huckel' | 'core'; breakSymmetry: boolean }[] = [];
  if (options.neighbour && options.neighbour.alpha.length === problem.nBasis ** 2) {
    starts.push({ source: 'neighbour', initial: options.neighbour, breakSymmetry: false });
  }
  // Both guesses: on an atom the Hückel-like guess can land on an excited configuration (Li 1s²2p) where the core guess does not.
  const ownGuess = runFile.scf?.guess ?? 'huckel';
  starts.push({ source: ownGuess, guess: ownGuess, breakSymmetry: false });
  const otherGuess = ownGuess === 'huckel' ? 'core' : 'huckel';
  starts.push({ source: otherGuess, guess: otherGuess, breakSymmetry: false });
  if (reference === 'UHF' && problem.nAlpha >= 1 && problem.nAlpha < problem.nBasis) starts.push({ source: 'broken-symmetry', breakSymmetry: true });

  const trials: Trial[] = [];
  const failures: ScfCandidate[] = [];
  let lastError: unknown = null;
  for (const start of starts) {
    const scfOptions = {
      ...scfOptionsFor(runFile, reference, options.onProgress, start.initial),
      ...(start.guess ? { guess: start.guess } : {}),
      breakSymmetry: start.breakSymmetry,
    };
    let scf: ScfResult;
    try {
      scf = runScf(problem, scfOptions);
    } catch (error) {
      if (error instanceof SolverError && error.code === 'not-converged') {
        lastError = error;
        failures.push({ source: start.source, converged: false, energy: null, s2: null, stable: null, followed: false });
        continue;
      }
      throw error;
    }
    let analysis = analyse ? stabilityAnalysis(problem, scf) : null;
    let followed = false;
    const kind = analysis?.instability?.kind;
    if (analysis && (kind === 'rhf-to-rhf' || kind === 'uhf-to-uhf')) {
      // Follow only instabilities that keep the reference: RHF→UHF leaves RHF, and RHF is what this curve is.
      const next = followInstability(problem, scf, { ...scfOptionsFor(runFile, reference, options.onProgress), breakSymmetry: false });
      if (next.reference === reference && next.energyHartree < scf.energyHartree - SAME_SOLUTION_HARTREE) {
        scf = next;
        analysis = stabilityAnalysis(problem, scf);
        followed = true;
      }
    }
    trials.push({
      candidate: { source: start.source, converged: true, energy: scf.energyHartree, s2: scf.s2, stable: ownKindStable(analysis, reference), followed },
      scf,
      analysis,
    });
  }
  if (trials.length === 0) throw lastError;

  // Stable before unstable, then lowest energy; starts are in preference order, so ties keep the earlier one.
  let best = trials[0];
  for (const trial of trials.slice(1)) {
    const bestStable = best.candidate.stable !== false;
    const stable = trial.candidate.stable !== false;
    if (stable && !bestStable) best = trial;
    else if (stable === bestStable && trial.scf.energyHartree < best.scf.energyHartree - SAME_SOLUTION_HARTREE) best = trial;
  }

  const judged = best.analysis ? judgeStability(best.analysis, reference) : { stability: null, warnings: [] };
  const others = trials.filter((t) => t !== best);
  const spread = others.map((t) => t.scf.energyHartree - best.scf.energyHartree).filter((d) => d > SAME_SOLUTION_HARTREE);
  let reason = `${trials.length} of ${starts.length} starts converged`;
  reason += spread.length === 0 ? ', all to this solution' : `; the kept one lies ${Math.max(...spread).toExponential(2)} Eh below the highest`;
  reason += best.candidate.stable === null ? '; stability not analysed' : best.candidate.stable ? '; stable' : '; no stable solution found, the lowest is kept';
  if (best.candidate.followed) reason += '; reached by following an instability';

  const candidates = [...trials.map((t) => t.candidate), ...failures];
  return {
    scf: best.scf,
    stability: judged.stability,
    warnings: judged.warnings,
    record: {
      reference,
      energy: best.scf.energyHartree,
      s2: best.scf.s2,
      source: best.candidate.source,
      stability: judged.stability,
      candidates,
      reason,
      orbitals: {
        nBasis: problem.nBasis,
        alpha: Array.from(best.scf.coefficients.alpha),
        beta: Array.from(best.scf.coefficients.beta),
      },
    },
  };
}
