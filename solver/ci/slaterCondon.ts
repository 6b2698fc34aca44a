/**
 * One Hamiltonian matrix element ⟨I|H|J⟩ between two Slater determinants, taken apart
 * into its integrals by the Slater–Condon rules (Slater, Phys. Rev. 34, 1293 (1929);
 * Condon, Phys. Rev. 36, 1121 (1930)). This is deliberately simple and independent of the
 * sigma build: it feeds the Hamiltonian map and serves as the test oracle.
 *
 * Conventions: a determinant is { alpha, beta } occupation bit patterns (bits.ts), the
 * alpha creation operators standing left of the beta ones, each string ascending.
 * value = phase × Σ factor·integral over `terms`. On the diagonal phase = +1 and the terms
 * include the 'core' term (coreEnergy). Determinants differing in three or more spin
 * orbitals give value 0, phase 0 and no terms.
 * Integrals use chemists' notation: orbitals [a, i, b, j] means (ai|bj); a one-electron
 * term [a, i] means h_ai. Spin labels: 'alpha', 'beta', 'alpha-alpha', 'alpha-beta', 'beta-beta'.
 */
import { badInput } from '../errors';
import { eriIndex } from '../integrals/eriIndex';
import type { OrbitalHamiltonian } from '../types';
import { countOccupied, hasOrbital, occupiedOrbitals, replacementSign, withOrbital, withoutOrbital } from './bits';

export interface Determinant {
  alpha: number;
  beta: number;
}

export type SlaterCondonTermKind = 'one-electron' | 'coulomb' | 'exchange' | 'core';

export interface SlaterCondonTerm {
  kind: SlaterCondonTermKind;
  orbitals: number[];
  spin?: string;
  integral: number;
  factor: number;
}

export interface SlaterCondonElement {
  value: number;
  /** Number of spin orbitals in which the determinants differ, halved: 0, 1, 2, or ≥ 3. */
  excitationDegree: number;
  phase: number;
  terms: SlaterCondonTerm[];
}

type Spin = 'alpha' | 'beta';

/** Orbitals occupied in `a` but not in `b`. */
function onlyIn(a: number, b: number, n: number): number[] {
  const list: number[] = [];
  for (let p = 0; p < n; p++) if (hasOrbital(a, p) && !hasOrbital(b, p)) list.push(p);
  return list;
}

export function slaterCondonElement(ham: OrbitalHamiltonian, detI: Determinant, detJ: Determinant): SlaterCondonElement {
  const n = ham.nOrbitals;
  if (countOccupied(detI.alpha, n) !== countOccupied(detJ.alpha, n) || countOccupied(detI.beta, n) !== countOccupied(detJ.beta, n)) {
    throw badInput('Slater–Condon elements need determinants with the same numbers of alpha and beta electrons');
  }
  const h = (p: number, q: number): number => ham.h[p * n + q];
  const g = (p: number, q: number, r: number, s: number): number => ham.eri[eriIndex(p, q, r, s)];
  // particles (in I, not J) and holes (in J, not I) per spin
  const particlesA = onlyIn(detI.alpha, detJ.alpha, n);
  const holesA = onlyIn(detJ.alpha, detI.alpha, n);
  const particlesB = onlyIn(detI.beta, detJ.beta, n);
  const holesB = onlyIn(detJ.beta, detI.beta, n);
  const degree = particlesA.length + particlesB.length;
  const terms: SlaterCondonTerm[] = [];
  const finish = (phase: number): SlaterCondonElement => {
    let sum = 0;
    for (const t of terms) sum += t.factor * t.integral;
    return { value: phase * sum, excitationDegree: degree, phase, terms };
  };
  if (degree >= 3) return { value: 0, excitationDegree: degree, phase: 0, terms };

  const occ: Record<Spin, number[]> = { alpha: occupiedOrbitals(detJ.alpha, n), beta: occupiedOrbitals(detJ.beta, n) };

  if (degree === 0) {
    terms.push({ kind: 'core', orbitals: [], integral: ham.coreEnergy, factor: 1 });
    for (const spin of ['alpha', 'beta'] as const) {
      for (const p of occ[spin]) terms.push({ kind: 'one-electron', orbitals: [p, p], spin, integral: h(p, p), factor: 1 });
    }
    // each unordered pair of occupied spin orbitals once
    const pairs: [Spin, Spin][] = [['alpha', 'alpha'], ['alpha', 'beta'], ['beta', 'beta']];
    for (const [s1, s2] of pairs) {
      const spin = `${s1}-${s2}`;
      for (let x = 0; x < occ[s1].length; x++) {
        const p = occ[s1][x];
        for (let y = s1 === s2 ? x + 1 : 0; y < occ[s2].length; y++) {
          const q = occ[s2][y];
          terms.push({ kind: 'coulomb', orbitals: [p, p, q, q], spin, integral: g(p, p, q, q), factor: 1 });
          if (s1 === s2) terms.push({ kind: 'exchange', orbitals: [p, q, q, p], spin, integral: g(p, q, q, p), factor: -1 });
        }
      }
    }
    return finish(1);
  }

  if (degree === 1) {
    const spin: Spin = particlesA.length === 1 ? 'alpha' : 'beta';
    const a = spin === 'alpha' ? particlesA[0] : particlesB[0];
    const i = spin === 'alpha' ? holesA[0] : holesB[0];
    const source = spin === 'alpha' ? detJ.alpha : detJ.beta;
    const phase = replacementSign(source, i, a);
    terms.push({ kind: 'one-electron', orbitals: [a, i], spin, integral: h(a, i), factor: 1 });
    for (const other of ['alpha', 'beta'] as const) {
      for (const k of occ[other]) {
        if (other === spin && k === i) continue;
        const pairSpin = `${spin}-${other}`;
        terms.push({ kind: 'coulomb', orbitals: [a, i, k, k], spin: pairSpin, integral: g(a, i, k, k), factor: 1 });
        if (other === spin) terms.push({ kind: 'exchange', orbitals: [a, k, k, i], spin: pairSpin, integral: g(a, k, k, i), factor: -1 });
      }
    }
    return finish(phase);
  }

  // degree 2
  if (particlesA.length === 1) {
    // one alpha and one beta replacement: only the Coulomb-type integral survives
    const [a, i, b, j] = [particlesA[0], holesA[0], particlesB[0], holesB[0]];
    const phase = replacementSign(detJ.alpha, i, a) * replacementSign(detJ.beta, j, b);
    terms.push({ kind: 'coulomb', orbitals: [a, i, b, j], spin: 'alpha-beta', integral: g(a, i, b, j), factor: 1 });
    return finish(phase);
  }
  const spin: Spin = particlesA.length === 2 ? 'alpha' : 'beta';
  const [a, b] = spin === 'alpha' ? particlesA : particlesB;
  const [i, j] = spin === 'alpha' ? holesA : holesB;
  const source = spin === 'alpha' ? detJ.alpha : detJ.beta;
  // I = phase · a†_b a_j a†_a a_i J, applied one replacement at a time
  const phase = replacementSign(source, i, a) * replacementSign(withOrbital(withoutOrbital(source, i), a), j, b);
  const pairSpin = `${spin}-${spin}`;
  terms.push({ kind: 'coulomb', orbitals: [a, i, b, j], spin: pairSpin, integral: g(a, i, b, j), factor: 1 });
  terms.push({ kind: 'exchange', orbitals: [a, j, b, i], spin: pairSpin, integral: g(a, j, b, i), factor: -1 });
  return finish(phase);
}
