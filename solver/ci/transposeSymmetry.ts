/**
 * The Ms = 0 transpose symmetry of a CI space (Knowles & Handy, Chem. Phys. Lett. 111, 315
 * (1984); Olsen, Roos, Jørgensen & Jensen, J. Chem. Phys. 89, 2185 (1988)).
 *
 * With nα = nβ, identical alpha and beta string lists and a block structure symmetric under
 * α ↔ β (full CI, excitation levels, RAS and irrep filters all are), the map
 * T: C(Iα, Iβ) → C(Iβ, Iα) commutes with H in Ketbook's determinant convention (alpha
 * creators left of beta ones, a beta operator pair passing the alpha string with sign +1),
 * so every eigenvector has T c = ±c. Spin-adapted states obey C(Iα, Iβ) = (−1)^S C(Iβ, Iα)
 * (checked in tests/solver/ci/transpose.test.ts against dense eigenvectors and ⟨S²⟩).
 */
import type { CiSpace } from './space';
import { determinantIndex } from './space';

export type TransposeParity = 1 | -1;

const PERMUTATION_KEY = {};

/**
 * perm[i] = index of the determinant with alpha and beta strings swapped, or null when the
 * space has no transpose symmetry. Cached on the space.
 */
export function transposePermutation(space: CiSpace): Int32Array | null {
  const cached = space.cache.get(PERMUTATION_KEY) as Int32Array | null | undefined;
  if (cached !== undefined) return cached;
  const perm = buildPermutation(space);
  space.cache.set(PERMUTATION_KEY, perm);
  return perm;
}

function buildPermutation(space: CiSpace): Int32Array | null {
  const { alpha, beta } = space;
  if (space.nAlpha !== space.nBeta || alpha.count !== beta.count) return null;
  for (let i = 0; i < alpha.count; i++) if (alpha.patterns[i] !== beta.patterns[i] || alpha.classOf[i] !== beta.classOf[i]) return null;
  const perm = new Int32Array(space.determinantCount);
  for (const block of space.blocks) {
    const aStart = alpha.classes[block.alphaClass].start;
    const bStart = beta.classes[block.betaClass].start;
    for (let ia = 0; ia < block.alphaCount; ia++) {
      for (let ib = 0; ib < block.betaCount; ib++) {
        const j = determinantIndex(space, bStart + ib, aStart + ia);
        if (j < 0) return null;
        perm[block.offset + ia * block.betaCount + ib] = j;
      }
    }
  }
  return perm;
}

/** Transpose parity (−1)^S of states with total spin S = (multiplicity − 1)/2. */
export function parityOfMultiplicity(multiplicity: number): TransposeParity {
  return ((multiplicity - 1) / 2) % 2 === 0 ? 1 : -1;
}

/** v ← (v + parity·T v)/2, the projection onto one transpose sector. */
export function projectOntoParity(perm: Int32Array, v: Float64Array, parity: TransposeParity): void {
  for (let i = 0; i < perm.length; i++) {
    const j = perm[i];
    if (j < i) continue;
    if (j === i) {
      if (parity < 0) v[i] = 0;
      continue;
    }
    const a = v[i];
    const b = v[j];
    v[i] = 0.5 * (a + parity * b);
    v[j] = 0.5 * (b + parity * a);
  }
}

/** Dimension of one transpose sector: pairs plus (even sector only) the self-transposed determinants. */
export function sectorDimension(perm: Int32Array, parity: TransposeParity): number {
  let fixed = 0;
  for (let i = 0; i < perm.length; i++) if (perm[i] === i) fixed++;
  const pairs = (perm.length - fixed) / 2;
  return parity > 0 ? pairs + fixed : pairs;
}

/** v ← v + parity·T v in place (the last step of the symmetric sigma build). */
export function addTransposed(perm: Int32Array, v: Float64Array, parity: TransposeParity): void {
  for (let i = 0; i < perm.length; i++) {
    const j = perm[i];
    if (j < i) continue;
    if (j === i) {
      v[i] *= 1 + parity;
      continue;
    }
    const a = v[i];
    const b = v[j];
    v[i] = a + parity * b;
    v[j] = b + parity * a;
  }
}
