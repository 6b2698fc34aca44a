/**
 * Default sizes of the Davidson run, shared by the solver and the memory estimate.
 * The subspace holds at most max(12, 4·roots) vectors (never more than the space);
 * when it would grow past that it collapses to its lowest max(2·roots, M/2) Ritz vectors.
 */
export const DENSE_LIMIT_DETERMINANTS = 400;

export function defaultMaxSubspace(roots: number): number {
  return Math.max(12, 4 * roots);
}
