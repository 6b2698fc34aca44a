/**
 * Brute-force oracle: ⟨I|H|J⟩ by applying the second-quantised Hamiltonian
 * H = E_core + Σ_pq h_pq Σ_σ a†_pσ a_qσ + ½ Σ_pqrs (pq|rs) Σ_στ a†_pσ a†_rτ a_sτ a_qσ
 * operator by operator to bit patterns (Szabo & Ostlund (1996) §2.3 for the form of H).
 * Spin orbital index: alpha p → p, beta p → n + p, matching the engine's alpha-before-beta order.
 */
import { eriIndex } from '../../../solver/integrals/eriIndex';
import type { OrbitalHamiltonian } from '../../../solver/types';

type State = { bits: number; sign: number } | null;

function annihilate(state: State, k: number): State {
  if (!state || !((state.bits >> k) & 1)) return null;
  let below = 0;
  for (let j = 0; j < k; j++) below += (state.bits >> j) & 1;
  return { bits: state.bits & ~(1 << k), sign: below % 2 ? -state.sign : state.sign };
}

function create(state: State, k: number): State {
  if (!state || (state.bits >> k) & 1) return null;
  let below = 0;
  for (let j = 0; j < k; j++) below += (state.bits >> j) & 1;
  return { bits: state.bits | (1 << k), sign: below % 2 ? -state.sign : state.sign };
}

export function bruteForceElement(ham: OrbitalHamiltonian, I: { alpha: number; beta: number }, J: { alpha: number; beta: number }): number {
  const n = ham.nOrbitals;
  const bra = I.alpha | (I.beta << n);
  const ket: State = { bits: J.alpha | (J.beta << n), sign: 1 };
  let value = bra === ket.bits ? ham.coreEnergy : 0;
  for (let p = 0; p < n; p++)
    for (let q = 0; q < n; q++)
      for (const s of [0, n]) {
        const out = create(annihilate(ket, q + s), p + s);
        if (out && out.bits === bra) value += ham.h[p * n + q] * out.sign;
      }
  for (let p = 0; p < n; p++)
    for (let q = 0; q < n; q++)
      for (let r = 0; r < n; r++)
        for (let t = 0; t < n; t++) {
          const g = ham.eri[eriIndex(p, q, r, t)];
          if (g === 0) continue;
          for (const s1 of [0, n])
            for (const s2 of [0, n]) {
              const out = create(create(annihilate(annihilate(ket, q + s1), t + s2), r + s2), p + s1);
              if (out && out.bits === bra) value += 0.5 * g * out.sign;
            }
        }
  return value;
}
