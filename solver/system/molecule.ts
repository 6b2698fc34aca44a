import type { Atom, Molecule, Vec3 } from '../types';
import { ANGSTROM_TO_BOHR } from '../constants';
import { badInput } from '../errors';
import { elementBySymbol } from './elements';

export interface MoleculeInput {
  atoms: { symbol: string; position: Vec3 | number[]; ghost?: boolean }[];
  units: 'bohr' | 'angstrom';
  charge: number;
  multiplicity: number;
}

/** Atoms closer than this are almost surely a typing error (and make the basis near-singular). */
export const MIN_ATOM_DISTANCE_BOHR = 0.1;

function distanceBohr(a: Vec3, b: Vec3): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
}

/**
 * Validates user input and returns a molecule in bohr. Errors are bad input naming the
 * run-file field (system.atoms[i], system.charge, system.multiplicity).
 */
export function buildMolecule(input: MoleculeInput): Molecule {
  if (!input.atoms || input.atoms.length === 0) throw badInput('add at least one atom', 'system.atoms');
  const scale = input.units === 'angstrom' ? ANGSTROM_TO_BOHR : 1;
  if (input.units !== 'angstrom' && input.units !== 'bohr') {
    throw badInput(`units must be "bohr" or "angstrom", not "${String(input.units)}"`, 'system.units');
  }
  const atoms: Atom[] = input.atoms.map((entry, i) => {
    const field = `system.atoms[${i}]`;
    const element = elementBySymbol(entry.symbol, field);
    if (!Array.isArray(entry.position) || entry.position.length !== 3) {
      throw badInput(`atom ${i + 1} (${element.symbol}) needs three coordinates x, y, z`, field);
    }
    if (!entry.position.every((c) => typeof c === 'number' && Number.isFinite(c))) {
      throw badInput(`atom ${i + 1} (${element.symbol}) has a coordinate that is not a finite number`, field);
    }
    const positionBohr: Vec3 = [entry.position[0] * scale, entry.position[1] * scale, entry.position[2] * scale];
    return { symbol: element.symbol, atomicNumber: element.atomicNumber, positionBohr, ghost: entry.ghost === true };
  });
  // Ghosts count too: two sets of basis functions on one point make the overlap matrix singular.
  for (let i = 0; i < atoms.length; i++) {
    for (let j = 0; j < i; j++) {
      const d = distanceBohr(atoms[i].positionBohr, atoms[j].positionBohr);
      if (d < MIN_ATOM_DISTANCE_BOHR) {
        throw badInput(
          `atoms ${j + 1} (${atoms[j].symbol}) and ${i + 1} (${atoms[i].symbol}) are only ${d.toPrecision(3)} bohr apart; ` +
            `atoms must be at least ${MIN_ATOM_DISTANCE_BOHR} bohr apart`,
          `system.atoms[${i}]`,
        );
      }
    }
  }
  if (!Number.isInteger(input.charge)) throw badInput('charge must be a whole number', 'system.charge');
  if (!Number.isInteger(input.multiplicity) || input.multiplicity < 1) {
    throw badInput('multiplicity must be a whole number of at least 1', 'system.multiplicity');
  }
  const molecule: Molecule = { atoms, charge: input.charge, multiplicity: input.multiplicity };
  const electrons = electronCount(molecule);
  if (electrons < 1) {
    throw badInput(`charge ${input.charge} leaves ${electrons} electrons; at least one electron is needed`, 'system.charge');
  }
  const unpaired = input.multiplicity - 1;
  if (unpaired > electrons || (electrons - unpaired) % 2 !== 0) {
    throw badInput(`${electrons} electrons cannot have multiplicity ${input.multiplicity}`, 'system.multiplicity');
  }
  return molecule;
}

/** Number of electrons: nuclear charges of the real (non-ghost) atoms minus the charge. */
export function electronCount(m: Molecule): number {
  let z = 0;
  for (const atom of m.atoms) if (!atom.ghost) z += atom.atomicNumber;
  return z - m.charge;
}

/** α and β electron counts for the molecule's multiplicity, high spin (nAlpha ≥ nBeta). */
export function alphaBetaCounts(m: Molecule): { nAlpha: number; nBeta: number } {
  const n = electronCount(m);
  const twoS = m.multiplicity - 1;
  return { nAlpha: (n + twoS) / 2, nBeta: (n - twoS) / 2 };
}

/** Σ_{A<B} Z_A Z_B / R_AB over real atoms, in hartree. */
export function nuclearRepulsionHartree(m: Molecule): number {
  let energyHartree = 0;
  const atoms = m.atoms;
  for (let i = 0; i < atoms.length; i++) {
    if (atoms[i].ghost) continue;
    for (let j = 0; j < i; j++) {
      if (atoms[j].ghost) continue;
      energyHartree += (atoms[i].atomicNumber * atoms[j].atomicNumber) / distanceBohr(atoms[i].positionBohr, atoms[j].positionBohr);
    }
  }
  return energyHartree;
}

/** Centre of mass of the real atoms with their most abundant isotopes, in bohr. */
export function centreOfMassBohr(m: Molecule): Vec3 {
  let total = 0;
  const c: Vec3 = [0, 0, 0];
  for (const atom of m.atoms) {
    if (atom.ghost) continue;
    const massU = elementBySymbol(atom.symbol).isotopeMassU;
    total += massU;
    for (let k = 0; k < 3; k++) c[k] += massU * atom.positionBohr[k];
  }
  if (total === 0) return [0, 0, 0];
  return [c[0] / total, c[1] / total, c[2] / total];
}

/** A copy of the molecule moved by `shiftBohr`. */
export function translateMolecule(m: Molecule, shiftBohr: Vec3): Molecule {
  return {
    ...m,
    atoms: m.atoms.map((a) => ({
      ...a,
      positionBohr: [a.positionBohr[0] + shiftBohr[0], a.positionBohr[1] + shiftBohr[1], a.positionBohr[2] + shiftBohr[2]] as Vec3,
    })),
  };
}

/** A copy of the molecule with every position r replaced by R·r (R a 3×3 matrix, rows R[i]). */
export function rotateMolecule(m: Molecule, rotation: readonly (readonly number[])[]): Molecule {
  const apply = (p: Vec3): Vec3 => [
    rotation[0][0] * p[0] + rotation[0][1] * p[1] + rotation[0][2] * p[2],
    rotation[1][0] * p[0] + rotation[1][1] * p[1] + rotation[1][2] * p[2],
    rotation[2][0] * p[0] + rotation[2][1] * p[1] + rotation[2][2] * p[2],
  ];
  return { ...m, atoms: m.atoms.map((a) => ({ ...a, positionBohr: apply(a.positionBohr) })) };
}
