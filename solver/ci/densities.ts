/**
 * Reduced density matrices of a CI vector, from the same replacement lists the sigma
 * build uses (so no intermediate determinants outside the space are ever needed).
 *
 * One-particle: γ^σ_pq = ⟨a†_pσ a_qσ⟩, spin-summed γ = γ^α + γ^β (row-major n·n, tr γ = N).
 * Two-particle: Γ_pqrs = Σ_στ ⟨a†_pσ a†_rτ a_sτ a_qσ⟩ stored row-major over p, q, r, s
 * (index ((p·n + q)·n + r)·n + s), normalised so that Σ_pr Γ_pprr = N(N − 1) and
 * E = coreEnergy + Σ h_pq γ_pq + ½ Σ (pq|rs) Γ_pqrs.
 * Vectors need not be normalised: every density is divided by ⟨c|c⟩.
 */
import { badInput } from '../errors';
import { spinReplacements } from './replacements';
import { blockIndexOf, CiSpace } from './space';

function normSquared(space: CiSpace, c: Float64Array): number {
  if (c.length !== space.determinantCount) throw badInput(`vector length ${c.length} differs from the space size ${space.determinantCount}`);
  let s = 0;
  for (let i = 0; i < c.length; i++) s += c[i] * c[i];
  if (!(s > 0)) throw badInput('density of a zero vector');
  return s;
}

export function spinResolvedOneParticleDensity(space: CiSpace, c: Float64Array): { alpha: Float64Array; beta: Float64Array } {
  const scale = 1 / normSquared(space, c);
  const n = space.nOrbitals;
  const n2 = n * n;
  const alpha = new Float64Array(n2);
  const beta = new Float64Array(n2);
  const betaClasses = space.beta.classes;
  const alphaClasses = space.alpha.classes;
  for (const A of spinReplacements(space, 'alpha').singles) {
    for (let bc = 0; bc < betaClasses.length; bc++) {
      const bI = blockIndexOf(space, A.targetClass, bc);
      const bJ = blockIndexOf(space, A.sourceClass, bc);
      if (bI < 0 || bJ < 0) continue;
      const offI = space.blocks[bI].offset;
      const offJ = space.blocks[bJ].offset;
      const nB = betaClasses[bc].count;
      for (let pq = 0; pq < n2; pq++) {
        let acc = 0;
        for (let e = A.pairStart[pq]; e < A.pairStart[pq + 1]; e++) {
          const rowI = offI + A.pairTarget[e] * nB;
          const rowJ = offJ + A.pairSource[e] * nB;
          let s = 0;
          for (let ib = 0; ib < nB; ib++) s += c[rowI + ib] * c[rowJ + ib];
          acc += A.pairSign[e] * s;
        }
        alpha[pq] += acc * scale;
      }
    }
  }
  for (const B of spinReplacements(space, 'beta').singles) {
    const nBI = betaClasses[B.targetClass].count;
    const nBJ = betaClasses[B.sourceClass].count;
    for (let ac = 0; ac < alphaClasses.length; ac++) {
      const bI = blockIndexOf(space, ac, B.targetClass);
      const bJ = blockIndexOf(space, ac, B.sourceClass);
      if (bI < 0 || bJ < 0) continue;
      const offI = space.blocks[bI].offset;
      const offJ = space.blocks[bJ].offset;
      for (let ia = 0; ia < alphaClasses[ac].count; ia++) {
        const rowI = offI + ia * nBI;
        const rowJ = offJ + ia * nBJ;
        for (let ib = 0; ib < nBI; ib++) {
          const cI = c[rowI + ib] * scale;
          if (cI === 0) continue;
          for (let k = B.start[ib]; k < B.start[ib + 1]; k++) beta[B.pair[k]] += B.sign[k] * cI * c[rowJ + B.source[k]];
        }
      }
    }
  }
  return { alpha, beta };
}

export function oneParticleDensity(space: CiSpace, c: Float64Array): Float64Array {
  const { alpha, beta } = spinResolvedOneParticleDensity(space, c);
  const gamma = new Float64Array(alpha.length);
  for (let i = 0; i < gamma.length; i++) gamma[i] = alpha[i] + beta[i];
  return gamma;
}

/**
 * D[pq·n² + rs] = ⟨E^α_pq E^β_rs⟩ / ⟨c|c⟩ (unnormalised by nothing else); also returns the
 * contraction Σ_pq D[pq, qp] when `onlySpinFlipTrace` is set, without forming D.
 */
function alphaBetaDensity(space: CiSpace, c: Float64Array, onlySpinFlipTrace: boolean): { D: Float64Array | null; trace: number } {
  const scale = 1 / normSquared(space, c);
  const n = space.nOrbitals;
  const n2 = n * n;
  const D = onlySpinFlipTrace ? null : new Float64Array(n2 * n2);
  let trace = 0;
  const betaClasses = space.beta.classes;
  for (const A of spinReplacements(space, 'alpha').singles) {
    for (const B of spinReplacements(space, 'beta').singles) {
      const bI = blockIndexOf(space, A.targetClass, B.targetClass);
      const bJ = blockIndexOf(space, A.sourceClass, B.sourceClass);
      if (bI < 0 || bJ < 0) continue;
      const offI = space.blocks[bI].offset;
      const offJ = space.blocks[bJ].offset;
      const nBI = betaClasses[B.targetClass].count;
      const nBJ = betaClasses[B.sourceClass].count;
      for (let pq = 0; pq < n2; pq++) {
        const eStart = A.pairStart[pq];
        const eEnd = A.pairStart[pq + 1];
        if (eStart === eEnd) continue;
        const p = Math.floor(pq / n);
        const q = pq - p * n;
        const rsFirst = onlySpinFlipTrace ? q * n + p : 0;
        const rsLast = onlySpinFlipTrace ? q * n + p : n2 - 1;
        for (let rs = rsFirst; rs <= rsLast; rs++) {
          const kStart = B.pairStart[rs];
          const kEnd = B.pairStart[rs + 1];
          if (kStart === kEnd) continue;
          let acc = 0;
          for (let e = eStart; e < eEnd; e++) {
            const rowI = offI + A.pairTarget[e] * nBI;
            const rowJ = offJ + A.pairSource[e] * nBJ;
            let s = 0;
            for (let k = kStart; k < kEnd; k++) s += B.pairSign[k] * c[rowI + B.pairTarget[k]] * c[rowJ + B.pairSource[k]];
            acc += A.pairSign[e] * s;
          }
          if (D) D[pq * n2 + rs] += acc * scale;
          else trace += acc * scale;
        }
      }
    }
  }
  return { D, trace };
}

/**
 * ⟨S²⟩ = M_s(M_s + 1) + N_β − Σ_pq ⟨a†_pα a_qα a†_qβ a_pβ⟩, from S² = S₋S₊ + S_z + S_z²
 * (Löwdin, Phys. Rev. 97, 1509 (1955); e.g. Szabo & Ostlund (1996) §2.5).
 */
export function spinSquared(space: CiSpace, c: Float64Array): number {
  const ms = (space.nAlpha - space.nBeta) / 2;
  return ms * (ms + 1) + space.nBeta - alphaBetaDensity(space, c, true).trace;
}

export function twoParticleDensity(space: CiSpace, c: Float64Array): Float64Array {
  const norm2 = normSquared(space, c);
  const n = space.nOrbitals;
  const n2 = n * n;
  const n3 = n2 * n;
  const gamma2 = new Float64Array(n2 * n2);
  const at = (p: number, q: number, r: number, s: number): number => p * n3 + q * n2 + r * n + s;

  // alpha–beta and beta–alpha parts
  const { D } = alphaBetaDensity(space, c, false);
  for (let pq = 0; pq < n2; pq++) for (let rs = 0; rs < n2; rs++) gamma2[pq * n2 + rs] += D![pq * n2 + rs] + D![rs * n2 + pq];

  // same-spin parts: ρ(I, J) = Σ over the other spin's strings of c_I c_J per replacement entry
  for (const spin of ['alpha', 'beta'] as const) {
    const strings = spin === 'alpha' ? space.alpha : space.beta;
    const other = spin === 'alpha' ? space.beta : space.alpha;
    const ne = strings.nElectrons;
    const blockOf = (mine: number, theirs: number): number =>
      spin === 'alpha' ? blockIndexOf(space, mine, theirs) : blockIndexOf(space, theirs, mine);
    /** Σ_t c(I, t) c(J, t) for strings I, J (local to their classes) over every shared other-spin class. */
    const overlapAcross = (classI: number, I: number, classJ: number, J: number): number => {
      let s = 0;
      for (let oc = 0; oc < other.classes.length; oc++) {
        const bI = blockOf(classI, oc);
        const bJ = blockOf(classJ, oc);
        if (bI < 0 || bJ < 0) continue;
        const blockI = space.blocks[bI];
        const blockJ = space.blocks[bJ];
        const nOther = other.classes[oc].count;
        if (spin === 'alpha') {
          const rowI = blockI.offset + I * nOther;
          const rowJ = blockJ.offset + J * nOther;
          for (let t = 0; t < nOther; t++) s += c[rowI + t] * c[rowJ + t];
        } else {
          const wI = blockI.betaCount;
          const wJ = blockJ.betaCount;
          for (let t = 0; t < nOther; t++) s += c[blockI.offset + t * wI + I] * c[blockJ.offset + t * wJ + J];
        }
      }
      return s / norm2;
    };
    // diagonal: n_k n_l for k ≠ l
    for (let I = 0; I < strings.count; I++) {
      const cls = strings.classOf[I];
      const w = overlapAcross(cls, strings.localIndex[I], cls, strings.localIndex[I]);
      if (w === 0) continue;
      for (let x = 0; x < ne; x++) {
        const k = strings.occupations[I * ne + x];
        for (let y = 0; y < ne; y++) {
          if (x === y) continue;
          const l = strings.occupations[I * ne + y];
          gamma2[at(k, k, l, l)] += w;
          gamma2[at(k, l, l, k)] -= w;
        }
      }
    }
    for (const list of spinReplacements(space, spin).sameSpin) {
      const sourceStart = strings.classes[list.sourceClass].start;
      for (let I = 0; I < strings.classes[list.targetClass].count; I++) {
        for (let e = list.start[I]; e < list.start[I + 1]; e++) {
          const rho = list.sign[e] * overlapAcross(list.targetClass, I, list.sourceClass, list.source[e]);
          if (rho === 0) continue;
          const i = list.orbitals[4 * e];
          const a = list.orbitals[4 * e + 1];
          const j = list.orbitals[4 * e + 2];
          const b = list.orbitals[4 * e + 3];
          if (j < 0) {
            const J = sourceStart + list.source[e];
            for (let x = 0; x < ne; x++) {
              const k = strings.occupations[J * ne + x];
              if (k === i) continue;
              gamma2[at(a, i, k, k)] += rho;
              gamma2[at(k, k, a, i)] += rho;
              gamma2[at(a, k, k, i)] -= rho;
              gamma2[at(k, i, a, k)] -= rho;
            }
          } else {
            gamma2[at(a, i, b, j)] += rho;
            gamma2[at(b, j, a, i)] += rho;
            gamma2[at(a, j, b, i)] -= rho;
            gamma2[at(b, i, a, j)] -= rho;
          }
        }
      }
    }
  }
  return gamma2;
}
