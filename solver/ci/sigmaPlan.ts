/**
 * What the sigma build needs from one Hamiltonian on one space, computed once and cached
 * on the space: the unpacked integral table (pq|rs) at [(p·n+q)·n² + r·n + s], the
 * same-spin string Hamiltonian (values aligned with the same-spin replacement lists)
 * and each string's same-spin diagonal energy Σ_k h_kk + ½ Σ_{k≠l} [(kk|ll) − (kl|lk)].
 *
 * Same-spin couplings between strings I ≠ J (Slater–Condon rules within one spin):
 *   single i→a:  sign · [h_ai + Σ_{k∈J, k≠i} ((ai|kk) − (ak|ki))]
 *   double:      sign · [(ai|bj) − (aj|bi)]
 * Couplings with the other spin's electrons are left to the alpha–beta part.
 */
import { eriIndex } from '../integrals/eriIndex';
import type { OrbitalHamiltonian } from '../types';
import { alphaBetaPlan, AlphaBetaPlan } from './alphaBetaPlan';
import { spinReplacements, SpinReplacements } from './replacements';
import type { CiSpace } from './space';
import type { SpinStrings } from './spinStrings';

export interface SpinSigmaData {
  replacements: SpinReplacements;
  /** Same-spin string Hamiltonian values, one array per sameSpin block. */
  sameSpinValues: Float64Array[];
  /** Same-spin diagonal energy per string. */
  diagonal: Float64Array;
}

export interface SigmaPlan {
  n: number;
  eri4: Float64Array;
  alpha: SpinSigmaData;
  beta: SpinSigmaData;
  /** Grouped alpha replacements and active pairs of the alpha–beta part. */
  alphaBeta: AlphaBetaPlan;
  /** Work arrays reused across sigma calls. */
  scratch: Map<string, Float64Array>;
}

/**
 * The full (pq|rs) table. With orbital irreps, an integral whose four irreps multiply to
 * anything but the totally symmetric one is zero by symmetry and stored as an exact zero
 * (transformed integrals carry round-off of order 1e-17 there), so that the sigma build can
 * skip it.
 */
export function unpackEri(ham: OrbitalHamiltonian): Float64Array {
  const n = ham.nOrbitals;
  const irreps = ham.orbitalIrreps;
  const eri4 = new Float64Array(n ** 4);
  for (let p = 0; p < n; p++)
    for (let q = 0; q < n; q++)
      for (let r = 0; r < n; r++)
        for (let s = 0; s < n; s++) {
          if (irreps && (irreps[p] ^ irreps[q] ^ irreps[r] ^ irreps[s]) !== 0) continue;
          eri4[((p * n + q) * n + r) * n + s] = ham.eri[eriIndex(p, q, r, s)];
        }
  return eri4;
}

function spinData(ham: OrbitalHamiltonian, eri4: Float64Array, strings: SpinStrings, replacements: SpinReplacements): SpinSigmaData {
  const n = ham.nOrbitals;
  const n2 = n * n;
  const n3 = n2 * n;
  const ne = strings.nElectrons;
  const g = (p: number, q: number, r: number, s: number): number => eri4[p * n3 + q * n2 + r * n + s];
  const diagonal = new Float64Array(strings.count);
  for (let I = 0; I < strings.count; I++) {
    let e = 0;
    for (let x = 0; x < ne; x++) {
      const k = strings.occupations[I * ne + x];
      e += ham.h[k * n + k];
      for (let y = x + 1; y < ne; y++) {
        const l = strings.occupations[I * ne + y];
        e += g(k, k, l, l) - g(k, l, l, k);
      }
    }
    diagonal[I] = e;
  }
  const sameSpinValues = replacements.sameSpin.map((block) => {
    const values = new Float64Array(block.source.length);
    const sourceStart = strings.classes[block.sourceClass].start;
    for (let e = 0; e < values.length; e++) {
      const i = block.orbitals[4 * e];
      const a = block.orbitals[4 * e + 1];
      const j = block.orbitals[4 * e + 2];
      const b = block.orbitals[4 * e + 3];
      if (j < 0) {
        const J = sourceStart + block.source[e];
        let v = ham.h[a * n + i];
        for (let x = 0; x < ne; x++) {
          const k = strings.occupations[J * ne + x];
          if (k !== i) v += g(a, i, k, k) - g(a, k, k, i);
        }
        values[e] = block.sign[e] * v;
      } else {
        values[e] = block.sign[e] * (g(a, i, b, j) - g(a, j, b, i));
      }
    }
    return values;
  });
  return { replacements, sameSpinValues, diagonal };
}

export function sigmaPlan(ham: OrbitalHamiltonian, space: CiSpace): SigmaPlan {
  let plan = space.cache.get(ham) as SigmaPlan | undefined;
  if (plan) return plan;
  const eri4 = unpackEri(ham);
  const alpha = spinData(ham, eri4, space.alpha, spinReplacements(space, 'alpha'));
  const beta = spinData(ham, eri4, space.beta, spinReplacements(space, 'beta'));
  plan = {
    n: ham.nOrbitals,
    eri4,
    alpha,
    beta,
    alphaBeta: alphaBetaPlan(space, alpha.replacements.singles, beta.replacements.singles, eri4, ham.nOrbitals),
    scratch: new Map(),
  };
  space.cache.set(ham, plan);
  return plan;
}

