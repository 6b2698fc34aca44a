/** Wolfsberg–Helmholz constant K of the extended-Hückel-like guess (Wolfsberg & Helmholz, J. Chem. Phys. 20, 837 (1952)). */
export const HUCKEL_K = 1.75;

export type GuessKind = 'core' | 'huckel';

/**
 * The matrix whose eigenvectors give the starting orbitals.
 * core: the core Hamiltonian itself (no electron repulsion; orbitals too compact but safe).
 * huckel: H_μμ kept, H_μν = ½ K S_μν (H_μμ + H_νν) for μ ≠ ν with K = 1.75, from the
 * core-Hamiltonian diagonals; its bonding/antibonding pattern is usually closer to the SCF.
 * The Wolfsberg–Helmholz formula models the interaction of functions on two different
 * centres; with `functionAtom` given, pairs on the same atom keep their core-Hamiltonian
 * element instead. Applied to the non-orthogonal 1s and 2s of one atom, the formula would
 * push the 2s above the 2p (Li would start, and stay, in 1s²2p instead of 1s²2s).
 */
export function guessFock(
  kind: GuessKind,
  coreHamiltonian: Float64Array,
  overlap: Float64Array,
  n: number,
  functionAtom?: ArrayLike<number>,
): Float64Array {
  if (kind === 'core') return Float64Array.from(coreHamiltonian);
  const f = new Float64Array(n * n);
  for (let mu = 0; mu < n; mu++) {
    for (let nu = 0; nu < n; nu++) {
      const oneCentre = mu === nu || (functionAtom !== undefined && functionAtom[mu] === functionAtom[nu]);
      f[mu * n + nu] = oneCentre
        ? coreHamiltonian[mu * n + nu]
        : 0.5 * HUCKEL_K * overlap[mu * n + nu] * (coreHamiltonian[mu * n + mu] + coreHamiltonian[nu * n + nu]);
    }
  }
  return f;
}
