/**
 * Replacement lists of one spin's strings, computed once per space and kept as typed
 * arrays. Orbital pairs are coded pq = p·n + q for E_pq = a†_p a_q (p gains, q loses).
 *
 * Single replacements (diagonal p = q included): for every ordered pair of string
 * classes (source → target), ⟨I|E_pq|J⟩ = sign for target string I, source string J.
 * Two views of the same list: incoming per target string (CSR: start/source/pair/sign, each
 * target's entries in ascending pair order, which the symmetric sigma build relies on) and
 * grouped by orbital pair (pairStart/pairSource/pairTarget/pairSign).
 *
 * Same-spin replacements: every pair of strings I ≠ J in the set differing by one or two
 * orbitals, incoming per target I. For a single, I = sign · a†_a a_i J (orbitals [i, a, −1, −1]);
 * for a double, I = sign · a†_b a_j a†_a a_i J with i < j, a < b (orbitals [i, a, j, b]).
 * Local indices (positions inside the classes) are stored, not global ones.
 */
import { hasOrbital, replacementSign, withOrbital, withoutOrbital } from './bits';
import type { CiSpace } from './space';
import type { SpinStrings } from './spinStrings';

export interface SingleReplacementBlock {
  sourceClass: number;
  targetClass: number;
  start: Int32Array;
  source: Int32Array;
  pair: Int32Array;
  sign: Float64Array;
  pairStart: Int32Array;
  pairSource: Int32Array;
  pairTarget: Int32Array;
  pairSign: Float64Array;
}

export interface SameSpinBlock {
  sourceClass: number;
  targetClass: number;
  start: Int32Array;
  source: Int32Array;
  orbitals: Int32Array;
  sign: Float64Array;
}

export interface SpinReplacements {
  singles: SingleReplacementBlock[];
  sameSpin: SameSpinBlock[];
}

interface Pending {
  target: number[];
  source: number[];
  pair: number[];
  sign: number[];
}

function buildSingles(strings: SpinStrings, n: number): SingleReplacementBlock[] {
  const nClasses = strings.classes.length;
  const pending = new Map<number, Pending>();
  const ne = strings.nElectrons;
  for (let J = 0; J < strings.count; J++) {
    const pattern = strings.patterns[J];
    const cJ = strings.classOf[J];
    for (let x = 0; x < ne; x++) {
      const q = strings.occupations[J * ne + x];
      const removed = withoutOrbital(pattern, q);
      for (let p = 0; p < n; p++) {
        if (p !== q && hasOrbital(pattern, p)) continue;
        const I = p === q ? J : strings.lookup.get(withOrbital(removed, p));
        if (I === undefined) continue;
        const key = strings.classOf[I] * nClasses + cJ;
        let list = pending.get(key);
        if (!list) pending.set(key, (list = { target: [], source: [], pair: [], sign: [] }));
        list.target.push(strings.localIndex[I]);
        list.source.push(strings.localIndex[J]);
        list.pair.push(p * n + q);
        list.sign.push(p === q ? 1 : replacementSign(pattern, q, p));
      }
    }
  }
  const blocks: SingleReplacementBlock[] = [];
  for (const [key, list] of pending) {
    const targetClass = Math.floor(key / nClasses);
    const sourceClass = key - targetClass * nClasses;
    const nTarget = strings.classes[targetClass].count;
    const m = list.target.length;
    const start = countingSortStarts(list.target, nTarget);
    const source = new Int32Array(m);
    const pair = new Int32Array(m);
    const sign = new Float64Array(m);
    const fill = start.slice(0, nTarget);
    for (let e = 0; e < m; e++) {
      const slot = fill[list.target[e]]++;
      source[slot] = list.source[e];
      pair[slot] = list.pair[e];
      sign[slot] = list.sign[e];
    }
    sortRowsByPair(start, source, pair, sign, nTarget);
    const pairStart = countingSortStarts(list.pair, n * n);
    const pairSource = new Int32Array(m);
    const pairTarget = new Int32Array(m);
    const pairSign = new Float64Array(m);
    const pairFill = pairStart.slice(0, n * n);
    for (let e = 0; e < m; e++) {
      const slot = pairFill[list.pair[e]]++;
      pairSource[slot] = list.source[e];
      pairTarget[slot] = list.target[e];
      pairSign[slot] = list.sign[e];
    }
    blocks.push({ sourceClass, targetClass, start, source, pair, sign, pairStart, pairSource, pairTarget, pairSign });
  }
  return blocks;
}

/** Orders each target's incoming entries by ascending pair code (insertion sort; rows are short). */
function sortRowsByPair(start: Int32Array, source: Int32Array, pair: Int32Array, sign: Float64Array, rows: number): void {
  for (let row = 0; row < rows; row++) {
    for (let e = start[row] + 1; e < start[row + 1]; e++) {
      const p = pair[e];
      const so = source[e];
      const si = sign[e];
      let f = e - 1;
      while (f >= start[row] && pair[f] > p) {
        pair[f + 1] = pair[f];
        source[f + 1] = source[f];
        sign[f + 1] = sign[f];
        f--;
      }
      pair[f + 1] = p;
      source[f + 1] = so;
      sign[f + 1] = si;
    }
  }
}

/** CSR start offsets (length buckets+1) for the given bucket of each entry. */
function countingSortStarts(bucketOf: number[], buckets: number): Int32Array {
  const start = new Int32Array(buckets + 1);
  for (const b of bucketOf) start[b + 1]++;
  for (let b = 0; b < buckets; b++) start[b + 1] += start[b];
  return start;
}

function buildSameSpin(strings: SpinStrings, n: number): SameSpinBlock[] {
  const nClasses = strings.classes.length;
  const ne = strings.nElectrons;
  const pending = new Map<number, { target: number[]; source: number[]; orbitals: number[]; sign: number[] }>();
  const push = (I: number, J: number, i: number, a: number, j: number, b: number, sign: number): void => {
    const key = strings.classOf[I] * nClasses + strings.classOf[J];
    let list = pending.get(key);
    if (!list) pending.set(key, (list = { target: [], source: [], orbitals: [], sign: [] }));
    list.target.push(strings.localIndex[I]);
    list.source.push(strings.localIndex[J]);
    list.orbitals.push(i, a, j, b);
    list.sign.push(sign);
  };
  const empty: number[] = [];
  for (let I = 0; I < strings.count; I++) {
    const pattern = strings.patterns[I];
    const occ = Array.from(strings.occupations.subarray(I * ne, (I + 1) * ne));
    empty.length = 0;
    for (let p = 0; p < n; p++) if (!hasOrbital(pattern, p)) empty.push(p);
    // singles: I has a, J has i instead
    for (const a of occ) {
      const withoutA = withoutOrbital(pattern, a);
      for (const i of empty) {
        const Jpattern = withOrbital(withoutA, i);
        const J = strings.lookup.get(Jpattern);
        if (J !== undefined) push(I, J, i, a, -1, -1, replacementSign(Jpattern, i, a));
      }
    }
    // doubles: I has a < b, J has i < j instead
    for (let x = 0; x < occ.length; x++) {
      for (let y = x + 1; y < occ.length; y++) {
        const a = occ[x];
        const b = occ[y];
        const base = withoutOrbital(withoutOrbital(pattern, a), b);
        for (let u = 0; u < empty.length; u++) {
          for (let v = u + 1; v < empty.length; v++) {
            const i = empty[u];
            const j = empty[v];
            const Jpattern = withOrbital(withOrbital(base, i), j);
            const J = strings.lookup.get(Jpattern);
            if (J === undefined) continue;
            const middle = withOrbital(withoutOrbital(Jpattern, i), a);
            push(I, J, i, a, j, b, replacementSign(Jpattern, i, a) * replacementSign(middle, j, b));
          }
        }
      }
    }
  }
  const blocks: SameSpinBlock[] = [];
  for (const [key, list] of pending) {
    const targetClass = Math.floor(key / nClasses);
    const sourceClass = key - targetClass * nClasses;
    const nTarget = strings.classes[targetClass].count;
    const m = list.target.length;
    const start = countingSortStarts(list.target, nTarget);
    const source = new Int32Array(m);
    const orbitals = new Int32Array(4 * m);
    const sign = new Float64Array(m);
    const fill = start.slice(0, nTarget);
    for (let e = 0; e < m; e++) {
      const slot = fill[list.target[e]]++;
      source[slot] = list.source[e];
      for (let t = 0; t < 4; t++) orbitals[4 * slot + t] = list.orbitals[4 * e + t];
      sign[slot] = list.sign[e];
    }
    blocks.push({ sourceClass, targetClass, start, source, orbitals, sign });
  }
  return blocks;
}

/** The replacement lists of one spin of `space`, built on first use and cached. */
export function spinReplacements(space: CiSpace, spin: 'alpha' | 'beta'): SpinReplacements {
  const strings = spin === 'alpha' ? space.alpha : space.beta;
  let cached = space.cache.get(strings) as SpinReplacements | undefined;
  if (!cached) {
    cached = { singles: buildSingles(strings, space.nOrbitals), sameSpin: buildSameSpin(strings, space.nOrbitals) };
    space.cache.set(strings, cached);
  }
  return cached;
}
