/**
 * The CI Hamiltonian as a dense row-major N·N matrix, element by element from
 * slaterCondonElement. Independent of the sigma build on purpose: it is the dense
 * solver's input and the tests' oracle. Only the upper triangle is evaluated and mirrored
 * (H is real symmetric).
 */
import type { OrbitalHamiltonian } from '../types';
import { slaterCondonElement } from './slaterCondon';
import { CiSpace, determinantPatterns } from './space';

export function denseHamiltonian(ham: OrbitalHamiltonian, space: CiSpace): Float64Array {
  const n = space.determinantCount;
  const dets = Array.from({ length: n }, (_, i) => determinantPatterns(space, i));
  const matrix = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) {
      const value = slaterCondonElement(ham, dets[i], dets[j]).value;
      matrix[i * n + j] = value;
      matrix[j * n + i] = value;
    }
  }
  return matrix;
}
