import { describe, expect, it } from 'vitest';
import { solveCi } from '../../../solver/ci/solveCi';
import { SolverError } from '../../../solver/errors';
import { hubbardHamiltonian } from '../../../solver/system/hubbard';
import { randomHamiltonian } from './hamiltonians';
import { spaceCases } from './spaces';
import type { CiSpaceSpec } from '../../../solver/ci/spaceSpec';

describe('solveCi', () => {
  const picks = ['FCI 6o 3α3β', 'CISD 7o 3α3β', 'RAS 7o 3α3β', 'CISDT 7o 3α2β', 'irrep CISD 7o 3α2β'];
  for (const name of picks) {
    it(`dense and Davidson agree on 3 roots: ${name}`, () => {
      // two independent diagonalisations of the same operator (dense from Slater–Condon, Davidson from sigma)
      const c = spaceCases.find((x) => x.name === name)!;
      const ham = randomHamiltonian(c.spec.nOrbitals, 7, c.irreps);
      const dense = solveCi(ham, c.spec, { roots: 3, method: 'dense' });
      const iterative = solveCi(ham, c.spec, { roots: 3, method: 'davidson' });
      expect(iterative.method).toBe('davidson');
      for (let r = 0; r < 3; r++) {
        expect(Math.abs(dense.energies[r] - iterative.energies[r])).toBeLessThan(1e-10);
        // same state: |⟨dense|davidson⟩| = 1 (roots of random Hamiltonians are non-degenerate)
        let overlap = 0;
        for (let i = 0; i < dense.determinantCount; i++) overlap += dense.vectors[r][i] * iterative.vectors[r][i];
        expect(Math.abs(Math.abs(overlap) - 1)).toBeLessThan(1e-8);
      }
      expect(iterative.iterations.length).toBeGreaterThan(1);
      const last = iterative.iterations[iterative.iterations.length - 1];
      last.residualNorms.forEach((r) => expect(r).toBeLessThanOrEqual(1e-7));
    });
  }

  it('respects the variational order CIS ≥ CISD ≥ CISDT ≥ CISDTQ ≥ FCI, with level = N giving FCI', () => {
    // variational principle: a larger space cannot raise the lowest eigenvalue (common practice, no source)
    const ham = randomHamiltonian(7, 21);
    const energy = (maxExcitation: number | null): number => solveCi(ham, { nOrbitals: 7, nAlpha: 3, nBeta: 3, maxExcitation }).energies[0];
    const levels = [1, 2, 3, 4, 5].map(energy);
    const fci = energy(null);
    for (let i = 0; i + 1 < levels.length; i++) expect(levels[i]).toBeGreaterThanOrEqual(levels[i + 1] - 1e-12);
    expect(levels[3]).toBeGreaterThanOrEqual(fci - 1e-12);
    expect(levels[0] - fci).toBeGreaterThan(1e-4); // the truncation really bites
    expect(Math.abs(energy(6) - fci)).toBeLessThan(1e-10); // 6 electrons: every determinant is at most 6 replacements away
  });

  it('CISD equals FCI for two electrons, RAS without limits equals FCI', () => {
    // with two electrons no determinant is more than doubly excited; RAS limits ≥ the electron count cut nothing
    const ham = randomHamiltonian(8, 5);
    const fci2 = solveCi(ham, { nOrbitals: 8, nAlpha: 1, nBeta: 1, maxExcitation: null }, { roots: 2 });
    const cisd2 = solveCi(ham, { nOrbitals: 8, nAlpha: 1, nBeta: 1, maxExcitation: 2 }, { roots: 2 });
    expect(cisd2.determinantCount).toBe(64);
    for (let r = 0; r < 2; r++) expect(Math.abs(fci2.energies[r] - cisd2.energies[r])).toBeLessThan(1e-10);
    const spec: CiSpaceSpec = { nOrbitals: 8, nAlpha: 3, nBeta: 3, maxExcitation: null };
    const fci = solveCi(ham, spec);
    const ras = solveCi(ham, { ...spec, ras: { ras1: [0, 1, 2], ras3: [5, 6, 7], maxHoles: 6, maxParticles: 6 } });
    expect(ras.determinantCount).toBe(fci.determinantCount);
    expect(Math.abs(ras.energies[0] - fci.energies[0])).toBeLessThan(1e-10);
  });

  it('reports progress once per iteration, applies the sign rule and the reference weight', () => {
    const ham = hubbardHamiltonian({ sites: 8, periodic: false, t: 1, U: 2 });
    const events: number[] = [];
    const sol = solveCi(ham, { nOrbitals: 8, nAlpha: 4, nBeta: 4, maxExcitation: null }, { onProgress: (e) => events.push(e.iteration) });
    expect(sol.method).toBe('davidson');
    expect(sol.determinantCount).toBe(4900); // C(8,4)² = 70²
    expect(events).toEqual(sol.iterations.map((it) => it.iteration));
    const v = sol.vectors[0];
    let largest = 0;
    let norm = 0;
    for (let i = 0; i < v.length; i++) {
      norm += v[i] * v[i];
      if (Math.abs(v[i]) > Math.abs(v[largest])) largest = i;
    }
    expect(v[largest]).toBeGreaterThan(0);
    expect(Math.abs(norm - 1)).toBeLessThan(1e-12);
    // site-basis reference: orbitals 0…3 filled in both spins
    expect(sol.referenceWeight[0]).toBeCloseTo(v[sol.space.referenceIndex] ** 2, 14);
    expect(sol.referenceWeight[0]).toBeGreaterThan(0);
  });

  it('finds triplets with targetMultiplicity in the Ms = 0 sector by Davidson', () => {
    // cross-check of two solvers, spin judged by ⟨S²⟩ = S(S+1) = 2
    const ham = randomHamiltonian(6, 33);
    const spec: CiSpaceSpec = { nOrbitals: 6, nAlpha: 3, nBeta: 3, maxExcitation: null };
    const dense = solveCi(ham, spec, { roots: 2, targetMultiplicity: 3, method: 'dense' });
    const iterative = solveCi(ham, spec, { roots: 2, targetMultiplicity: 3, method: 'davidson' });
    for (let r = 0; r < 2; r++) {
      expect(Math.abs(dense.s2[r] - 2)).toBeLessThan(1e-6);
      expect(Math.abs(iterative.s2[r] - 2)).toBeLessThan(1e-6);
      expect(Math.abs(dense.energies[r] - iterative.energies[r])).toBeLessThan(1e-10);
    }
  });

  it('cancels and reports non-convergence with the history', () => {
    const ham = randomHamiltonian(7, 2);
    const spec: CiSpaceSpec = { nOrbitals: 7, nAlpha: 3, nBeta: 3, maxExcitation: null };
    expect(() => solveCi(ham, spec, { method: 'davidson', shouldCancel: () => true })).toThrow(expect.objectContaining({ code: 'cancelled' }));
    try {
      solveCi(ham, spec, { method: 'davidson', maxIterations: 2 });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(SolverError);
      expect((e as SolverError).code).toBe('not-converged');
      expect((e as SolverError).details).toHaveLength(2);
    }
  });
});
