import { hubbardHamiltonian } from '../../../solver/system/hubbard';
import type { ScfProblem } from '../../../solver/scf';

/** A Hubbard lattice (t = 1) as an SCF problem over orthonormal site orbitals (overlap = 1). */
export function hubbardProblem(sites: number, U: number, nAlpha: number, nBeta: number, periodic = false): ScfProblem {
  const ham = hubbardHamiltonian({ sites, periodic, t: 1, U });
  const overlap = new Float64Array(sites * sites);
  for (let i = 0; i < sites; i++) overlap[i * sites + i] = 1;
  return { nBasis: sites, overlap, coreHamiltonian: ham.h, eri: ham.eri, nuclearRepulsionHartree: 0, nAlpha, nBeta };
}
