import type { OrbitalHamiltonian } from '../types';
import { eriIndex, eriLength } from '../integrals/eriIndex';
import { badInput, SolverError } from '../errors';
import { symmetricOrthogonaliser } from '../scf/orthogonaliser';
import { moIntegrals } from '../transform/moIntegrals';

/**
 * Ketbook's integral layout: a Hamiltonian over orthonormal orbitals that a user brings
 * from their own code (or downloads from a Ketbook run to start their code from ours).
 *
 *   { "type": "integrals", "orbitals": n, "electrons": N, "multiplicity": 1,
 *     "coreEnergy": E0, "oneBody": [[h00, h01, …], …],
 *     "twoBody": [[p, q, r, s, (pq|rs)], …] }
 *
 * Indices are 0-based; (pq|rs) is in chemists' notation; each 8-fold-symmetric class is
 * listed once (listing another member of the same class is accepted only if its value
 * agrees to 1e-10, so a file written with all 8 permutations still reads). Entries not
 * listed are zero.
 *
 * Non-orthogonal functions (e.g. the basis functions of a molecule) carry their overlap
 * matrix in `"overlap": [[S00, S01, …], …]`; the functions are then orthogonalised
 * symmetrically, X = S^{-1/2} (Löwdin, J. Chem. Phys. 18, 365 (1950)), and the run works
 * with h' = Xᵀ h X and (pq|rs)' transformed by X, so every energy is that of the original
 * functions. S must be n×n, symmetric and positive definite.
 */
export interface IntegralsSystem {
  orbitals: number;
  coreEnergy: number;
  oneBody: number[][];
  twoBody: [number, number, number, number, number][];
  overlap?: number[][];
}

const SYMMETRY_TOLERANCE = 1e-10;

export function orbitalHamiltonianFromIntegrals(system: IntegralsSystem): OrbitalHamiltonian {
  const n = system.orbitals;
  if (!Number.isInteger(n) || n < 1) throw badInput('orbitals must be a positive whole number', 'system.orbitals');
  if (!Number.isFinite(system.coreEnergy)) throw badInput('coreEnergy must be a finite number', 'system.coreEnergy');
  if (system.oneBody.length !== n) {
    throw badInput(`oneBody has ${system.oneBody.length} rows but orbitals is ${n}`, 'system.oneBody');
  }
  const h = new Float64Array(n * n);
  system.oneBody.forEach((row, p) => {
    if (row.length !== n) throw badInput(`oneBody row ${p} has ${row.length} entries, expected ${n}`, `system.oneBody[${p}]`);
    row.forEach((value, q) => {
      if (!Number.isFinite(value)) throw badInput(`oneBody[${p}][${q}] is not a finite number`, `system.oneBody[${p}][${q}]`);
      h[p * n + q] = value;
    });
  });
  for (let p = 0; p < n; p++) {
    for (let q = 0; q < p; q++) {
      if (Math.abs(h[p * n + q] - h[q * n + p]) > SYMMETRY_TOLERANCE) {
        throw badInput(`oneBody is not symmetric: h[${p}][${q}] = ${h[p * n + q]} but h[${q}][${p}] = ${h[q * n + p]}`, 'system.oneBody');
      }
    }
  }

  const eri = new Float64Array(eriLength(n));
  const seen = new Uint8Array(eri.length);
  system.twoBody.forEach((entry, k) => {
    const field = `system.twoBody[${k}]`;
    if (entry.length !== 5) throw badInput(`twoBody entry ${k} must be [p, q, r, s, value]`, field);
    const [p, q, r, s, value] = entry;
    for (const index of [p, q, r, s]) {
      if (!Number.isInteger(index) || index < 0 || index >= n) {
        throw badInput(`twoBody entry ${k} has orbital index ${index}, outside 0…${n - 1}`, field);
      }
    }
    if (!Number.isFinite(value)) throw badInput(`twoBody entry ${k} has a value that is not a finite number`, field);
    const at = eriIndex(p, q, r, s);
    if (seen[at] && Math.abs(eri[at] - value) > SYMMETRY_TOLERANCE) {
      throw badInput(
        `twoBody entry ${k}, (${p}${q}|${r}${s}) = ${value}, contradicts an earlier entry of the same symmetry class (${eri[at]})`,
        field,
      );
    }
    seen[at] = 1;
    eri[at] = value;
  });
  if (system.overlap === undefined) return { nOrbitals: n, coreEnergy: system.coreEnergy, h, eri };
  const x = lowdinOrthogonaliser(system.overlap, n);
  const all = Array.from({ length: n }, (_, p) => p);
  const orthogonal = moIntegrals(h, eri, x, n, all);
  return { nOrbitals: n, coreEnergy: system.coreEnergy, h: orthogonal.h, eri: orthogonal.eri };
}

/** S^{-1/2} of a checked overlap matrix; every failure names system.overlap. */
function lowdinOrthogonaliser(overlap: number[][], n: number): Float64Array {
  const field = 'system.overlap';
  if (overlap.length !== n) throw badInput(`overlap has ${overlap.length} rows but orbitals is ${n}`, field);
  const s = new Float64Array(n * n);
  overlap.forEach((row, p) => {
    if (row.length !== n) throw badInput(`overlap row ${p} has ${row.length} entries, expected ${n}`, `${field}[${p}]`);
    row.forEach((value, q) => {
      if (!Number.isFinite(value)) throw badInput(`overlap[${p}][${q}] is not a finite number`, `${field}[${p}][${q}]`);
      s[p * n + q] = value;
    });
  });
  for (let p = 0; p < n; p++) {
    for (let q = 0; q < p; q++) {
      if (Math.abs(s[p * n + q] - s[q * n + p]) > SYMMETRY_TOLERANCE) {
        throw badInput(`overlap is not symmetric: S[${p}][${q}] = ${s[p * n + q]} but S[${q}][${p}] = ${s[q * n + p]}`, field);
      }
    }
  }
  try {
    return symmetricOrthogonaliser(s, n);
  } catch (error) {
    if (error instanceof SolverError && error.code === 'bad-input') {
      throw badInput(`overlap is not positive definite, so the functions are linearly dependent or not a real overlap (${error.message})`, field);
    }
    throw error;
  }
}

/** The inverse: every non-zero unique integral, canonical order p ≥ q, r ≥ s, pq ≥ rs. */
export function integralsFromOrbitalHamiltonian(ham: OrbitalHamiltonian, dropBelow = 0): IntegralsSystem {
  const n = ham.nOrbitals;
  const oneBody: number[][] = [];
  for (let p = 0; p < n; p++) oneBody.push(Array.from(ham.h.subarray(p * n, (p + 1) * n)));
  const twoBody: [number, number, number, number, number][] = [];
  for (let p = 0; p < n; p++) {
    for (let q = 0; q <= p; q++) {
      const pq = (p * (p + 1)) / 2 + q;
      for (let r = 0; r <= p; r++) {
        for (let s = 0; s <= r; s++) {
          const rs = (r * (r + 1)) / 2 + s;
          if (rs > pq) continue;
          const value = ham.eri[eriIndex(p, q, r, s)];
          if (value !== 0 && Math.abs(value) > dropBelow) twoBody.push([p, q, r, s, value]);
        }
      }
    }
  }
  return { orbitals: n, coreEnergy: ham.coreEnergy, oneBody, twoBody };
}
