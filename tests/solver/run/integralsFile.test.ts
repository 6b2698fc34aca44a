import { describe, expect, it } from 'vitest';
import { orbitalHamiltonianFromIntegrals, integralsFromOrbitalHamiltonian } from '../../../solver/system/integralsFile';
import { hubbardHamiltonian } from '../../../solver/system/hubbard';
import { eriIndex } from '../../../solver/integrals/eriIndex';

describe("Ketbook's integral layout", () => {
  it('round-trips a Hamiltonian exactly', () => {
    const ham = hubbardHamiltonian({ sites: 4, periodic: true, t: 1, U: 3 });
    const back = orbitalHamiltonianFromIntegrals(integralsFromOrbitalHamiltonian(ham));
    expect(Array.from(back.h)).toEqual(Array.from(ham.h));
    expect(Array.from(back.eri)).toEqual(Array.from(ham.eri));
  });

  it('accepts all eight permutations of one integral when they agree', () => {
    const perms: [number, number, number, number][] = [[1, 0, 1, 0], [0, 1, 1, 0], [1, 0, 0, 1], [0, 1, 0, 1]];
    const ham = orbitalHamiltonianFromIntegrals({
      orbitals: 2,
      coreEnergy: 0.5,
      oneBody: [[-1, 0.1], [0.1, -0.5]],
      twoBody: perms.map(([p, q, r, s]) => [p, q, r, s, 0.25] as [number, number, number, number, number]),
    });
    expect(ham.eri[eriIndex(0, 1, 0, 1)]).toBe(0.25);
  });

  it('refuses asymmetric, contradictory, out-of-range and non-finite input', () => {
    const base = { orbitals: 2, coreEnergy: 0, oneBody: [[0, 1], [1, 0]], twoBody: [] as [number, number, number, number, number][] };
    expect(() => orbitalHamiltonianFromIntegrals({ ...base, oneBody: [[0, 1], [2, 0]] })).toThrow(/not symmetric/);
    expect(() => orbitalHamiltonianFromIntegrals({ ...base, twoBody: [[0, 0, 1, 1, 0.5], [1, 1, 0, 0, 0.6]] })).toThrow(/contradicts/);
    expect(() => orbitalHamiltonianFromIntegrals({ ...base, twoBody: [[0, 0, 2, 1, 0.5]] })).toThrow(/outside 0…1/);
    expect(() => orbitalHamiltonianFromIntegrals({ ...base, oneBody: [[0, Number.NaN], [1, 0]] })).toThrow(/finite/);
    expect(() => orbitalHamiltonianFromIntegrals({ ...base, oneBody: [[0, 1]] })).toThrow(/rows/);
  });

  it('builds the Hubbard ring with −t between neighbours and U on site', () => {
    const ham = hubbardHamiltonian({ sites: 3, periodic: true, t: 1.5, U: 2 });
    // H = −t Σ⟨ij⟩ c†c + U Σ n↑n↓ (Hubbard, Proc. R. Soc. A 276, 238 (1963)).
    expect(ham.h[0 * 3 + 2]).toBe(-1.5);
    expect(ham.h[1 * 3 + 1]).toBe(0);
    expect(ham.eri[eriIndex(2, 2, 2, 2)]).toBe(2);
    expect(() => hubbardHamiltonian({ sites: 2, periodic: true, t: 1, U: 1 })).toThrow(/ring needs at least 3/);
  });
});
