import { badInput } from '../errors';
import { symmetricEigen } from './denseAlgebra';

/** Below this overlap eigenvalue the basis is treated as linearly dependent (common practice, no source). */
export const LINEAR_DEPENDENCE_THRESHOLD = 1e-8;

/**
 * Symmetric (Löwdin) orthogonaliser X = S^{-1/2} = U s^{-1/2} Uᵀ
 * (Löwdin, J. Chem. Phys. 18, 365 (1950)). It keeps the orthogonal functions as close as
 * possible to the original ones, so DIIS errors expressed in that basis stay well scaled.
 * A near-singular S is a bad input rather than something to patch silently.
 */
export function symmetricOrthogonaliser(overlap: Float64Array, n: number): Float64Array {
  const { values, vectors } = symmetricEigen(overlap, n);
  if (n > 0 && values[0] < LINEAR_DEPENDENCE_THRESHOLD) {
    throw badInput(
      `basis is linearly dependent (smallest overlap eigenvalue ${values[0].toExponential(3)} < ${LINEAR_DEPENDENCE_THRESHOLD})`,
      'system.basis',
    );
  }
  const x = new Float64Array(n * n);
  for (let k = 0; k < n; k++) {
    const w = 1 / Math.sqrt(values[k]);
    for (let i = 0; i < n; i++) {
      const uik = vectors[i * n + k] * w;
      for (let j = 0; j < n; j++) x[i * n + j] += uik * vectors[j * n + k];
    }
  }
  return x;
}
