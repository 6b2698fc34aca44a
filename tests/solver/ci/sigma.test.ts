import { describe, expect, it } from 'vitest';
import { buildCiSpace } from '../../../solver/ci/space';
import { hamiltonianDiagonal, sigma } from '../../../solver/ci/sigma';
import { denseHamiltonian } from '../../../solver/ci/denseHamiltonian';
import { randomHamiltonian, seededRandom } from './hamiltonians';
import { spaceCases } from './spaces';

describe('direct sigma build', () => {
  for (const [caseIndex, { name, spec, irreps }] of spaceCases.entries()) {
    it(`equals the dense Hamiltonian times c on random vectors: ${name}`, () => {
      // oracle: denseHamiltonian from Slater–Condon rules (independent code path)
      const ham = randomHamiltonian(spec.nOrbitals, 100 + caseIndex, irreps);
      const space = buildCiSpace(spec, ham.orbitalIrreps);
      const N = space.determinantCount;
      expect(N).toBeGreaterThan(10);
      const H = denseHamiltonian(ham, space);
      const rand = seededRandom(caseIndex);
      for (let trial = 0; trial < 2; trial++) {
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
      const diagonal = hamiltonianDiagonal(ham, space);
      for (let i = 0; i < N; i++) expect(Math.abs(diagonal[i] - H[i * N + i])).toBeLessThan(1e-12);
    });
  }

  it('keeps only determinants of the target irrep', () => {
    // irrep of a determinant = XOR of its occupied orbitals' irreps (abelian groups; common practice, no source)
    const irreps = [0, 1, 0, 1, 2, 3];
    const space = buildCiSpace({ nOrbitals: 6, nAlpha: 2, nBeta: 2, maxExcitation: null, targetIrrep: 1 }, Int32Array.from(irreps));
    for (const block of space.blocks) {
      const a = space.alpha.classes[block.alphaClass];
      const b = space.beta.classes[block.betaClass];
      expect(a.irrep ^ b.irrep).toBe(1);
    }
    const everything = buildCiSpace({ nOrbitals: 6, nAlpha: 2, nBeta: 2, maxExcitation: null });
    let sum = 0;
    for (let target = 0; target < 4; target++) {
      sum += buildCiSpace({ nOrbitals: 6, nAlpha: 2, nBeta: 2, maxExcitation: null, targetIrrep: target }, Int32Array.from(irreps)).determinantCount;
    }
    expect(sum).toBe(everything.determinantCount); // C(6,2)² = 225 split over the irreps
    expect(everything.determinantCount).toBe(225);
  });
});
