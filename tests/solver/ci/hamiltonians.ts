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
