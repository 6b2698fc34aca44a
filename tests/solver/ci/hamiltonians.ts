/**
 * Test Hamiltonians: seeded random ones with the 8-fold symmetry of real orbitals (the
 * packed storage enforces it), optionally with orbital irreps and the integrals they forbid zeroed.
 */
import { eriIndex, eriLength } from '../../../solver/integrals/eriIndex';
import type { OrbitalHamiltonian } from '../../../solver/types';

/** mulberry32, a small seeded generator (common practice, no source). */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function randomHamiltonian(n: number, seed: number, irreps?: number[]): OrbitalHamiltonian {
  const rand = seededRandom(seed);
  const h = new Float64Array(n * n);
  for (let p = 0; p < n; p++) {
    for (let q = 0; q <= p; q++) {
      const v = p === q ? -2 + 0.5 * p + 0.2 * rand() : 0.3 * (rand() - 0.5);
      h[p * n + q] = v;
      h[q * n + p] = v;
    }
  }
  const eri = new Float64Array(eriLength(n));
  for (let i = 0; i < eri.length; i++) eri[i] = 0.1 * (rand() - 0.5);
  // diagonal-ish Coulomb integrals large and positive, like real ones
  for (let p = 0; p < n; p++) for (let q = 0; q < n; q++) eri[eriIndex(p, p, q, q)] = 0.4 + 0.2 * rand();
  const ham: OrbitalHamiltonian = { nOrbitals: n, coreEnergy: 1.5 * rand(), h, eri };
  if (irreps) {
    ham.orbitalIrreps = Int32Array.from(irreps);
    // zero integrals that the symmetry forbids, as a real symmetric system would
    for (let p = 0; p < n; p++) for (let q = 0; q < n; q++) if (irreps[p] !== irreps[q]) h[p * n + q] = 0;
    for (let p = 0; p < n; p++)
      for (let q = 0; q < n; q++)
        for (let r = 0; r < n; r++)
          for (let s = 0; s < n; s++) if ((irreps[p] ^ irreps[q] ^ irreps[r] ^ irreps[s]) !== 0) eri[eriIndex(p, q, r, s)] = 0;
  }
  return ham;
}

/**
 * A Hamiltonian that behaves like a small molecule's in its own canonical HF orbitals:
 * orbital energies spread over −0.6 … −0.35 Eh (occupied) and +0.35 … +0.8 Eh (virtual),
 * Coulomb integrals (pp|qq) ≈ 0.2–0.4, exchange (pq|qp) ≈ 0.03–0.1 and every other
 * integral ≈ ±0.005–0.03, all with the 8-fold symmetry of real orbitals. The one-electron
 * matrix is chosen so that the closed-shell Fock matrix of the lowest nOccupied orbitals
 * is diagonal with those orbital energies, h_pq = ε_p δ_pq − Σ_k [2(pq|kk) − (pk|kq)]
 * (Szabo & Ostlund (1996) eq. 3.154), so the aufbau determinant satisfies Brillouin's
 * theorem and the CI matrix is diagonally dominant, as for a molecule near equilibrium.
 */
export function moleculeLikeHamiltonian(n: number, seed: number, nOccupied: number = Math.floor(n / 2)): OrbitalHamiltonian {
  const rand = seededRandom(seed);
  const eri = new Float64Array(eriLength(n));
  for (let i = 0; i < eri.length; i++) eri[i] = (rand() < 0.5 ? -1 : 1) * (0.005 + 0.025 * rand());
  for (let p = 0; p < n; p++) {
    for (let q = 0; q < n; q++) {
      if (p === q) continue;
      eri[eriIndex(p, p, q, q)] = 0.2 + 0.2 * rand();
      eri[eriIndex(p, q, q, p)] = 0.03 + 0.07 * rand();
    }
    eri[eriIndex(p, p, p, p)] = 0.5 + 0.2 * rand();
  }
  const orbitalEnergies = new Float64Array(n);
  const nVirtual = n - nOccupied;
  for (let p = 0; p < nOccupied; p++) orbitalEnergies[p] = -0.6 + (nOccupied > 1 ? (0.25 * p) / (nOccupied - 1) : 0) + 0.02 * rand();
  for (let a = 0; a < nVirtual; a++) orbitalEnergies[nOccupied + a] = 0.35 + (nVirtual > 1 ? (0.45 * a) / (nVirtual - 1) : 0) + 0.02 * rand();
  const h = new Float64Array(n * n);
  for (let p = 0; p < n; p++) {
    for (let q = 0; q < n; q++) {
      let twoElectron = 0;
      for (let k = 0; k < nOccupied; k++) twoElectron += 2 * eri[eriIndex(p, q, k, k)] - eri[eriIndex(p, k, k, q)];
      h[p * n + q] = (p === q ? orbitalEnergies[p] : 0) - twoElectron;
    }
  }
  return { nOrbitals: n, coreEnergy: 2 + rand(), h, eri };
}
