import { congruence, multiply, symmetricEigen } from './denseAlgebra';

export interface Orbitals {
  /** Ascending orbital energies. */
  energies: Float64Array;
  /** n×n row-major AO coefficients, column j = MO j. */
  coefficients: Float64Array;
}

/** Two coefficients closer than this in magnitude count as tied when fixing phases. */
const PHASE_TIE = 1e-8;

/**
 * Make each MO's largest-|c| coefficient positive (the first such, in AO order, when
 * several tie within 1e-8). Eigenvectors are defined only up to sign; fixing it makes
 * coefficients, scans and exported integrals reproducible run to run.
 */
export function fixPhases(coefficients: Float64Array, n: number): void {
  for (let j = 0; j < n; j++) {
    let largest = 0;
    for (let i = 0; i < n; i++) largest = Math.max(largest, Math.abs(coefficients[i * n + j]));
    let sign = 1;
    for (let i = 0; i < n; i++) {
      const c = coefficients[i * n + j];
      if (Math.abs(c) >= largest - PHASE_TIE) {
        sign = c < 0 ? -1 : 1;
        break;
      }
    }
    if (sign < 0) for (let i = 0; i < n; i++) coefficients[i * n + j] = -coefficients[i * n + j];
  }
}

/**
 * Solve F C = S C ε through the orthogonaliser X (Xᵀ S X = 1): diagonalise Xᵀ F X = C' ε C'ᵀ
 * and back-transform C = X C' (Roothaan, Rev. Mod. Phys. 23, 69 (1951)).
 */
export function diagonaliseFock(fock: Float64Array, orthogonaliser: Float64Array, n: number): Orbitals {
  const { values, vectors } = symmetricEigen(congruence(fock, orthogonaliser, n), n);
  const coefficients = multiply(orthogonaliser, vectors, n);
  fixPhases(coefficients, n);
  return { energies: values, coefficients };
}

/** D_μν = Σ_i w_i C_μi C_νi over MOs with occupation weights w (0 or 1 per spin). */
export function densityFromOrbitals(coefficients: Float64Array, occupations: Float64Array, n: number): Float64Array {
  const d = new Float64Array(n * n);
  for (let k = 0; k < n; k++) {
    const w = occupations[k];
    if (w === 0) continue;
    for (let mu = 0; mu < n; mu++) {
      const c = coefficients[mu * n + k] * w;
      if (c === 0) continue;
      for (let nu = 0; nu < n; nu++) d[mu * n + nu] += c * coefficients[nu * n + k];
    }
  }
  return d;
}

/** Aufbau occupations: the lowest `count` orbitals hold one electron each. */
export function aufbauOccupations(n: number, count: number): Float64Array {
  const occ = new Float64Array(n);
  for (let i = 0; i < count; i++) occ[i] = 1;
  return occ;
}

/**
 * Rotate MO columns p and q by angle θ: p' = cos θ p + sin θ q, q' = −sin θ p + cos θ q.
 * Used to break the spatial symmetry of a UHF guess (a HOMO–LUMO mix).
 */
export function rotateOrbitalPair(coefficients: Float64Array, n: number, p: number, q: number, angle: number): Float64Array {
  const c = Float64Array.from(coefficients);
  const cs = Math.cos(angle);
  const sn = Math.sin(angle);
  for (let mu = 0; mu < n; mu++) {
    const a = coefficients[mu * n + p];
    const b = coefficients[mu * n + q];
    c[mu * n + p] = cs * a + sn * b;
    c[mu * n + q] = -sn * a + cs * b;
  }
  return c;
}
