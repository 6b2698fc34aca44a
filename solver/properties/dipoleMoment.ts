import { AU_TO_DEBYE } from '../constants';
import type { Molecule, Vec3 } from '../types';
import { nuclearCharge } from './mullikenCharges';

export interface DipoleMoment {
  /** e·bohr, about the origin given. */
  vectorAu: Vec3;
  magnitudeDebye: number;
}

/**
 * Electric dipole moment μ = Σ_A Z_A (R_A − O) − Σ_μν P_μν ⟨μ|r − O|ν⟩ (common practice, no source).
 * `dipoleMatrices` are the AO matrices of x − O_x, y − O_y, z − O_z about the same origin O
 * (as dipoleMatrices(basis, originBohr) returns them). For a neutral molecule μ does not
 * depend on O; for an ion it does, so callers pass the centre of mass.
 */
export function dipoleMomentDebye(
  densityTotal: Float64Array,
  dipoleMatrices: readonly [Float64Array, Float64Array, Float64Array] | readonly Float64Array[],
  molecule: Molecule,
  originBohr: Vec3,
): DipoleMoment {
  const vectorAu: Vec3 = [0, 0, 0];
  for (const atom of molecule.atoms) {
    const z = nuclearCharge(atom);
    for (let k = 0; k < 3; k++) vectorAu[k] += z * (atom.positionBohr[k] - originBohr[k]);
  }
  for (let k = 0; k < 3; k++) {
    const m = dipoleMatrices[k];
    let electronic = 0;
    for (let i = 0; i < m.length; i++) electronic += densityTotal[i] * m[i];
    vectorAu[k] -= electronic;
  }
  const magnitudeDebye = Math.hypot(vectorAu[0], vectorAu[1], vectorAu[2]) * AU_TO_DEBYE;
  return { vectorAu, magnitudeDebye };
}
