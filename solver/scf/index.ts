export { runScf } from './runScf';
export { stabilityAnalysis, followInstability } from './stability';
export type { StabilityResult, StabilityInstability } from './stability';
export { symmetricOrthogonaliser, LINEAR_DEPENDENCE_THRESHOLD } from './orthogonaliser';
export { HUCKEL_K, type GuessKind } from './initialGuess';
export type { ScfProblem, ScfOptions, ScfResult, ScfIteration, ScfProgress, ScfReference, SpinPair } from './scfTypes';
