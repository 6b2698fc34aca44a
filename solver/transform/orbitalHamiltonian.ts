import { badInput } from '../errors';
import { eriIndex, eriLength } from '../integrals/eriIndex';
import type { OrbitalHamiltonian } from '../types';
import { moIntegrals } from './moIntegrals';

export interface OrbitalHamiltonianInput {
  coreHamiltonianAO: Float64Array;
  eriAO: Float64Array;
  /** n×n row-major MO coefficients, column j = MO j. */
  coefficients: Float64Array;
  nBasis: number;
  /** Usually the nuclear repulsion; any constant the frozen-core energy is added to. */
  nuclearRepulsionHartree: number;
  /** Doubly occupied MOs folded into the core. */
  frozenOrbitals: readonly number[];
  /** MOs the CI works in, in this order. */
  activeOrbitals: readonly number[];
}

/**
 * The Hamiltonian over the active MOs with a frozen, doubly occupied core folded in:
 *   h'_pq  = h_pq + Σ_c [2(pq|cc) − (pc|cq)]
 *   E_core = E_nuc + Σ_c (2 h_cc + Σ_d [2(cc|dd) − (cd|dc)])
 * (the closed-shell frozen-core, or inactive Fock, operator; common practice, no source).
 * One transformation over core ∪ active supplies every integral needed.
 */
export function orbitalHamiltonian(input: OrbitalHamiltonianInput): OrbitalHamiltonian {
  const { nBasis, frozenOrbitals, activeOrbitals } = input;
  const seen = new Set<number>();
  for (const p of [...frozenOrbitals, ...activeOrbitals]) {
    if (!Number.isInteger(p) || p < 0 || p >= nBasis) throw badInput(`orbital ${p} is outside 0..${nBasis - 1}`, 'ci.activeOrbitals');
    if (seen.has(p)) throw badInput(`orbital ${p} is listed twice among frozen and active orbitals`, 'ci.activeOrbitals');
    seen.add(p);
  }
  const nCore = frozenOrbitals.length;
  const nActive = activeOrbitals.length;
  const all = [...frozenOrbitals, ...activeOrbitals];
  const mo = moIntegrals(input.coreHamiltonianAO, input.eriAO, input.coefficients, nBasis, all);
  const m = all.length;

  let coreEnergy = input.nuclearRepulsionHartree;
  for (let c = 0; c < nCore; c++) {
    coreEnergy += 2 * mo.h[c * m + c];
    for (let d = 0; d < nCore; d++) coreEnergy += 2 * mo.eri[eriIndex(c, c, d, d)] - mo.eri[eriIndex(c, d, d, c)];
  }

  const h = new Float64Array(nActive * nActive);
  for (let p = 0; p < nActive; p++) {
    for (let q = 0; q < nActive; q++) {
      const P = nCore + p;
      const Q = nCore + q;
      let v = mo.h[P * m + Q];
      for (let c = 0; c < nCore; c++) v += 2 * mo.eri[eriIndex(P, Q, c, c)] - mo.eri[eriIndex(P, c, c, Q)];
      h[p * nActive + q] = v;
    }
  }

  const eri = new Float64Array(eriLength(nActive));
  for (let p = 0; p < nActive; p++)
    for (let q = 0; q <= p; q++)
      for (let r = 0; r <= p; r++)
        for (let s = 0; s <= (r === p ? q : r); s++) eri[eriIndex(p, q, r, s)] = mo.eri[eriIndex(nCore + p, nCore + q, nCore + r, nCore + s)];

  return { nOrbitals: nActive, coreEnergy, h, eri };
}
