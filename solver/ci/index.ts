/** The CI engine's public surface. */
export { MAX_STRING_ORBITALS, occupationBitString } from './bits';
export type { CiSpaceSpec, RasSpec } from './spaceSpec';
export { buildCiSpace, determinantIndexOfPatterns, determinantPatterns } from './space';
export type { CiSpace, CiBlock } from './space';
export { estimateCiSpace, checkBudget } from './estimate';
export type { CiSpaceEstimate } from './estimate';
export { sigma, hamiltonianDiagonal } from './sigma';
export { slaterCondonElement } from './slaterCondon';
export type { Determinant, SlaterCondonElement, SlaterCondonTerm } from './slaterCondon';
export { denseHamiltonian } from './denseHamiltonian';
export { solveCi } from './solveCi';
export type { CiSolution, SolveCiOptions } from './solveCi';
export { leadingDeterminants } from './leadingDeterminants';
export type { LeadingDeterminant } from './leadingDeterminants';
export { spinSquared, oneParticleDensity, spinResolvedOneParticleDensity, twoParticleDensity } from './densities';
export { naturalOrbitals } from './naturalOrbitals';
export { spinCompleteWarning } from './spinCompleteness';
export { langhoffDavidson } from './langhoffDavidson';
