import type { DeterminantWeight, PointMethodResult, ScanFlag } from './types';

/** Below this overlap of leading determinants a state has changed character (common practice, no source). */
export const CHARACTER_CHANGE_OVERLAP = 0.5;

/**
 * Σ_I |c_I c'_I| over the determinants two roots have in common among their leading ones.
 * Absolute values make it blind to the arbitrary sign of each MO at each geometry; it is 1 for
 * one state seen twice and near 0 for states of different character.
 */
export function characterOverlap(a: DeterminantWeight[], b: DeterminantWeight[]): number {
  const index = new Map(a.map((d) => [`${d.alpha}|${d.beta}`, Math.abs(d.coefficient)]));
  let sum = 0;
  for (const d of b) sum += (index.get(`${d.alpha}|${d.beta}`) ?? 0) * Math.abs(d.coefficient);
  return sum;
}

export interface FollowedStates {
  /** rootAtPoint[c][p]: which energy-ordered root curve c follows at point p (null: not among the roots, or no result). */
  rootAtPoint: (number | null)[][];
  /** The symmetry key each curve keeps: irrep (when known) and multiplicity. */
  irreps: (string | null)[];
  multiplicities: (number | null)[];
  flags: ScanFlag[];
}

/** Roots closer than this (hartree) are one degenerate level (common practice, no source). */
export const DEGENERATE_HARTREE = 1e-7;

function degenerateRoots(energies: number[]): Set<number> {
  const out = new Set<number>();
  for (let j = 0; j < energies.length; j++) {
    for (let k = j + 1; k < energies.length; k++) {
      if (Math.abs(energies[j] - energies[k]) < DEGENERATE_HARTREE) {
        out.add(j);
        out.add(k);
      }
    }
  }
  return out;
}

const describeKey = (key: string) => {
  const [irrep, multiplicity] = key.split('|');
  return irrep ? `${irrep}, multiplicity ${multiplicity}` : `multiplicity ${multiplicity}`;
};

const keyOf = (m: PointMethodResult, j: number) => `${m.irreps[j] ?? ''}|${m.multiplicities[j]}`;

/**
 * Follow the roots of one method along the scan. A state keeps its symmetry (irrep and
 * multiplicity): roots are matched to curves within each symmetry, so states of different
 * symmetry may cross and are flagged when they do. Within one symmetry the non-crossing rule
 * (von Neumann & Wigner, Phys. Z. 30, 467 (1929)) keeps energy order, and an exchange of
 * character between neighbours (overlap of leading determinants) is flagged as an avoided
 * crossing. Without irrep labels, roots of one multiplicity are matched by that overlap.
 */
export function followStates(results: (PointMethodResult | null)[], values: number[], methodIndex: number): FollowedStates {
  const first = results.findIndex((r) => r !== null);
  const nCurves = first >= 0 ? results[first]!.energies.length : 0;
  const rootAtPoint: (number | null)[][] = Array.from({ length: nCurves }, () => results.map(() => null as number | null));
  const flags: ScanFlag[] = [];
  if (first < 0) return { rootAtPoint, irreps: [], multiplicities: [], flags };
  const start = results[first]!;
  const keys = start.energies.map((_, c) => keyOf(start, c));
  const labelled = start.irreps.map((irrep) => irrep !== null);
  for (let c = 0; c < nCurves; c++) rootAtPoint[c][first] = c;

  if (nCurves === 1) {
    // One root asked for: the curve is the lowest root wherever it is computed, whatever its symmetry.
    results.forEach((r, p) => {
      if (r) rootAtPoint[0][p] = 0;
    });
    return { rootAtPoint, irreps: start.irreps.slice(0, 1), multiplicities: start.multiplicities.slice(0, 1), flags };
  }

  // Per pair of curves: the last point where they were apart, and on which side (a crossing
  // that lands exactly on a grid point shows as a sign change across that point).
  const lastApart = new Map<string, { p: number; d: number }>();
  // Per curve: the point whose character an exchange is measured against (reset at each exchange).
  const characterPoint = Array.from({ length: nCurves }, () => first);

  let prev = first;
  for (let p = first + 1; p < results.length; p++) {
    const now = results[p];
    if (!now) continue;
    const before = results[prev]!;
    const taken = new Set<number>();
    // Degenerate roots (a singlet and a triplet of two far-apart atoms) come out as arbitrary
    // mixtures whose symmetry and spin labels mean nothing: they are matched by energy below.
    const ambiguous = degenerateRoots(now.energies);
    for (const key of new Set(keys)) {
      const curves = keys.map((k, c) => (k === key ? c : -1)).filter((c) => c >= 0);
      const roots = now.energies.map((_, j) => j).filter((j) => !ambiguous.has(j) && keyOf(now, j) === key);
      if (labelled[curves[0]]) {
        curves.forEach((c, k) => {
          if (k < roots.length) rootAtPoint[c][p] = roots[k];
        });
      } else {
        // Greedy matching on the overlap of leading determinants, best pairs first.
        const pairs: { c: number; j: number; s: number }[] = [];
        for (const c of curves) {
          const was = rootAtPoint[c][prev];
          for (const j of roots) pairs.push({ c, j, s: was === null ? 0 : characterOverlap(before.leading[was], now.leading[j]) });
        }
        pairs.sort((a, b) => b.s - a.s || a.j - b.j);
        const done = new Set<number>();
        for (const { c, j } of pairs) {
          if (done.has(c) || taken.has(j)) continue;
          rootAtPoint[c][p] = j;
          done.add(c);
          taken.add(j);
        }
      }
    }
    // Curves left over take the degenerate roots nearest their previous energy.
    const claimed = new Set(rootAtPoint.map((r) => r[p]).filter((j): j is number => j !== null));
    const open = [...ambiguous].filter((j) => !claimed.has(j));
    const waiting = rootAtPoint.map((r, c) => c).filter((c) => rootAtPoint[c][p] === null && rootAtPoint[c][prev] !== null);
    const byDistance: { c: number; j: number; d: number }[] = [];
    for (const c of waiting) for (const j of open) byDistance.push({ c, j, d: Math.abs(now.energies[j] - before.energies[rootAtPoint[c][prev]!]) });
    byDistance.sort((a, b) => a.d - b.d || a.j - b.j);
    for (const { c, j } of byDistance) {
      if (rootAtPoint[c][p] !== null || claimed.has(j)) continue;
      rootAtPoint[c][p] = j;
      claimed.add(j);
    }

    for (let c = 0; c < nCurves; c++) {
      if (rootAtPoint[c][prev] !== null && rootAtPoint[c][p] === null) {
        flags.push({
          type: 'state-lost',
          between: [prev, p],
          methods: [methodIndex],
          curves: [c],
          message: `root ${c} of method ${methodIndex} (${describeKey(keys[c])}) is no longer among the computed roots; ask for more roots`,
        });
      }
    }
    for (let c1 = 0; c1 < nCurves; c1++) {
      for (let c2 = c1 + 1; c2 < nCurves; c2++) {
        const a1 = rootAtPoint[c1][p];
        const b1 = rootAtPoint[c2][p];
        if (a1 === null || b1 === null) continue;
        const pair = `${c1},${c2}`;
        const d1 = now.energies[a1] - now.energies[b1];
        const apart = lastApart.get(pair);
        if (Math.abs(d1) > DEGENERATE_HARTREE) {
          if (apart && Math.sign(apart.d) !== Math.sign(d1)) {
            const value = values[apart.p] + ((values[p] - values[apart.p]) * apart.d) / (apart.d - d1);
            flags.push({
              type: 'crossing',
              between: [apart.p, p],
              value,
              methods: [methodIndex],
              curves: [c1, c2],
              message: `states ${c1} (${describeKey(keys[c1])}) and ${c2} (${describeKey(keys[c2])}) of method ${methodIndex} cross near ${value.toPrecision(5)}`,
            });
          }
          lastApart.set(pair, { p, d: d1 });
        }
        const from = results[characterPoint[c1]]!;
        const a0 = rootAtPoint[c1][characterPoint[c1]];
        if (keys[c1] === keys[c2] && labelled[c1] && a0 !== null && !ambiguous.has(a1) && !ambiguous.has(b1)) {
          // Measured against the character at the last exchange, so one spread over several steps is still seen.
          const self = characterOverlap(from.leading[a0], now.leading[a1]);
          const swapped = characterOverlap(from.leading[a0], now.leading[b1]);
          if (self < CHARACTER_CHANGE_OVERLAP && swapped > self) {
            flags.push({
              type: 'avoided-crossing',
              between: [prev, p],
              methods: [methodIndex],
              curves: [c1, c2],
              message: `states ${c1} and ${c2} of method ${methodIndex} (same symmetry) exchange character between points ${prev} and ${p}: an avoided crossing`,
            });
            characterPoint[c1] = p;
            characterPoint[c2] = p;
          }
        }
      }
    }
    prev = p;
  }
  return {
    rootAtPoint,
    irreps: start.irreps.slice(0, nCurves),
    multiplicities: start.multiplicities.slice(0, nCurves),
    flags,
  };
}
