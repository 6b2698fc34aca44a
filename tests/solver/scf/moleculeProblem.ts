import { buildMolecule, nuclearRepulsionHartree, alphaBetaCounts } from '../../../solver/system/molecule';
import { buildBasis, type ZetaSpec } from '../../../solver/basis';
import { overlapMatrix, kineticMatrix, nuclearAttractionMatrix, electronRepulsionIntegrals } from '../../../solver/integrals';
import type { ScfProblem } from '../../../solver/scf';
import type { BasisSet, Molecule, Vec3 } from '../../../solver/types';

export interface MoleculeCase {
  problem: ScfProblem;
  molecule: Molecule;
  basis: BasisSet;
}

/** An STO-3G SCF problem through the project's molecule, basis and integral code. */
export function sto3gProblem(
  atoms: [string, number, number, number][],
  { charge = 0, multiplicity = 1, zeta }: { charge?: number; multiplicity?: number; zeta?: ZetaSpec } = {},
): MoleculeCase {
  const molecule = buildMolecule({
    atoms: atoms.map(([symbol, x, y, z]) => ({ symbol, position: [x, y, z] as Vec3 })),
    units: 'bohr',
    charge,
    multiplicity,
  });
  const basis = buildBasis(molecule, 'STO-3G', zeta);
  const n = basis.nFunctions;
  const kinetic = kineticMatrix(basis);
  const attraction = nuclearAttractionMatrix(basis, molecule);
  const coreHamiltonian = new Float64Array(n * n);
  for (let i = 0; i < n * n; i++) coreHamiltonian[i] = kinetic[i] + attraction[i];
  const { nAlpha, nBeta } = alphaBetaCounts(molecule);
  return {
    molecule,
    basis,
    problem: {
      nBasis: n,
      overlap: overlapMatrix(basis),
      coreHamiltonian,
      eri: electronRepulsionIntegrals(basis),
      nuclearRepulsionHartree: nuclearRepulsionHartree(molecule),
      nAlpha,
      nBeta,
      functionAtom: basis.functionAtom,
    },
  };
}

/** Water at R(OH) = 1.809 bohr, ∠HOH = 104.52° (near-experimental geometry; from memory of Szabo & Ostlund (1996) ch. 3). */
export function waterAtoms(): [string, number, number, number][] {
  const r = 1.809;
  const half = ((104.52 / 2) * Math.PI) / 180;
  return [
    ['O', 0, 0, 0],
    ['H', r * Math.sin(half), 0, r * Math.cos(half)],
    ['H', -r * Math.sin(half), 0, r * Math.cos(half)],
  ];
}
