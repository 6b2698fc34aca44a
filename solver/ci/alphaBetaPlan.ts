/**
 * The layout of the alpha–beta part of the sigma build (see sigma.ts), computed once per
 * Hamiltonian and space.
 *
 * The alpha single-replacement blocks (one per source → target string class pair) are merged
 * into groups: every block of a group couples with exactly the same beta single-replacement
 * blocks (for each beta block both determinant blocks exist). Inside a group the entries are
 * sorted by orbital pair pq, so that for one pq all alpha replacements of the group form one
 * gathered matrix, whatever class they start from. In full CI every alpha block couples with
 * every beta block, there is a single group, and the gathered matrices are as tall as they can
 * be (C(n−2, nα−1) rows for p ≠ q): long contiguous inner loops, and each vector row is gathered
 * once per pq and beta source class instead of once per (alpha block, beta block) pair. This is
 * the α/β blocking of Olsen, Roos, Jørgensen & Jensen, J. Chem. Phys. 89, 2185 (1988), §III.
 *
 * activePairs marks, per beta block and pq, whether any of that block's pairs rs has a
 * non-zero (pq|rs): spatial symmetry (and the sparsity of model Hamiltonians) then removes
 * whole gathers. Bit 1: some rs; bit 2: some rs ≤ pq (what the transpose-symmetric build uses).
 */
import type { SingleReplacementBlock } from './replacements';
import type { CiSpace } from './space';

export interface AlphaBetaGroup {
  /** Indices of the beta single-replacement blocks that couple with every member. */
  betaBlocks: Int32Array;
  /** Distinct source classes of those beta blocks. */
  betaSources: Int32Array;
  /** Distinct target classes of those beta blocks. */
  betaTargets: Int32Array;
  /** Entries of pair pq at [pairStart[pq], pairStart[pq+1]). */
  pairStart: Int32Array;
  sign: Float64Array;
  /**
   * Offset of the source row in c for every entry and beta source class:
   * sourceRow[s·entries + e] = block(source class, betaSources[s]).offset + local source · nβ(class).
   */
  sourceRow: Int32Array;
  /** The same for the target row in σ and every beta target class. */
  targetRow: Int32Array;
  /** Position of each class of betaSources / betaTargets in those lists, −1 when absent. */
  sourcePosition: Int32Array;
  targetPosition: Int32Array;
  entries: number;
  /** Largest number of entries of one pair. */
  maxPerPair: number;
}

export interface AlphaBetaPlan {
  groups: AlphaBetaGroup[];
  /** activePairs[betaBlock·n² + pq]: bit 1 any non-zero (pq|rs), bit 2 one with rs ≤ pq. */
  activePairs: Uint8Array;
}

export function alphaBetaPlan(
  space: CiSpace,
  alphaSingles: SingleReplacementBlock[],
  betaSingles: SingleReplacementBlock[],
  eri4: Float64Array,
  n: number,
): AlphaBetaPlan {
  const n2 = n * n;
  const nBetaClasses = space.beta.classes.length;
  const blockAt = (ac: number, bc: number): number => space.blockOf[ac * nBetaClasses + bc];

  const activePairs = new Uint8Array(betaSingles.length * n2);
  betaSingles.forEach((B, bi) => {
    const present: number[] = [];
    for (let rs = 0; rs < n2; rs++) if (B.pairStart[rs + 1] > B.pairStart[rs]) present.push(rs);
    for (let pq = 0; pq < n2; pq++) {
      let flags = 0;
      for (const rs of present) {
        if (eri4[pq * n2 + rs] === 0) continue;
        flags |= 1;
        if (rs <= pq) flags |= 2;
        if (flags === 3) break;
      }
      activePairs[bi * n2 + pq] = flags;
    }
  });

  // group the alpha blocks by the beta blocks they couple with
  const byKey = new Map<string, number[]>();
  alphaSingles.forEach((A, ai) => {
    const partners: number[] = [];
    betaSingles.forEach((B, bi) => {
      if (blockAt(A.targetClass, B.targetClass) >= 0 && blockAt(A.sourceClass, B.sourceClass) >= 0) partners.push(bi);
    });
    if (partners.length === 0) return;
    const key = partners.join(',');
    let members = byKey.get(key);
    if (!members) byKey.set(key, (members = []));
    members.push(ai);
  });

  const groups: AlphaBetaGroup[] = [];
  for (const [key, members] of byKey) {
    const betaBlocks = Int32Array.from(key.split(','), Number);
    const betaSources = Int32Array.from(new Set(Array.from(betaBlocks, (b) => betaSingles[b].sourceClass)));
    const betaTargets = Int32Array.from(new Set(Array.from(betaBlocks, (b) => betaSingles[b].targetClass)));
    const sourcePosition = new Int32Array(nBetaClasses).fill(-1);
    const targetPosition = new Int32Array(nBetaClasses).fill(-1);
    betaSources.forEach((c, s) => (sourcePosition[c] = s));
    betaTargets.forEach((c, t) => (targetPosition[c] = t));

    const pairStart = new Int32Array(n2 + 1);
    for (const ai of members) {
      const A = alphaSingles[ai];
      for (let pq = 0; pq < n2; pq++) pairStart[pq + 1] += A.pairStart[pq + 1] - A.pairStart[pq];
    }
    for (let pq = 0; pq < n2; pq++) pairStart[pq + 1] += pairStart[pq];
    const entries = pairStart[n2];
    let maxPerPair = 0;
    for (let pq = 0; pq < n2; pq++) maxPerPair = Math.max(maxPerPair, pairStart[pq + 1] - pairStart[pq]);
    const sign = new Float64Array(entries);
    const sourceRow = new Int32Array(entries * betaSources.length);
    const targetRow = new Int32Array(entries * betaTargets.length);
    const fill = pairStart.slice(0, n2);
    for (const ai of members) {
      const A = alphaSingles[ai];
      for (let pq = 0; pq < n2; pq++) {
        for (let k = A.pairStart[pq]; k < A.pairStart[pq + 1]; k++) {
          const e = fill[pq]++;
          sign[e] = A.pairSign[k];
          betaSources.forEach((bc, s) => {
            const block = space.blocks[blockAt(A.sourceClass, bc)];
            sourceRow[s * entries + e] = block.offset + A.pairSource[k] * block.betaCount;
          });
          betaTargets.forEach((bc, t) => {
            const block = space.blocks[blockAt(A.targetClass, bc)];
            targetRow[t * entries + e] = block.offset + A.pairTarget[k] * block.betaCount;
          });
        }
      }
    }
    groups.push({ betaBlocks, betaSources, betaTargets, pairStart, sign, sourceRow, targetRow, sourcePosition, targetPosition, entries, maxPerPair });
  }
  return { groups, activePairs };
}
