import { describe, expect, it } from 'vitest';
import { solveCi } from '../../../solver/ci/solveCi';
import { oneParticleDensity, spinResolvedOneParticleDensity, spinSquared, twoParticleDensity } from '../../../solver/ci/densities';
import { naturalOrbitals } from '../../../solver/ci/naturalOrbitals';
import { spinCompleteWarning } from '../../../solver/ci/spinCompleteness';
import { langhoffDavidson } from '../../../solver/ci/langhoffDavidson';
import { leadingDeterminants } from '../../../solver/ci/leadingDeterminants';
import { buildCiSpace } from '../../../solver/ci/space';
import { eriIndex } from '../../../solver/integrals/eriIndex';
import type { OrbitalHamiltonian } from '../../../solver/types';
import { hubbardHamiltonian } from '../../../solver/system/hubbard';
import { randomHamiltonian } from './hamiltonians';
import { spaceCases } from './spaces';

function energyFromDensities(ham: OrbitalHamiltonian, gamma: Float64Array, gamma2: Float64Array): number {
  const n = ham.nOrbitals;
  let e = ham.coreEnergy;
  for (let pq = 0; pq < n * n; pq++) e += ham.h[pq] * gamma[pq];
  for (let p = 0; p < n; p++)
    for (let q = 0; q < n; q++)
      for (let r = 0; r < n; r++)
        for (let s = 0; s < n; s++) e += 0.5 * ham.eri[eriIndex(p, q, r, s)] * gamma2[((p * n + q) * n + r) * n + s];
  return e;
}

describe('density matrices and spin', () => {
  for (const name of ['FCI 6o 3α2β', 'CISD 7o 3α3β', 'RAS+CISD 7o 3α2β', 'irrep CISD 7o 3α2β']) {
    it(`rebuild the energy and have the right traces: ${name}`, () => {
      // E = E_core + Σ h γ + ½ Σ (pq|rs) Γ (Helgaker, Jørgensen & Olsen, Molecular Electronic-Structure Theory (2000), ch. 2); tr γ = N; Σ_pr Γ_pprr = N(N−1)
      const c = spaceCases.find((x) => x.name === name)!;
      const ham = randomHamiltonian(c.spec.nOrbitals, 55, c.irreps);
      const sol = solveCi(ham, c.spec, { roots: 2 });
      const n = c.spec.nOrbitals;
      const N = c.spec.nAlpha + c.spec.nBeta;
      for (let r = 0; r < 2; r++) {
        const gamma = oneParticleDensity(sol.space, sol.vectors[r]);
        const gamma2 = twoParticleDensity(sol.space, sol.vectors[r]);
        expect(Math.abs(energyFromDensities(ham, gamma, gamma2) - sol.energies[r])).toBeLessThan(1e-10);
        let trace = 0;
        for (let p = 0; p < n; p++) trace += gamma[p * n + p];
        expect(Math.abs(trace - N)).toBeLessThan(1e-12);
        let pairs = 0;
        for (let p = 0; p < n; p++) for (let q = 0; q < n; q++) pairs += gamma2[((p * n + p) * n + q) * n + q];
        expect(Math.abs(pairs - N * (N - 1))).toBeLessThan(1e-10);
        const { alpha, beta } = spinResolvedOneParticleDensity(sol.space, sol.vectors[r]);
        let ta = 0;
        let tb = 0;
        for (let p = 0; p < n; p++) {
          ta += alpha[p * n + p];
          tb += beta[p * n + p];
        }
        expect(Math.abs(ta - c.spec.nAlpha)).toBeLessThan(1e-12);
        expect(Math.abs(tb - c.spec.nBeta)).toBeLessThan(1e-12);
        const no = naturalOrbitals(gamma);
        for (let k = 0; k < n; k++) {
          expect(no.occupations[k]).toBeGreaterThan(-1e-12);
          expect(no.occupations[k]).toBeLessThan(2 + 1e-12);
          if (k > 0) expect(no.occupations[k]).toBeLessThanOrEqual(no.occupations[k - 1]);
        }
        expect(Math.abs(no.occupations.reduce((s, x) => s + x, 0) - N)).toBeLessThan(1e-10);
      }
    });
  }

  it('natural orbitals diagonalise γ', () => {
    // eigen-decomposition: γ v_k = n_k v_k
    const sol = solveCi(randomHamiltonian(5, 8), { nOrbitals: 5, nAlpha: 2, nBeta: 2, maxExcitation: null });
    const gamma = oneParticleDensity(sol.space, sol.vectors[0]);
    const { occupations, vectors } = naturalOrbitals(gamma);
    for (let k = 0; k < 5; k++) {
      for (let p = 0; p < 5; p++) {
        let gv = 0;
        for (let q = 0; q < 5; q++) gv += gamma[p * 5 + q] * vectors[q * 5 + k];
        expect(Math.abs(gv - occupations[k] * vectors[p * 5 + k])).toBeLessThan(1e-12);
      }
    }
  });

  it('⟨S²⟩ is 0 for singlets and 2 for triplets of a spin-complete space, 3/4 for a one-electron state', () => {
    // S(S+1): singlet 0, triplet 2, doublet 3/4 (standard values)
    const ham = randomHamiltonian(6, 77);
    const sol = solveCi(ham, { nOrbitals: 6, nAlpha: 2, nBeta: 2, maxExcitation: null }, { roots: 6 });
    for (const s2 of sol.s2) {
      const nearest = [0, 2, 6].reduce((best, v) => (Math.abs(v - s2) < Math.abs(best - s2) ? v : best), 0);
      expect(Math.abs(s2 - nearest)).toBeLessThan(1e-10);
    }
    expect(sol.s2.some((s) => Math.abs(s) < 1e-10) && sol.s2.some((s) => Math.abs(s - 2) < 1e-10)).toBe(true);
    const one = buildCiSpace({ nOrbitals: 3, nAlpha: 1, nBeta: 0, maxExcitation: null });
    expect(spinSquared(one, Float64Array.from([0.3, -0.5, 0.8]))).toBeCloseTo(0.75, 14);
    // high-spin reference (all α): S = Ms = 1, ⟨S²⟩ = 2 for any vector
    const allAlpha = buildCiSpace({ nOrbitals: 4, nAlpha: 2, nBeta: 0, maxExcitation: null });
    expect(spinSquared(allAlpha, Float64Array.from({ length: 6 }, (_, i) => i + 1))).toBeCloseTo(2, 12);
  });

  it('flags truncated spaces of high-spin references as not spin-complete', () => {
    // ROHF-based CISD is not spin-complete, closed-shell CISD, full CI and RAS-only spaces are (common practice, no source)
    expect(spinCompleteWarning({ nOrbitals: 8, nAlpha: 4, nBeta: 2, maxExcitation: 2 }).warning).toBe(true);
    expect(spinCompleteWarning({ nOrbitals: 8, nAlpha: 4, nBeta: 2, maxExcitation: 2 }).message).toMatch(/not spin-complete/);
    expect(spinCompleteWarning({ nOrbitals: 8, nAlpha: 3, nBeta: 3, maxExcitation: 2 }).warning).toBe(false);
    expect(spinCompleteWarning({ nOrbitals: 8, nAlpha: 4, nBeta: 2, maxExcitation: null }).warning).toBe(false);
    expect(spinCompleteWarning({ nOrbitals: 8, nAlpha: 4, nBeta: 2, maxExcitation: 6 }).warning).toBe(false);
    // and the warning is real: a high-spin CISD root is spin-contaminated, a closed-shell one is not
    const ham = randomHamiltonian(6, 3);
    const contaminated = solveCi(ham, { nOrbitals: 6, nAlpha: 3, nBeta: 1, maxExcitation: 1 });
    expect(Math.abs(contaminated.s2[0] - 2)).toBeGreaterThan(1e-6);
    const clean = solveCi(ham, { nOrbitals: 6, nAlpha: 2, nBeta: 2, maxExcitation: 2 }, { roots: 3 });
    clean.s2.forEach((s) => expect(Math.min(Math.abs(s), Math.abs(s - 2), Math.abs(s - 6))).toBeLessThan(1e-10));
    expect(spinCompleteWarning({ nOrbitals: 6, nAlpha: 3, nBeta: 1, maxExcitation: 1 }).warning).toBe(true);
  });

  it('applies the Langhoff–Davidson correction', () => {
    // Langhoff & Davidson, Int. J. Quantum Chem. 8, 61 (1974): ΔE_Q = (1 − c0²)(E_CI − E_ref)
    expect(langhoffDavidson(-1.1, -1.0, 0.9)).toBeCloseTo(-1.1 + 0.1 * -0.1, 15);
  });

  it('lists leading determinants in the occupation notation', () => {
    // half-filled Hubbard dimer ground state: (|ab̄| + |bā| ) weight plus ionic terms; largest first
    const sol = solveCi(hubbardHamiltonian({ sites: 2, periodic: false, t: 1, U: 4 }), { nOrbitals: 2, nAlpha: 1, nBeta: 1, maxExcitation: null });
    const rows = leadingDeterminants(sol.space, sol.vectors[0], 4);
    expect(rows).toHaveLength(4);
    expect(rows.map((r) => r.weight).reduce((s, w) => s + w, 0)).toBeCloseTo(1, 12);
    for (let i = 1; i < rows.length; i++) expect(Math.abs(rows[i].coefficient)).toBeLessThanOrEqual(Math.abs(rows[i - 1].coefficient));
    // the covalent determinants (one electron per site) dominate for U > 0
    expect(rows[0].alpha).not.toBe(rows[0].beta);
    expect(['10', '01']).toContain(rows[0].alpha);
    const ref = rows.find((r) => r.alpha === '10' && r.beta === '10')!;
    expect(ref.excitationLevel).toBe(0);
    expect(rows.find((r) => r.alpha === '01' && r.beta === '01')!.excitationLevel).toBe(2);
    expect(leadingDeterminants(sol.space, sol.vectors[0], 10, 0.5).length).toBe(2);
  });
});
