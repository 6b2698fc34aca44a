import { describe, expect, it } from 'vitest';
import { buildCiSpace } from '../../../solver/ci/space';
import { denseHamiltonian } from '../../../solver/ci/denseHamiltonian';
import { sigma } from '../../../solver/ci/sigma';
import { solveCi } from '../../../solver/ci/solveCi';
import { hubbardHamiltonian } from '../../../solver/system/hubbard';
import { moleculeLikeHamiltonian, randomHamiltonian, seededRandom } from './hamiltonians';

/** S from ⟨S²⟩ = S(S + 1). */
const spinOf = (s2: number): number => Math.round((-1 + Math.sqrt(1 + 4 * Math.max(0, s2))) / 2);

describe('roots of one spin parity (Ms = 0 transpose sectors)', () => {
  it('spinParity picks the lowest states with even or odd S from the whole dense spectrum', () => {
    // oracle: the whole-space dense spectrum with each root classified by ⟨S²⟩; C(α,β) = (−1)^S C(β,α)
    // (Knowles & Handy, Chem. Phys. Lett. 111, 315 (1984)), so parity +1 holds S = 0, 2, … and −1 holds S = 1, 3, …
    for (const seed of [3, 7, 12]) {
      const ham = randomHamiltonian(5, seed);
      const spec = { nOrbitals: 5, nAlpha: 2, nBeta: 2, maxExcitation: null };
      const all = solveCi(ham, spec, { method: 'dense', roots: 100 });
      for (const parity of [1, -1] as const) {
        const expected = all.energies.filter((_, r) => (spinOf(all.s2[r]) % 2 === 0 ? 1 : -1) === parity).slice(0, 2);
        const dense = solveCi(ham, spec, { method: 'dense', roots: 2, spinParity: parity });
        const iterative = solveCi(ham, spec, { method: 'davidson', roots: 2, spinParity: parity });
        for (let r = 0; r < 2; r++) {
          expect(Math.abs(dense.energies[r] - expected[r])).toBeLessThan(1e-10);
          expect(Math.abs(iterative.energies[r] - expected[r])).toBeLessThan(1e-9);
          expect(spinOf(dense.s2[r]) % 2).toBe(parity > 0 ? 0 : 1);
          expect(spinOf(iterative.s2[r]) % 2).toBe(parity > 0 ? 0 : 1);
        }
      }
    }
  });

  it('refuses more roots than the sector holds, and is ignored without the symmetry (nα ≠ nβ)', () => {
    // C(3,1)² = 9 determinants, 3 of them self-transposed: the odd sector has (9 − 3)/2 = 3 states (counting, no source)
    const ham = randomHamiltonian(3, 5);
    expect(() => solveCi(ham, { nOrbitals: 3, nAlpha: 1, nBeta: 1, maxExcitation: null }, { method: 'dense', roots: 4, spinParity: -1 })).toThrow(
      /sector has only 3 states/,
    );
    const unequal = { nOrbitals: 5, nAlpha: 3, nBeta: 2, maxExcitation: null };
    const ham5 = randomHamiltonian(5, 9);
    const plain = solveCi(ham5, unequal, { method: 'dense' });
    const withParity = solveCi(ham5, unequal, { method: 'dense', spinParity: -1 });
    expect(withParity.energies[0]).toBe(plain.energies[0]);
  });
});

describe('Davidson with a P-space preconditioner', () => {
  const cases = [
    { name: '6-site Hubbard ring U = 4', ham: hubbardHamiltonian({ sites: 6, periodic: true, t: 1, U: 4 }), n: 6, ne: 3 },
    { name: 'molecule-like 6 orbitals', ham: moleculeLikeHamiltonian(6, 5), n: 6, ne: 3 },
  ];
  for (const { name, ham, n, ne } of cases) {
    it(`reaches the dense roots with either preconditioner: ${name}`, () => {
      // oracle: dense diagonalisation of the same space (ml-matrix)
      const spec = { nOrbitals: n, nAlpha: ne, nBeta: ne, maxExcitation: null };
      const dense = solveCi(ham, spec, { method: 'dense', roots: 3 });
      for (const preconditioner of ['p-space', 'diagonal'] as const) {
        const iterative = solveCi(ham, spec, { method: 'davidson', roots: 3, preconditioner });
        for (let r = 0; r < 3; r++) expect(Math.abs(iterative.energies[r] - dense.energies[r])).toBeLessThan(1e-9);
      }
    });
  }

  it('the sparse Hubbard sigma (whole pair blocks skipped) equals the dense Hamiltonian times c', () => {
    // oracle: denseHamiltonian from Slater–Condon rules; site-basis Hubbard integrals are all zero but (pp|pp) = U
    for (const spec of [
      { nOrbitals: 6, nAlpha: 3, nBeta: 3, maxExcitation: null },
      { nOrbitals: 7, nAlpha: 3, nBeta: 2, maxExcitation: 2 },
    ]) {
      const ham = hubbardHamiltonian({ sites: spec.nOrbitals, periodic: true, t: 1, U: 3 });
      const space = buildCiSpace(spec);
      const N = space.determinantCount;
      const H = denseHamiltonian(ham, space);
      const rand = seededRandom(N);
      const c = Float64Array.from({ length: N }, () => rand() - 0.5);
      const out = new Float64Array(N);
      sigma(ham, space, c, out);
      let maxError = 0;
      let maxValue = 0;
      for (let i = 0; i < N; i++) {
        let s = 0;
        for (let j = 0; j < N; j++) s += H[i * N + j] * c[j];
        maxError = Math.max(maxError, Math.abs(s - out[i]));
        maxValue = Math.max(maxValue, Math.abs(s));
      }
      expect(maxValue).toBeGreaterThan(0.1);
      expect(maxError).toBeLessThan(1e-12);
    }
  });
});
