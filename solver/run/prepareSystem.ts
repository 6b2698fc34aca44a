import type { BasisSet, Molecule, OrbitalHamiltonian } from '../types';
import type { RunFile } from '../runFile/schema';
import { buildMolecule, nuclearRepulsionHartree, electronCount } from '../system/molecule';
import { hubbardHamiltonian } from '../system/hubbard';
import { orbitalHamiltonianFromIntegrals } from '../system/integralsFile';
import { buildBasis } from '../basis';
import { symmetryFrame } from '../symmetry';
import { badInput } from '../errors';

/** A molecule ready for SCF: in its symmetry frame, with its basis. */
export interface PreparedMolecule {
  kind: 'molecule';
  molecule: Molecule;
  pointGroup: string | null;
  symmetry: ReturnType<typeof symmetryFrame> | null;
  basis: BasisSet;
  nuclearRepulsionHartree: number;
  nElectrons: number;
  twoS: number;
}

/** A model Hamiltonian given directly over orthonormal orbitals (Hubbard, integral file). */
export interface PreparedModel {
  kind: 'model';
  type: 'hubbard' | 'integrals';
  hamiltonian: OrbitalHamiltonian;
  nElectrons: number;
  twoS: number;
}

export type PreparedSystem = PreparedMolecule | PreparedModel;

export function prepareSystem(runFile: RunFile): PreparedSystem {
  const system = runFile.system;
  if (system.type === 'molecule') {
    const input = buildMolecule({
      atoms: system.atoms.map(([symbol, x, y, z, marker]) => ({ symbol, position: [x, y, z], ghost: marker?.ghost ?? false })),
      units: system.units,
      charge: system.charge,
      multiplicity: system.multiplicity,
    });
    // Orient the molecule in its symmetry frame before building the basis: energies do not
    // depend on orientation, and orbital labels need the group's axes on x, y, z.
    const symmetry = runFile.symmetry ? symmetryFrame(input) : null;
    const molecule = symmetry ? symmetry.molecule : input;
    const basis = buildBasis(molecule, system.basis, system.zeta);
    return {
      kind: 'molecule',
      molecule,
      pointGroup: symmetry ? symmetry.pointGroup : null,
      symmetry,
      basis,
      nuclearRepulsionHartree: nuclearRepulsionHartree(molecule),
      nElectrons: electronCount(molecule),
      twoS: system.multiplicity - 1,
    };
  }
  const twoS = system.multiplicity - 1;
  if ((system.electrons - twoS) % 2 !== 0 || twoS > system.electrons) {
    throw badInput(`${system.electrons} electrons cannot have multiplicity ${system.multiplicity}`, 'system.multiplicity');
  }
  const hamiltonian =
    system.type === 'hubbard'
      ? hubbardHamiltonian({ sites: system.sites, periodic: system.periodic, t: system.t, U: system.U })
      : orbitalHamiltonianFromIntegrals(system);
  const orbitals = hamiltonian.nOrbitals;
  if ((system.electrons + twoS) / 2 > orbitals) {
    throw badInput(`${orbitals} orbitals cannot hold ${system.electrons} electrons with multiplicity ${system.multiplicity}`, 'system.multiplicity');
  }
  return { kind: 'model', type: system.type, hamiltonian, nElectrons: system.electrons, twoS };
}
