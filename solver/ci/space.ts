/**
 * The determinant space of a CI calculation, built from alpha and beta strings
 * grouped into classes (Olsen, Roos, Jørgensen & Jensen, J. Chem. Phys. 89, 2185 (1988);
 * Knowles & Handy, Chem. Phys. Lett. 111, 315 (1984)).
 *
 * Determinant order: the allowed blocks (alpha class, beta class) are laid out in
 * ascending alpha class, then ascending beta class (classes sorted by excitation, holes,
 * particles, irrep). Inside a block the determinants are alpha-major:
 * index = block.offset + ia·block.betaCount + ib, with ia, ib the strings' positions in
 * their classes. A determinant is the product alpha string × beta string, all alpha
 * creation operators to the left of all beta ones, each string in ascending orbital order.
 *
 * Limit: strings are bit patterns in doubles, so at most 52 correlated orbitals.
 */
import { lowestOrbitalsPattern } from './bits';
import { blockAllowed, CiSpaceSpec, classKeyCode, spinOrbitalRoles, validateSpec } from './spaceSpec';
import { assembleSpinStrings, enumerateCandidateStrings, SpinStrings } from './spinStrings';

export interface CiBlock {
  alphaClass: number;
  betaClass: number;
  /** Index of the block's first determinant. */
  offset: number;
  alphaCount: number;
  betaCount: number;
}

export interface CiSpace {
  spec: CiSpaceSpec;
  nOrbitals: number;
  nAlpha: number;
  nBeta: number;
  alpha: SpinStrings;
  beta: SpinStrings;
  blocks: CiBlock[];
  /** blockOf[alphaClass·nBetaClasses + betaClass] = block index, or −1 when not in the space. */
  blockOf: Int32Array;
  determinantCount: number;
  /** Index of the aufbau determinant, −1 when the space excludes it. */
  referenceIndex: number;
  /** Per-Hamiltonian precomputations (sigma plans), filled lazily. */
  cache: WeakMap<object, unknown>;
}

export function buildCiSpace(spec: CiSpaceSpec, orbitalIrreps?: Int32Array): CiSpace {
  validateSpec(spec, orbitalIrreps);
  const rawAlpha = enumerateCandidateStrings(spinOrbitalRoles(spec, 'alpha', orbitalIrreps));
  const rawBeta = enumerateCandidateStrings(spinOrbitalRoles(spec, 'beta', orbitalIrreps));
  const keysAlpha = uniqueKeys(rawAlpha.map((s) => s.key));
  const keysBeta = uniqueKeys(rawBeta.map((s) => s.key));
  const keepAlpha = new Set<number>();
  const keepBeta = new Set<number>();
  for (const a of keysAlpha) {
    for (const b of keysBeta) {
      if (blockAllowed(spec, a, b)) {
        keepAlpha.add(classKeyCode(a));
        keepBeta.add(classKeyCode(b));
      }
    }
  }
  const alpha = assembleSpinStrings(spec.nAlpha, rawAlpha, keepAlpha);
  const beta = assembleSpinStrings(spec.nBeta, rawBeta, keepBeta);
  const nBetaClasses = beta.classes.length;
  const blockOf = new Int32Array(alpha.classes.length * nBetaClasses).fill(-1);
  const blocks: CiBlock[] = [];
  let offset = 0;
  alpha.classes.forEach((a, ia) => {
    beta.classes.forEach((b, ib) => {
      if (!blockAllowed(spec, a, b)) return;
      blockOf[ia * nBetaClasses + ib] = blocks.length;
      blocks.push({ alphaClass: ia, betaClass: ib, offset, alphaCount: a.count, betaCount: b.count });
      offset += a.count * b.count;
    });
  });
  const space: CiSpace = {
    spec,
    nOrbitals: spec.nOrbitals,
    nAlpha: spec.nAlpha,
    nBeta: spec.nBeta,
    alpha,
    beta,
    blocks,
    blockOf,
    determinantCount: offset,
    referenceIndex: -1,
    cache: new WeakMap(),
  };
  space.referenceIndex = determinantIndexOfPatterns(space, lowestOrbitalsPattern(spec.nAlpha), lowestOrbitalsPattern(spec.nBeta));
  return space;
}

function uniqueKeys<T extends { excitation: number; holes: number; particles: number; irrep: number }>(keys: T[]): T[] {
  const map = new Map<number, T>();
  for (const k of keys) map.set(classKeyCode(k), k);
  return [...map.values()];
}

/** Block index of (alpha string class, beta string class), −1 when absent. */
export function blockIndexOf(space: CiSpace, alphaClass: number, betaClass: number): number {
  return space.blockOf[alphaClass * space.beta.classes.length + betaClass];
}

/** Determinant index from global alpha and beta string indices, −1 when not in the space. */
export function determinantIndex(space: CiSpace, alphaString: number, betaString: number): number {
  const b = blockIndexOf(space, space.alpha.classOf[alphaString], space.beta.classOf[betaString]);
  if (b < 0) return -1;
  const block = space.blocks[b];
  return block.offset + space.alpha.localIndex[alphaString] * block.betaCount + space.beta.localIndex[betaString];
}

/** Determinant index from occupation bit patterns, −1 when not in the space. */
export function determinantIndexOfPatterns(space: CiSpace, alphaPattern: number, betaPattern: number): number {
  const ia = space.alpha.lookup.get(alphaPattern);
  const ib = space.beta.lookup.get(betaPattern);
  if (ia === undefined || ib === undefined) return -1;
  return determinantIndex(space, ia, ib);
}

/** Global alpha and beta string indices of determinant `index`. */
export function determinantStrings(space: CiSpace, index: number): { alphaString: number; betaString: number } {
  let lo = 0;
  let hi = space.blocks.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (space.blocks[mid].offset <= index) lo = mid;
    else hi = mid - 1;
  }
  const block = space.blocks[lo];
  const local = index - block.offset;
  const ia = Math.floor(local / block.betaCount);
  const ib = local - ia * block.betaCount;
  return {
    alphaString: space.alpha.classes[block.alphaClass].start + ia,
    betaString: space.beta.classes[block.betaClass].start + ib,
  };
}

/** Occupation bit patterns { alpha, beta } of determinant `index`. */
export function determinantPatterns(space: CiSpace, index: number): { alpha: number; beta: number } {
  const { alphaString, betaString } = determinantStrings(space, index);
  return { alpha: space.alpha.patterns[alphaString], beta: space.beta.patterns[betaString] };
}
