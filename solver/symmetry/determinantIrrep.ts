/**
 * The irrep of a Slater determinant is the direct product of the irreps of its occupied spin
 * orbitals; in an abelian group that is the XOR of their integers (a doubly occupied orbital
 * cancels). When the CI space is built from symmetry-adapted orbitals, the Hamiltonian does not
 * couple determinants of different irreps, so every CI root lies in one irrep and has the irrep
 * of any determinant with a non-zero coefficient in it — hence no separate root classifier:
 * `rootIrrep` of a root's leading determinant is the root's irrep.
 *
 * An occupation string may be given as a bit pattern (bit p set = orbital p occupied, as a number
 * below 2^53 or a bigint) or in Ketbook's occupation notation ("1100": orbital 0 first).
 */
export type OccupationString = number | bigint | string;

function occupiedIrrepXor(orbitalIrreps: ArrayLike<number>, occupation: OccupationString): number {
  let x = 0;
  if (typeof occupation === 'string') {
    for (let p = 0; p < occupation.length; p++) {
      if (occupation[p] === '1') {
        if (p >= orbitalIrreps.length) throw new RangeError(`orbital ${p} has no irrep`);
        x ^= orbitalIrreps[p];
      }
    }
    return x;
  }
  let rest = BigInt(occupation);
  if (rest < 0n) throw new RangeError('an occupation pattern cannot be negative');
  for (let p = 0; rest > 0n; p++, rest >>= 1n) {
    if (rest & 1n) {
      if (p >= orbitalIrreps.length) throw new RangeError(`orbital ${p} has no irrep`);
      x ^= orbitalIrreps[p];
    }
  }
  return x;
}

/** Irrep integer of the determinant with α string `alphaBits` and β string `betaBits`. */
export function determinantIrrep(orbitalIrreps: ArrayLike<number>, alphaBits: OccupationString, betaBits: OccupationString): number {
  return occupiedIrrepXor(orbitalIrreps, alphaBits) ^ occupiedIrrepXor(orbitalIrreps, betaBits);
}

/** Irrep integer of a CI root of a symmetry-adapted space, from any of its determinants. */
export function rootIrrep(orbitalIrreps: ArrayLike<number>, determinant: { alpha: OccupationString; beta: OccupationString }): number {
  return determinantIrrep(orbitalIrreps, determinant.alpha, determinant.beta);
}
