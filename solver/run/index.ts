/**
 * One run, start to finish: system → basis and integrals → SCF → orbital selection →
 * orbital Hamiltonian → CI → properties → result. The worker and the CLI both call
 * `runCalculation`; nothing else in the product computes a number.
 */
export { runCalculation, type RunOptions } from './runCalculation';
export { estimateRun } from './estimateRun';
export type { RunResult, RunEstimate, RootResult, DeterminantEntry, ScfSummary } from './result';
