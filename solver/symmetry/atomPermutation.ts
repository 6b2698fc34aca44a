import type { Molecule } from '../types';
import type { SymmetryOperation } from './operations';
import { atomKinds } from './atomKinds';

/**
 * Where a 3×3 orthogonal map sends each atom: permutation[a] = b when M·r_a lies within
 * `toleranceBohr` of r_b and atoms a and b are of the same kind, or null when some atom has no
 * image (M is then not a symmetry operation). `positions` holds x, y, z of each atom.
 */
export function permutationUnderMap(
  positions: Float64Array,
  kinds: Int32Array,
  matrix: readonly (readonly number[])[],
  toleranceBohr: number,
): Int32Array | null {
  const n = kinds.length;
  const permutation = new Int32Array(n).fill(-1);
  const taken = new Uint8Array(n);
  const tol2 = toleranceBohr * toleranceBohr;
  const [m0, m1, m2] = matrix;
  for (let a = 0; a < n; a++) {
    const x = positions[3 * a];
    const y = positions[3 * a + 1];
    const z = positions[3 * a + 2];
    const px = m0[0] * x + m0[1] * y + m0[2] * z;
    const py = m1[0] * x + m1[1] * y + m1[2] * z;
    const pz = m2[0] * x + m2[1] * y + m2[2] * z;
    let found = -1;
    for (let b = 0; b < n; b++) {
      if (taken[b] || kinds[b] !== kinds[a]) continue;
      const dx = positions[3 * b] - px;
      const dy = positions[3 * b + 1] - py;
      const dz = positions[3 * b + 2] - pz;
      if (dx * dx + dy * dy + dz * dz <= tol2) {
        found = b;
        break;
      }
    }
    if (found < 0) return null;
    permutation[a] = found;
    taken[found] = 1;
  }
  return permutation;
}

/**
 * The atom permutation of a D2h operation for a molecule already in its symmetry frame
 * (the operation is then the sign pattern op.signs on x, y, z), or null if `op` is not a
 * symmetry of the molecule.
 */
export function atomPermutation(molecule: Molecule, op: SymmetryOperation, toleranceBohr = 1e-6): Int32Array | null {
  const positions = new Float64Array(3 * molecule.atoms.length);
  molecule.atoms.forEach((atom, a) => positions.set(atom.positionBohr, 3 * a));
  const [sx, sy, sz] = op.signs;
  const matrix = [
    [sx, 0, 0],
    [0, sy, 0],
    [0, 0, sz],
  ];
  return permutationUnderMap(positions, atomKinds(molecule), matrix, toleranceBohr);
}
