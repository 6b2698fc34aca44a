import type { BasisSet, Molecule, Shell } from '../types';
import { badInput } from '../errors';
import { basisSpecSchema, type BasisSpec, type ZetaSpec } from './schema';
import { cartesianCount, cartesianSuffixes } from './cartesian';
import { resolveZeta } from './slaterExponents';
import { stoShells } from './stoShells';
import { evenTemperedShells } from './evenTemperedShells';
import { customShells } from './customShells';
import { byElementSymbol } from './elementTable';

function missingElement(setName: string, symbol: string, atomIndex: number) {
  return badInput(`the basis set "${setName}" has no functions for ${symbol} (atom ${atomIndex + 1})`, 'system.basis.elements');
}

/**
 * The basis for a molecule: functions ordered atom by atom, shell by shell, Cartesian
 * components in the order of solver/basis/cartesian.ts. Ghost atoms get their element's
 * functions. `zeta` overrides Slater exponents and applies to the STO-nG sets only.
 */
export function buildBasis(molecule: Molecule, specInput: BasisSpec | string, zeta?: ZetaSpec): BasisSet {
  // Accept a raw (unparsed) spec too, e.g. "sto-3g", so callers outside the run file get the same checks.
  const parsed = basisSpecSchema.safeParse(specInput);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw badInput(issue.message, ['system.basis', ...issue.path.map(String)].join('.'));
  }
  const spec = parsed.data;
  const shells: Shell[] = [];
  let name: string;
  if (typeof spec === 'string') {
    const exponents = resolveZeta(zeta);
    name = zeta && Object.keys(zeta).length > 0 ? `${spec} (own ζ)` : spec;
    molecule.atoms.forEach((atom, i) => shells.push(...stoShells(spec, atom, i, exponents[atom.symbol])));
  } else {
    if (zeta && Object.keys(zeta).length > 0) {
      throw badInput('zeta (Slater exponents) applies to the STO-nG sets only', 'system.zeta');
    }
    if (spec.type === 'even-tempered') {
      name = spec.name ?? 'even-tempered';
      const table = byElementSymbol(spec.elements, 'system.basis.elements');
      molecule.atoms.forEach((atom, i) => {
        const series = table.get(atom.symbol);
        if (!series) throw missingElement(name, atom.symbol, i);
        shells.push(...evenTemperedShells(series, atom, i));
      });
    } else {
      name = spec.name;
      const table = byElementSymbol(spec.elements, 'system.basis.elements');
      molecule.atoms.forEach((atom, i) => {
        const list = table.get(atom.symbol);
        if (!list) throw missingElement(name, atom.symbol, i);
        shells.push(...customShells(list, atom, i));
      });
    }
  }
  const shellOffsets = new Int32Array(shells.length);
  const functionLabels: string[] = [];
  const atomOfFunction: number[] = [];
  let nFunctions = 0;
  shells.forEach((shell, s) => {
    shellOffsets[s] = nFunctions;
    const atom = molecule.atoms[shell.atomIndex];
    for (const suffix of cartesianSuffixes(shell.l)) {
      functionLabels.push(`${atom.symbol}${shell.atomIndex + 1} ${shell.label}${suffix}`);
      atomOfFunction.push(shell.atomIndex);
    }
    nFunctions += cartesianCount(shell.l);
  });
  return { name, shells, shellOffsets, nFunctions, functionLabels, functionAtom: Int32Array.from(atomOfFunction) };
}
