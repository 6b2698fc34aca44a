import { describe, expect, it } from 'vitest';
import { buildCiSpace, determinantPatterns } from '../../../solver/ci/space';
import { slaterCondonElement } from '../../../solver/ci/slaterCondon';
import { denseHamiltonian } from '../../../solver/ci/denseHamiltonian';
import { randomHamiltonian } from './hamiltonians';
import { bruteForceElement } from './secondQuantization';

describe('Slater–Condon elements', () => {
  const ham = randomHamiltonian(6, 11);
  const space = buildCiSpace({ nOrbitals: 6, nAlpha: 3, nBeta: 2, maxExcitation: null });
  const dets = Array.from({ length: space.determinantCount }, (_, i) => determinantPatterns(space, i));

  it('match the second-quantised Hamiltonian applied operator by operator', () => {
    // analytic: Slater–Condon rules (Slater, Phys. Rev. 34, 1293 (1929)) against the operator form of H
    let checked = 0;
    for (let i = 0; i < dets.length; i += 7) {
      for (let j = 0; j < dets.length; j += 3) {
        expect(slaterCondonElement(ham, dets[i], dets[j]).value).toBeCloseTo(bruteForceElement(ham, dets[i], dets[j]), 12);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(500);
  });

  it('vanish exactly with no terms beyond double replacements, and are symmetric', () => {
    // Slater–Condon rules: a two-body operator couples determinants differing in at most two spin orbitals
    let far = 0;
    for (let i = 0; i < dets.length; i++) {
      for (let j = 0; j < dets.length; j += 5) {
        const e = slaterCondonElement(ham, dets[i], dets[j]);
        if (e.excitationDegree >= 3) {
          far++;
          expect(e.value).toBe(0);
          expect(e.terms).toHaveLength(0);
        }
        expect(Math.abs(e.value - slaterCondonElement(ham, dets[j], dets[i]).value)).toBeLessThan(1e-12);
      }
    }
    expect(far).toBeGreaterThan(100);
  });

  it('equal phase × Σ factor·integral over the listed terms, with the core term on the diagonal', () => {
    // the definition of the breakdown (common practice, no source)
    for (let i = 0; i < dets.length; i += 4) {
      for (let j = 0; j < dets.length; j += 9) {
        const e = slaterCondonElement(ham, dets[i], dets[j]);
        const sum = e.terms.reduce((s, t) => s + t.factor * t.integral, 0);
        expect(Math.abs(e.phase * sum - e.value)).toBeLessThan(1e-12);
        if (i === j) expect(e.terms.some((t) => t.kind === 'core' && t.integral === ham.coreEnergy)).toBe(true);
        if (e.excitationDegree === 2) expect(Math.abs(e.phase)).toBe(1);
      }
    }
  });

  it('lists a readable breakdown of a single replacement', () => {
    // alpha 0→3 on the aufbau determinant: h_30 plus Coulomb with the 4 other electrons, exchange with the 2 other alphas
    const ref = { alpha: 0b000111, beta: 0b000011 };
    const single = { alpha: 0b001110, beta: 0b000011 };
    const e = slaterCondonElement(ham, single, ref);
    expect(e.excitationDegree).toBe(1);
    expect(e.terms.filter((t) => t.kind === 'one-electron')).toHaveLength(1);
    expect(e.terms.filter((t) => t.kind === 'coulomb')).toHaveLength(4);
    expect(e.terms.filter((t) => t.kind === 'exchange')).toHaveLength(2);
    expect(e.terms[0].orbitals).toEqual([3, 0]);
    expect(e.value).toBeCloseTo(bruteForceElement(ham, single, ref), 12);
  });

  it('build a symmetric dense Hamiltonian', () => {
    const small = buildCiSpace({ nOrbitals: 5, nAlpha: 2, nBeta: 2, maxExcitation: 2 });
    const H = denseHamiltonian(randomHamiltonian(5, 3), small);
    const N = small.determinantCount;
    for (let i = 0; i < N; i++) for (let j = 0; j < N; j++) expect(H[i * N + j]).toBe(H[j * N + i]);
  });
});
