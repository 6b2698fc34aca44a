import { describe, expect, it } from 'vitest';
import { buildCiSpace } from '../../../solver/ci/space';
import { sigma } from '../../../solver/ci/sigma';
import { solveCi } from '../../../solver/ci/solveCi';
import { projectOntoParity, sectorDimension, transposePermutation } from '../../../solver/ci/transposeSymmetry';
import { moleculeLikeHamiltonian, randomHamiltonian, seededRandom } from './hamiltonians';
import { spaceCases } from './spaces';

const symmetricCases = [
  ...spaceCases.filter((c) => c.spec.nAlpha === c.spec.nBeta),
  { name: 'irrep CISD 7o 3α3β', spec: { nOrbitals: 7, nAlpha: 3, nBeta: 3, maxExcitation: 2, targetIrrep: 2 }, irreps: [0, 0, 2, 1, 3, 2, 0] },
];

describe('Ms = 0 transpose symmetry', () => {
  for (const [caseIndex, { name, spec, irreps }] of symmetricCases.entries()) {
    it(`symmetric sigma equals the plain sigma for both parities: ${name}`, () => {
      // oracle: the plain sigma build (itself checked against Slater–Condon in sigma.test.ts)
      const ham = randomHamiltonian(spec.nOrbitals, 300 + caseIndex, irreps);
      const space = buildCiSpace(spec, ham.orbitalIrreps);
      const perm = transposePermutation(space);
      expect(perm).not.toBeNull();
      const N = space.determinantCount;
      const rand = seededRandom(40 + caseIndex);
      for (const parity of [1, -1] as const) {
        const c = Float64Array.from({ length: N }, () => rand() - 0.5);
        projectOntoParity(perm!, c, parity);
        const plain = new Float64Array(N);
        const symmetric = new Float64Array(N);
        sigma(ham, space, c, plain);
        sigma(ham, space, c, symmetric, { transposeParity: parity });
        let maxError = 0;
        let maxValue = 0;
        for (let i = 0; i < N; i++) {
          maxError = Math.max(maxError, Math.abs(plain[i] - symmetric[i]));
          maxValue = Math.max(maxValue, Math.abs(plain[i]));
        }
        expect(maxValue).toBeGreaterThan(0.1);
        expect(maxError).toBeLessThan(1e-12);
      }
    });
  }

  it('gives singlets parity +1 and triplets parity −1, and sector sizes add up', () => {
    // C(α,β) = (−1)^S C(β,α) for spin eigenstates with nα = nβ (Knowles & Handy, Chem. Phys. Lett. 111, 315 (1984))
    const ham = randomHamiltonian(5, 3);
    const sol = solveCi(ham, { nOrbitals: 5, nAlpha: 2, nBeta: 2, maxExcitation: null }, { method: 'dense', roots: 10 });
    const perm = transposePermutation(sol.space)!;
    let singlets = 0;
    let triplets = 0;
    sol.vectors.forEach((v, r) => {
      let overlap = 0;
      for (let i = 0; i < v.length; i++) overlap += v[i] * v[perm[i]];
      if (Math.abs(sol.s2[r]) < 1e-8) {
        singlets++;
        expect(overlap).toBeCloseTo(1, 10);
      } else if (Math.abs(sol.s2[r] - 2) < 1e-8) {
        triplets++;
        expect(overlap).toBeCloseTo(-1, 10);
      }
    });
    expect(singlets).toBeGreaterThan(0);
    expect(triplets).toBeGreaterThan(0);
    // C(5,2)² = 100 determinants, 10 of them self-transposed (Iα = Iβ): 55 even, 45 odd
    expect(sectorDimension(perm, 1)).toBe(55);
    expect(sectorDimension(perm, -1)).toBe(45);
  });

  it('is absent for nα ≠ nβ, and sigma then refuses a parity', () => {
    const spec = { nOrbitals: 6, nAlpha: 3, nBeta: 2, maxExcitation: null };
    const ham = randomHamiltonian(6, 1);
    const space = buildCiSpace(spec);
    expect(transposePermutation(space)).toBeNull();
    const c = new Float64Array(space.determinantCount).fill(1);
    expect(() => sigma(ham, space, c, new Float64Array(c.length), { transposeParity: 1 })).toThrow(/transpose symmetry/);
  });

  it('solveCi in one parity sector matches the dense singlets and triplets of a molecule-like Hamiltonian', () => {
    // two independent diagonalisations: dense over the whole space vs Davidson in one transpose sector
    const ham = moleculeLikeHamiltonian(6, 11);
    const spec = { nOrbitals: 6, nAlpha: 3, nBeta: 3, maxExcitation: null };
    for (const multiplicity of [1, 3]) {
      const dense = solveCi(ham, spec, { roots: 2, targetMultiplicity: multiplicity, method: 'dense' });
      const iterative = solveCi(ham, spec, { roots: 2, targetMultiplicity: multiplicity, method: 'davidson' });
      // the whole-space Davidson search, for the same roots
      const plain = solveCi(ham, spec, { roots: 2, targetMultiplicity: multiplicity, method: 'davidson', transposeSymmetry: false });
      for (let r = 0; r < 2; r++) {
        expect(Math.abs(dense.energies[r] - iterative.energies[r])).toBeLessThan(1e-10);
        expect(Math.abs(plain.energies[r] - iterative.energies[r])).toBeLessThan(1e-10);
        expect(Math.abs(iterative.s2[r] - (multiplicity === 1 ? 0 : 2))).toBeLessThan(1e-6);
      }
    }
  });
});
