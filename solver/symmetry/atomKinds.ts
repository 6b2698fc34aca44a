import type { Molecule } from '../types';

/**
 * Atoms that a symmetry operation may exchange share a kind: same element, same nuclear
 * charge, and both real or both ghost. A ghost is its own kind, so a ghost atom breaks the
 * symmetry exactly as a real atom at that place would — its basis functions have to map too.
 */
export function atomKinds(molecule: Molecule): Int32Array {
  const ids = new Map<string, number>();
  const kinds = new Int32Array(molecule.atoms.length);
  molecule.atoms.forEach((atom, a) => {
    const key = `${atom.ghost ? 'ghost ' : ''}${atom.symbol}/${atom.atomicNumber}`;
    if (!ids.has(key)) ids.set(key, ids.size);
    kinds[a] = ids.get(key)!;
  });
  return kinds;
}
