/**
 * Occupation strings as plain JavaScript numbers used as bitsets: bit p set means spatial
 * orbital p holds an electron of the string's spin. Doubles represent every integer below
 * 2^53 exactly, so up to MAX_STRING_ORBITALS = 52 orbitals fit; setting or clearing a bit is
 * an exact addition or subtraction of 2^p. The 32-bit operators (&, >>>) are only applied to
 * the low and high 32-bit halves separately, which keeps them correct above 32 orbitals.
 */

export const MAX_STRING_ORBITALS = 52;

const TWO_POW_32 = 4294967296;

/** 2^p for p = 0 … 52, exact. */
export const ORBITAL_BIT: Float64Array = (() => {
  const bits = new Float64Array(MAX_STRING_ORBITALS + 1);
  for (let p = 0; p <= MAX_STRING_ORBITALS; p++) bits[p] = 2 ** p;
  return bits;
})();

export function hasOrbital(pattern: number, p: number): boolean {
  if (p < 32) return ((pattern % TWO_POW_32) >>> p) % 2 === 1;
  return ((Math.floor(pattern / TWO_POW_32) >>> (p - 32)) & 1) === 1;
}

export function withOrbital(pattern: number, p: number): number {
  return pattern + ORBITAL_BIT[p];
}

export function withoutOrbital(pattern: number, p: number): number {
  return pattern - ORBITAL_BIT[p];
}

/** Pattern with orbitals 0 … count−1 occupied (the aufbau string). */
export function lowestOrbitalsPattern(count: number): number {
  return ORBITAL_BIT[count] - 1;
}

/** Occupied orbitals in ascending order. */
export function occupiedOrbitals(pattern: number, nOrbitals: number): number[] {
  const list: number[] = [];
  for (let p = 0; p < nOrbitals; p++) if (hasOrbital(pattern, p)) list.push(p);
  return list;
}

export function patternFromOrbitals(orbitals: readonly number[]): number {
  let pattern = 0;
  for (const p of orbitals) pattern += ORBITAL_BIT[p];
  return pattern;
}

export function countOccupied(pattern: number, nOrbitals: number): number {
  let count = 0;
  for (let p = 0; p < nOrbitals; p++) if (hasOrbital(pattern, p)) count++;
  return count;
}

/**
 * Ketbook's occupation notation: one character per orbital, orbital 0 first,
 * "1" occupied and "0" empty, e.g. "1100" for the two lowest of four orbitals.
 */
export function occupationBitString(pattern: number, nOrbitals: number): string {
  let text = '';
  for (let p = 0; p < nOrbitals; p++) text += hasOrbital(pattern, p) ? '1' : '0';
  return text;
}

/**
 * Fermionic sign of a†_to a_from acting on a string (from occupied, to empty, to ≠ from):
 * (−1) to the number of occupied orbitals strictly between the two, with orbitals
 * ordered ascending in the creation-operator product (common practice, no source).
 */
export function replacementSign(pattern: number, from: number, to: number): number {
  const low = from < to ? from : to;
  const high = from < to ? to : from;
  let between = 0;
  for (let p = low + 1; p < high; p++) if (hasOrbital(pattern, p)) between++;
  return between % 2 === 0 ? 1 : -1;
}
