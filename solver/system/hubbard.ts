import type { OrbitalHamiltonian } from '../types';
import { eriIndex, eriLength } from '../integrals/eriIndex';
import { badInput } from '../errors';

export interface HubbardLattice {
  sites: number;
  /** A ring joins the last site to the first; it needs at least 3 sites to differ from a chain. */
  periodic: boolean;
  /** Hopping amplitude t (the energy unit of the model). */
  t: number;
  /** On-site repulsion U. */
  U: number;
}

/**
 * The one-band Hubbard model in its site basis,
 *   H = −t Σ⟨ij⟩σ (c†iσ cjσ + h.c.) + U Σi ni↑ ni↓
 * (Hubbard, Proc. R. Soc. A 276, 238 (1963)), written as an orbital Hamiltonian so the
 * CI engine treats it like any other: h_ij = −t for nearest neighbours, (ii|ii) = U,
 * every other integral zero, no core energy.
 */
export function hubbardHamiltonian({ sites, periodic, t, U }: HubbardLattice): OrbitalHamiltonian {
  if (!Number.isInteger(sites) || sites < 2) throw badInput('a Hubbard lattice needs at least 2 sites', 'system.sites');
  if (periodic && sites < 3) throw badInput('a Hubbard ring needs at least 3 sites (2 sites make a chain)', 'system.periodic');
  if (!Number.isFinite(t)) throw badInput('t must be a finite number', 'system.t');
  if (!Number.isFinite(U)) throw badInput('U must be a finite number', 'system.U');

  const n = sites;
  const h = new Float64Array(n * n);
  const bonds = periodic ? n : n - 1;
  for (let bond = 0; bond < bonds; bond++) {
    const i = bond;
    const j = (bond + 1) % n;
    h[i * n + j] -= t;
    h[j * n + i] -= t;
  }
  const eri = new Float64Array(eriLength(n));
  for (let i = 0; i < n; i++) eri[eriIndex(i, i, i, i)] = U;
  return { nOrbitals: n, coreEnergy: 0, h, eri };
}
