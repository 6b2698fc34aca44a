/** Wolfsberg–Helmholz constant K of the extended-Hückel-like guess (Wolfsberg & Helmholz, J. Chem. Phys. 20, 837 (1952)). */
export const HUCKEL_K = 1.75;

export type GuessKind = 'core' | 'huckel';

/**
 * The matrix whose eigenvectors give the starting orbitals.
 * core: the core Hamiltonian itself (no electron repulsion; orbitals too compact but safe).
 * huckel: H_μμ kept, H_μν = ½ K S_μν (H_μμ + H_νν) for μ ≠ ν with K = 1.75, from the
 * core-Hamiltonian diagonals; its bonding/antibonding pattern is usually closer to the SCF.
 */
export function guessFock(kind: GuessKind, coreHamiltonian: Float64Array, overlap: Float64Array, n: number): Float64Array {
  if (kind === 'core') return Float64Array.from(coreHamiltonian);
  const f = new Float64Array(n * n);
  for (let mu = 0; mu < n; mu++) {
    for (let nu = 0; nu < n; nu++) {
      f[mu * n + nu] =
        mu === nu
          ? coreHamiltonian[mu * n + mu]
          : 0.5 * HUCKEL_K * overlap[mu * n + nu] * (coreHamiltonian[mu * n + mu] + coreHamiltonian[nu * n + nu]);
    }
  }
  return f;
}
