import type { Molecule } from '../types';

/** Nuclear charge an atom contributes: ghosts carry basis functions but no nucleus. */
export function nuclearCharge(atom: Molecule['atoms'][number]): number {
  return atom.ghost ? 0 : atom.atomicNumber;
}

/**
 * Mulliken atomic charges q_A = Z_A − Σ_{μ∈A} (P S)_μμ with P the total (α+β) density
 * (Mulliken, J. Chem. Phys. 23, 1833 (1955)). The charges sum to the molecular charge
 * because tr(P S) is the electron count.
 */
export function mullikenCharges(
  densityTotal: Float64Array,
  overlap: Float64Array,
  functionAtom: Int32Array | readonly number[],
  molecule: Molecule,
): number[] {
  const n = functionAtom.length;
  const charges = molecule.atoms.map(nuclearCharge);
  for (let mu = 0; mu < n; mu++) {
    let population = 0;
    for (let nu = 0; nu < n; nu++) population += densityTotal[mu * n + nu] * overlap[nu * n + mu];
    charges[functionAtom[mu]] -= population;
  }
  return charges;
}
