/**
 * Natural orbitals: eigenvectors of the spin-summed one-particle density γ (Löwdin,
 * Phys. Rev. 97, 1474 (1955)). Occupations descend; vectors are row-major n·n with
 * natural orbital k in column k: vectors[p·n + k] = coefficient of orbital p.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { badInput } from '../errors';

export function naturalOrbitals(gamma: Float64Array): { occupations: Float64Array; vectors: Float64Array } {
  const n = Math.round(Math.sqrt(gamma.length));
  if (n * n !== gamma.length) throw badInput('naturalOrbitals needs a square n·n density matrix');
  const rows = Array.from({ length: n }, (_, p) => Array.from({ length: n }, (_, q) => 0.5 * (gamma[p * n + q] + gamma[q * n + p])));
  const eig = new EigenvalueDecomposition(new Matrix(rows), { assumeSymmetric: true });
  const values = eig.realEigenvalues;
  const order = values.map((_, i) => i).sort((a, b) => values[b] - values[a]);
  const occupations = new Float64Array(n);
  const vectors = new Float64Array(n * n);
  order.forEach((col, k) => {
    occupations[k] = values[col];
    for (let p = 0; p < n; p++) vectors[p * n + k] = eig.eigenvectorMatrix.get(p, col);
  });
  return { occupations, vectors };
}
