/**
 * Direct, string-driven action of the CI Hamiltonian on a vector, σ = H·c, without ever
 * storing H (Knowles & Handy, Chem. Phys. Lett. 111, 315 (1984); Olsen, Roos, Jørgensen &
 * Jensen, J. Chem. Phys. 89, 2185 (1988)). H includes coreEnergy, so σ = H c exactly.
 *
 * H = E_core + H_αα + H_ββ + H_αβ with
 *   H_αα, H_ββ  – the one- and two-electron terms within one spin: a sparse string
 *                 Hamiltonian over single and double replacements of that spin's strings
 *                 plus each string's diagonal (sigmaPlan.ts);
 *   H_αβ        – Σ_pqrs (pq|rs) E^α_pq E^β_rs, done as (single alpha replacement) ×
 *                 (single beta replacement) loops, diagonal replacements p = q included so
 *                 that the alpha–beta Coulomb energy of the diagonal comes out too.
 * A beta excitation operator is a pair of beta operators, which passes the alpha string
 * with sign (+1), so the phase of each term is the product of the two strings' phases.
 *
 * The beta–beta part works on a beta-major copy of the vector and the alpha–beta part on
 * gathered rows (see below), so every inner loop runs over contiguous memory. (Measured
 * alternatives that were slower in V8: gathering from / scattering into beta-major copies,
 * and sparse dot products over rows of c without gathering.)
 *
 * For a vector of definite transpose parity (nα = nβ, SigmaOptions.transposeParity) the
 * beta–beta part and half of the alpha–beta part follow from the rest by transposition.
 */
import { badInput } from '../errors';
import type { OrbitalHamiltonian } from '../types';
import type { SingleReplacementBlock } from './replacements';
import { sigmaPlan, SigmaPlan } from './sigmaPlan';
import { blockIndexOf, CiSpace } from './space';
import { addTransposed, transposePermutation, TransposeParity } from './transposeSymmetry';

function checkLengths(space: CiSpace, ...vectors: Float64Array[]): void {
  for (const v of vectors) {
    if (v.length !== space.determinantCount) throw badInput(`vector length ${v.length} differs from the space size ${space.determinantCount}`);
  }
}

export interface SigmaOptions {
  /**
   * The input obeys T c = parity·c (see transposeSymmetry.ts); the build then uses the
   * Ms = 0 transpose symmetry. With W = ½E_core + D_α + H_αα + Σ_{pq>rs}(pq|rs)E^α_pq E^β_rs
   * + ½Σ_{pq}(pq|pq)E^α_pq E^β_pq (pair codes compared), T H_αα T = H_ββ and
   * (pq|rs) = (rs|pq) give H c = W c + parity·T(W c): no beta–beta part and half the
   * alpha–beta work. Throws when the space has no transpose symmetry. The result for an
   * input of mixed parity is meaningless.
   */
  transposeParity?: TransposeParity;
}

export function sigma(ham: OrbitalHamiltonian, space: CiSpace, c: Float64Array, out: Float64Array, options: SigmaOptions = {}): void {
  checkLengths(space, c, out);
  if (c === out) throw badInput('sigma needs distinct input and output vectors');
  const plan = sigmaPlan(ham, space);
  const parity = options.transposeParity;
  if (parity !== undefined) {
    const perm = transposePermutation(space);
    if (!perm) throw badInput('this CI space has no alpha–beta transpose symmetry (it needs nα = nβ and a symmetric space)');
    sigmaDiagonalPart(0.5 * ham.coreEnergy, plan, space, c, out, false);
    sigmaAlphaAlpha(plan, space, c, out);
    sigmaAlphaBeta(plan, space, c, out, true);
    addTransposed(perm, out, parity);
    return;
  }
  sigmaDiagonalPart(ham.coreEnergy, plan, space, c, out, true);
  sigmaAlphaAlpha(plan, space, c, out);
  sigmaBetaBeta(plan, space, c, out);
  sigmaAlphaBeta(plan, space, c, out, false);
}

/** Core energy plus each string's same-spin diagonal energy (beta strings' only when withBeta). */
function sigmaDiagonalPart(coreEnergy: number, plan: SigmaPlan, space: CiSpace, c: Float64Array, out: Float64Array, withBeta: boolean): void {
  const alphaClasses = space.alpha.classes;
  const betaClasses = space.beta.classes;
  for (const block of space.blocks) {
    const aStart = alphaClasses[block.alphaClass].start;
    const bStart = betaClasses[block.betaClass].start;
    const nB = block.betaCount;
    for (let ia = 0; ia < block.alphaCount; ia++) {
      const ea = coreEnergy + plan.alpha.diagonal[aStart + ia];
      const row = block.offset + ia * nB;
      if (withBeta) for (let ib = 0; ib < nB; ib++) out[row + ib] = (ea + plan.beta.diagonal[bStart + ib]) * c[row + ib];
      else for (let ib = 0; ib < nB; ib++) out[row + ib] = ea * c[row + ib];
    }
  }
}

/** Alpha–alpha couplings: whole beta rows move together. */
function sigmaAlphaAlpha(plan: SigmaPlan, space: CiSpace, c: Float64Array, out: Float64Array): void {
  const alphaClasses = space.alpha.classes;
  const betaClasses = space.beta.classes;
  plan.alpha.replacements.sameSpin.forEach((list, li) => {
    const values = plan.alpha.sameSpinValues[li];
    for (let bc = 0; bc < betaClasses.length; bc++) {
      const bI = blockIndexOf(space, list.targetClass, bc);
      const bJ = blockIndexOf(space, list.sourceClass, bc);
      if (bI < 0 || bJ < 0) continue;
      const offI = space.blocks[bI].offset;
      const offJ = space.blocks[bJ].offset;
      const nB = betaClasses[bc].count;
      const nTarget = alphaClasses[list.targetClass].count;
      for (let ia = 0; ia < nTarget; ia++) {
        const outRow = offI + ia * nB;
        for (let e = list.start[ia]; e < list.start[ia + 1]; e++) {
          const v = values[e];
          const cRow = offJ + list.source[e] * nB;
          axpy(out, outRow, v, c, cRow, nB);
        }
      }
    }
  });
}

/** Beta–beta couplings, on a beta-major (transposed) copy so that whole alpha columns move together. */
function sigmaBetaBeta(plan: SigmaPlan, space: CiSpace, c: Float64Array, out: Float64Array): void {
  if (plan.beta.replacements.sameSpin.length === 0) return;
  const alphaClasses = space.alpha.classes;
  const betaClasses = space.beta.classes;
  const cT = scratchVector(plan, 'transposedInput', space.determinantCount);
  const outT = scratchVector(plan, 'transposedOutput', space.determinantCount);
  transposeBlocks(space, c, cT, false);
  outT.fill(0);
  plan.beta.replacements.sameSpin.forEach((list, li) => {
    const values = plan.beta.sameSpinValues[li];
    const nTarget = betaClasses[list.targetClass].count;
    for (let ac = 0; ac < alphaClasses.length; ac++) {
      const bI = blockIndexOf(space, ac, list.targetClass);
      const bJ = blockIndexOf(space, ac, list.sourceClass);
      if (bI < 0 || bJ < 0) continue;
      const offI = space.blocks[bI].offset;
      const offJ = space.blocks[bJ].offset;
      const nA = alphaClasses[ac].count;
      for (let ib = 0; ib < nTarget; ib++) {
        const outCol = offI + ib * nA;
        for (let e = list.start[ib]; e < list.start[ib + 1]; e++) {
          const v = values[e];
          const cCol = offJ + list.source[e] * nA;
          axpy(outT, outCol, v, cT, cCol, nA);
        }
      }
    }
  });
  transposeBlocks(space, outT, out, true);
}

/**
 * Alpha–beta couplings. For one orbital pair pq the alpha replacements J→I of a group
 * (alphaBetaPlan.ts) form the rows of a dense gathered matrix, one column per beta string;
 * the beta operator M_pq = Σ_rs (pq|rs) E^β_rs acts on it as a sparse matrix, with the
 * contiguous inner loop running over the gathered rows. Each beta source class is gathered
 * and each beta target class scattered once per pq, whatever number of beta blocks use it,
 * and a pq none of whose integrals with the group's beta pairs is non-zero costs nothing.
 */
/** Rows of one gathered pass: about a hundred rows × a few hundred beta strings stay in a core's cache. */
const ROW_CHUNK = 128;

function sigmaAlphaBeta(plan: SigmaPlan, space: CiSpace, c: Float64Array, out: Float64Array, lowerTriangle: boolean): void {
  const { n, eri4 } = plan;
  const n2 = n * n;
  const { groups, activePairs } = plan.alphaBeta;
  const betaSingles = plan.beta.replacements.singles;
  const betaClasses = space.beta.classes;
  const nBetaStrings = space.beta.count;
  const flag = lowerTriangle ? 2 : 1;
  for (const group of groups) {
    const rows = Math.min(ROW_CHUNK, group.maxPerPair);
    const gathered = scratchVector(plan, 'gathered', rows * nBetaStrings);
    const result = scratchVector(plan, 'result', rows * nBetaStrings);
    const { betaBlocks, betaSources, betaTargets, sourcePosition, targetPosition, pairStart, sign, sourceRow, targetRow, entries } = group;
    const needSource = new Uint8Array(betaSources.length);
    const touchTarget = new Uint8Array(betaTargets.length);
    for (let pq = 0; pq < n2; pq++) {
      const pqStart = pairStart[pq];
      const pqEnd = pairStart[pq + 1];
      if (pqEnd === pqStart) continue;
      let active = false;
      for (let b = 0; b < betaBlocks.length; b++) {
        if ((activePairs[betaBlocks[b] * n2 + pq] & flag) !== 0) active = true;
      }
      if (!active) continue;
      // equal chunks of at most ROW_CHUNK rows keep the gathered and result matrices of one pass in cache
      const chunk = Math.ceil((pqEnd - pqStart) / Math.ceil((pqEnd - pqStart) / ROW_CHUNK));
      for (let e0 = pqStart; e0 < pqEnd; e0 += chunk) {
        const nE = Math.min(chunk, pqEnd - e0);
        for (let b = 0; b < betaBlocks.length; b++) {
          const bi = betaBlocks[b];
          if ((activePairs[bi * n2 + pq] & flag) === 0) continue;
          const B = betaSingles[bi];
          needSource[sourcePosition[B.sourceClass]] = 1;
          touchTarget[targetPosition[B.targetClass]] = 1;
        }
        // gathered[(beta string)·nE + e] = sign_e · c(source row of e, beta string)
        for (let s = 0; s < betaSources.length; s++) {
          if (!needSource[s]) continue;
          needSource[s] = 0;
          const cls = betaClasses[betaSources[s]];
          const nB = cls.count;
          const gBase = cls.start * nE;
          const rowBase = s * entries + e0;
          for (let e = 0; e < nE; e++) {
            const sa = sign[e0 + e];
            const cRow = sourceRow[rowBase + e];
            for (let jb = 0, g = gBase + e; jb < nB; jb++, g += nE) gathered[g] = sa * c[cRow + jb];
          }
        }
        for (let t = 0; t < betaTargets.length; t++) {
          if (!touchTarget[t]) continue;
          const cls = betaClasses[betaTargets[t]];
          result.fill(0, cls.start * nE, (cls.start + cls.count) * nE);
        }
        for (let b = 0; b < betaBlocks.length; b++) {
          const bi = betaBlocks[b];
          if ((activePairs[bi * n2 + pq] & flag) === 0) continue;
          const B = betaSingles[bi];
          const gOff = betaClasses[B.sourceClass].start * nE;
          const rOff = betaClasses[B.targetClass].start * nE;
          applyBetaBlock(B, betaClasses[B.targetClass].count, eri4, pq * n2, pq, lowerTriangle, gathered, gOff, result, rOff, nE);
        }
        for (let t = 0; t < betaTargets.length; t++) {
          if (!touchTarget[t]) continue;
          touchTarget[t] = 0;
          const cls = betaClasses[betaTargets[t]];
          const nB = cls.count;
          const rBase = cls.start * nE;
          const rowBase = t * entries + e0;
          for (let e = 0; e < nE; e++) {
            const outRow = targetRow[rowBase + e];
            for (let ib = 0, r = rBase + e; ib < nB; ib++, r += nE) out[outRow + ib] += result[r];
          }
        }
      }
    }
  }
}

/**
 * result[(target)·nE + e] += Σ_k w_k · gathered[(source_k)·nE + e] over one beta block's
 * replacements, w = sign·(pq|rs) (lower triangle: rs < pq whole, rs = pq half). Terms are
 * applied two at a time, one pass over the result column per pair. A function of its own so
 * that the engine optimises this innermost loop nest as one small unit.
 */
function applyBetaBlock(
  B: SingleReplacementBlock,
  nTarget: number,
  eri4: Float64Array,
  base: number,
  pq: number,
  lowerTriangle: boolean,
  gathered: Float64Array,
  gOff: number,
  result: Float64Array,
  rOff: number,
  nE: number,
): void {
  const bStart = B.start;
  const bSource = B.source;
  const bPair = B.pair;
  const bSign = B.sign;
  for (let ib = 0; ib < nTarget; ib++) {
    const rCol = rOff + ib * nE;
    const kEnd = bStart[ib + 1];
    let heldW = 0;
    let heldCol = -1;
    for (let k = bStart[ib]; k < kEnd; k++) {
      const rs = bPair[k];
      let w = bSign[k] * eri4[base + rs];
      if (lowerTriangle && rs >= pq) {
        // rows are sorted by pair: rs = pq counts half, larger rs come from the transpose
        if (rs > pq) break;
        w *= 0.5;
      }
      if (w === 0) continue;
      const gCol = gOff + bSource[k] * nE;
      if (heldCol < 0) {
        heldW = w;
        heldCol = gCol;
      } else {
        axpy2(result, rCol, heldW, gathered, heldCol, w, gCol, nE);
        heldCol = -1;
      }
    }
    if (heldCol >= 0) axpy(result, rCol, heldW, gathered, heldCol, nE);
  }
}

/** y[yo … yo+len) += a·x[xa … xa+len) + b·x[xb … xb+len). */
function axpy2(y: Float64Array, yo: number, a: number, x: Float64Array, xa: number, b: number, xb: number, len: number): void {
  let k = 0;
  for (; k + 1 < len; k += 2) {
    y[yo + k] += a * x[xa + k] + b * x[xb + k];
    y[yo + k + 1] += a * x[xa + k + 1] + b * x[xb + k + 1];
  }
  if (k < len) y[yo + k] += a * x[xa + k] + b * x[xb + k];
}

/** y[yo … yo+len) += a·x[xo … xo+len), unrolled by four (measurably faster in V8). */
function axpy(y: Float64Array, yo: number, a: number, x: Float64Array, xo: number, len: number): void {
  let k = 0;
  for (; k + 3 < len; k += 4) {
    y[yo + k] += a * x[xo + k];
    y[yo + k + 1] += a * x[xo + k + 1];
    y[yo + k + 2] += a * x[xo + k + 2];
    y[yo + k + 3] += a * x[xo + k + 3];
  }
  for (; k < len; k++) y[yo + k] += a * x[xo + k];
}

/** A reusable work array of at least `length` entries kept on the plan. */
function scratchVector(plan: SigmaPlan, name: string, length: number): Float64Array {
  let v = plan.scratch.get(name);
  if (!v || v.length < length) {
    v = new Float64Array(length);
    plan.scratch.set(name, v);
  }
  return v;
}

/**
 * Block-wise transpose between the alpha-major layout (offset + ia·nβ + ib) and the
 * beta-major one (offset + ib·nα + ia); going back it adds into the destination.
 */
function transposeBlocks(space: CiSpace, from: Float64Array, to: Float64Array, backToAlphaMajor: boolean): void {
  for (const block of space.blocks) {
    const nA = block.alphaCount;
    const nB = block.betaCount;
    const off = block.offset;
    if (!backToAlphaMajor) {
      for (let ia = 0; ia < nA; ia++) for (let ib = 0; ib < nB; ib++) to[off + ib * nA + ia] = from[off + ia * nB + ib];
    } else {
      for (let ib = 0; ib < nB; ib++) for (let ia = 0; ia < nA; ia++) to[off + ia * nB + ib] += from[off + ib * nA + ia];
    }
  }
}

/** Diagonal of the CI Hamiltonian (coreEnergy included), the Davidson preconditioner. */
export function hamiltonianDiagonal(ham: OrbitalHamiltonian, space: CiSpace): Float64Array {
  const plan = sigmaPlan(ham, space);
  const { n, eri4 } = plan;
  const n2 = n * n;
  const n3 = n2 * n;
  const diag = new Float64Array(space.determinantCount);
  const coulomb = new Float64Array(n);
  const neA = space.nAlpha;
  const neB = space.nBeta;
  for (const block of space.blocks) {
    const aStart = space.alpha.classes[block.alphaClass].start;
    const bStart = space.beta.classes[block.betaClass].start;
    for (let ia = 0; ia < block.alphaCount; ia++) {
      const Ia = aStart + ia;
      coulomb.fill(0);
      for (let x = 0; x < neA; x++) {
        const p = space.alpha.occupations[Ia * neA + x];
        for (let r = 0; r < n; r++) coulomb[r] += eri4[p * n3 + p * n2 + r * n + r];
      }
      const ea = ham.coreEnergy + plan.alpha.diagonal[Ia];
      for (let ib = 0; ib < block.betaCount; ib++) {
        const Ib = bStart + ib;
        let e = ea + plan.beta.diagonal[Ib];
        for (let y = 0; y < neB; y++) e += coulomb[space.beta.occupations[Ib * neB + y]];
        diag[block.offset + ia * block.betaCount + ib] = e;
      }
    }
  }
  return diag;
}
