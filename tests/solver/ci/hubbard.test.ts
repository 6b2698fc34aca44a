import { describe, expect, it } from 'vitest';
import { solveCi } from '../../../solver/ci/solveCi';
import { hubbardHamiltonian } from '../../../solver/system/hubbard';

/** Sum of the lowest `electrons` one-electron levels for each spin (U = 0: the determinant of filled band levels). */
function filledBandEnergy(levels: number[], nAlpha: number, nBeta: number): number {
  const sorted = [...levels].sort((a, b) => a - b);
  const sum = (k: number): number => sorted.slice(0, k).reduce((s, e) => s + e, 0);
  return sum(nAlpha) + sum(nBeta);
}

describe('Hubbard models against analytic results', () => {
  it('dimer at half filling: the whole Ms = 0 spectrum', () => {
    // analytic two-site Hubbard spectrum (standard result): (U ∓ √(U²+16t²))/2, 0 (triplet), U
    const t = 1;
    const U = 4;
    const root = Math.sqrt(U * U + 16 * t * t);
    const sol = solveCi(hubbardHamiltonian({ sites: 2, periodic: false, t, U }), { nOrbitals: 2, nAlpha: 1, nBeta: 1, maxExcitation: null }, { roots: 4 });
    const expected = [(U - root) / 2, 0, U, (U + root) / 2];
    sol.energies.forEach((e, i) => expect(Math.abs(e - expected[i])).toBeLessThan(1e-12));
    const spins = [0, 2, 0, 0]; // singlet, triplet (S = 1: S(S+1) = 2), singlet, singlet
    sol.s2.forEach((s, i) => expect(Math.abs(s - spins[i])).toBeLessThan(1e-10));
    expect(sol.method).toBe('dense');
  });

  it('dimer triplet is found by targetMultiplicity', () => {
    // analytic: the only triplet of the half-filled dimer has energy 0
    const sol = solveCi(hubbardHamiltonian({ sites: 2, periodic: false, t: 1, U: 4 }), { nOrbitals: 2, nAlpha: 1, nBeta: 1, maxExcitation: null }, { targetMultiplicity: 3 });
    expect(Math.abs(sol.energies[0])).toBeLessThan(1e-12);
    expect(Math.abs(sol.s2[0] - 2)).toBeLessThan(1e-10);
  });

  const cases = [
    { sites: 6, periodic: true, nAlpha: 3, nBeta: 3 },
    { sites: 8, periodic: true, nAlpha: 3, nBeta: 3 },
    { sites: 6, periodic: false, nAlpha: 3, nBeta: 3 },
    { sites: 8, periodic: false, nAlpha: 3, nBeta: 3 },
  ];
  for (const { sites, periodic, nAlpha, nBeta } of cases) {
    it(`U = 0 ${periodic ? 'ring' : 'chain'} of ${sites} sites with ${nAlpha + nBeta} electrons fills the band`, () => {
      // analytic tight-binding levels (standard results): ring −2t cos(2πk/N), k = 0…N−1; chain −2t cos(πk/(N+1)), k = 1…N
      const t = 1;
      const levels = periodic
        ? Array.from({ length: sites }, (_, k) => -2 * t * Math.cos((2 * Math.PI * k) / sites))
        : Array.from({ length: sites }, (_, k) => -2 * t * Math.cos((Math.PI * (k + 1)) / (sites + 1)));
      const sol = solveCi(hubbardHamiltonian({ sites, periodic, t, U: 0 }), { nOrbitals: sites, nAlpha, nBeta, maxExcitation: null });
      expect(Math.abs(sol.energies[0] - filledBandEnergy(levels, nAlpha, nBeta))).toBeLessThan(1e-9);
      expect(Math.abs(sol.s2[0])).toBeLessThan(1e-8);
    });
  }
});
