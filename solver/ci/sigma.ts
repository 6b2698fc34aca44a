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
 * The alpha–beta loop groups alpha replacements by orbital pair pq; for one pq it
 * precomputes W_k = sign_k·(pq|rs_k) over the beta replacement list, so the inner loop
 * is a gather-and-sum over beta strings.
 */
import { badInput } from '../errors';
import type { OrbitalHamiltonian } from '../types';
import { sigmaPlan } from './sigmaPlan';
import { blockIndexOf, CiSpace } from './space';

function checkLengths(space: CiSpace, ...vectors: Float64Array[]): void {
  for (const v of vectors) {
    if (v.length !== space.determinantCount) throw badInput(`vector length ${v.length} differs from the space size ${space.determinantCount}`);
  }
}

export function sigma(ham: OrbitalHamiltonian, space: CiSpace, c: Float64Array, out: Float64Array): void {
  checkLengths(space, c, out);
  if (c === out) throw badInput('sigma needs distinct input and output vectors');
  const plan = sigmaPlan(ham, space);
  const { n, eri4 } = plan;
  const n2 = n * n;
  const alphaClasses = space.alpha.classes;
  const betaClasses = space.beta.classes;

  // diagonal same-spin energies and the core energy
  for (const block of space.blocks) {
    const aStart = alphaClasses[block.alphaClass].start;
    const bStart = betaClasses[block.betaClass].start;
    const nB = block.betaCount;
    for (let ia = 0; ia < block.alphaCount; ia++) {
      const ea = ham.coreEnergy + plan.alpha.diagonal[aStart + ia];
      const row = block.offset + ia * nB;
      for (let ib = 0; ib < nB; ib++) out[row + ib] = (ea + plan.beta.diagonal[bStart + ib]) * c[row + ib];
    }
  }

  // alpha–alpha: whole beta rows move together
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
          for (let ib = 0; ib < nB; ib++) out[outRow + ib] += v * c[cRow + ib];
        }
      }
    }
  });

  // beta–beta: gather within each alpha row
  plan.beta.replacements.sameSpin.forEach((list, li) => {
    const values = plan.beta.sameSpinValues[li];
    const nBI = betaClasses[list.targetClass].count;
    const nBJ = betaClasses[list.sourceClass].count;
    const start = list.start;
    const source = list.source;
    for (let ac = 0; ac < alphaClasses.length; ac++) {
      const bI = blockIndexOf(space, ac, list.targetClass);
      const bJ = blockIndexOf(space, ac, list.sourceClass);
      if (bI < 0 || bJ < 0) continue;
      const offI = space.blocks[bI].offset;
      const offJ = space.blocks[bJ].offset;
      const nA = alphaClasses[ac].count;
      for (let ia = 0; ia < nA; ia++) {
        const outRow = offI + ia * nBI;
        const cRow = offJ + ia * nBJ;
        for (let ib = 0; ib < nBI; ib++) {
          let s = 0;
          for (let e = start[ib]; e < start[ib + 1]; e++) s += values[e] * c[cRow + source[e]];
          out[outRow + ib] += s;
        }
      }
    }
  });

  // alpha–beta: (single alpha replacement) × (single beta replacement)
  let scratch = new Float64Array(0);
  for (const A of plan.alpha.replacements.singles) {
    for (const B of plan.beta.replacements.singles) {
      const bI = blockIndexOf(space, A.targetClass, B.targetClass);
      const bJ = blockIndexOf(space, A.sourceClass, B.sourceClass);
      if (bI < 0 || bJ < 0) continue;
      const offI = space.blocks[bI].offset;
      const offJ = space.blocks[bJ].offset;
      const nBI = betaClasses[B.targetClass].count;
      const nBJ = betaClasses[B.sourceClass].count;
      const m = B.source.length;
      if (scratch.length < m) scratch = new Float64Array(m);
      const W = scratch;
      const bStart = B.start;
      const bSource = B.source;
      const bPair = B.pair;
      const bSign = B.sign;
      for (let pq = 0; pq < n2; pq++) {
        const eStart = A.pairStart[pq];
        const eEnd = A.pairStart[pq + 1];
        if (eStart === eEnd) continue;
        const base = pq * n2;
        for (let k = 0; k < m; k++) W[k] = bSign[k] * eri4[base + bPair[k]];
        for (let e = eStart; e < eEnd; e++) {
          const sa = A.pairSign[e];
          const cRow = offJ + A.pairSource[e] * nBJ;
          const outRow = offI + A.pairTarget[e] * nBI;
          for (let ib = 0; ib < nBI; ib++) {
            let s = 0;
            for (let k = bStart[ib]; k < bStart[ib + 1]; k++) s += W[k] * c[cRow + bSource[k]];
            out[outRow + ib] += sa * s;
          }
        }
      }
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
