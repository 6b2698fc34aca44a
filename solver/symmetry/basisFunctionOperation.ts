import type { BasisSet } from '../types';
import { SolverError } from '../errors';
import { monomialSign, type SymmetryOperation } from './operations';
import { cartesianExponents } from '../basis/cartesian';

/** The basis module's component order is the one order; symmetry reuses it. */
export { cartesianExponents as cartesianComponents };

function sameContraction(a: BasisSet['shells'][number], b: BasisSet['shells'][number]): boolean {
  if (a.l !== b.l || a.exponents.length !== b.exponents.length) return false;
  for (let k = 0; k < a.exponents.length; k++) {
    if (a.exponents[k] !== b.exponents[k] || a.coefficients[k] !== b.coefficients[k]) return false;
  }
  return true;
}

/**
 * How a D2h operation acts on the basis of a molecule in its symmetry frame: R χ_μ =
 * sign[μ] · χ_target[μ]. A Cartesian Gaussian x^lx y^ly z^lz e^(−αr²) on atom a goes to the same
 * component on the image atom (the k-th shell of atom a to the k-th shell of the image), with
 * the sign the operation gives the monomial: the product of its sign on each power.
 * `atomPermutation[a]` is the image of atom a (see atomPermutation).
 */
export function basisFunctionOperation(
  basis: BasisSet,
  op: SymmetryOperation,
  atomPermutation: Int32Array,
): { target: Int32Array; sign: Float64Array } {
  const shellsOfAtom = new Map<number, number[]>();
  basis.shells.forEach((shell, s) => {
    const list = shellsOfAtom.get(shell.atomIndex) ?? [];
    list.push(s);
    shellsOfAtom.set(shell.atomIndex, list);
  });
  const target = new Int32Array(basis.nFunctions);
  const sign = new Float64Array(basis.nFunctions);
  basis.shells.forEach((shell, s) => {
    const own = shellsOfAtom.get(shell.atomIndex)!;
    const image = shellsOfAtom.get(atomPermutation[shell.atomIndex]) ?? [];
    const t = image[own.indexOf(s)];
    if (t === undefined || !sameContraction(shell, basis.shells[t])) {
      throw new SolverError(
        'internal',
        `the basis is not symmetric under ${op.symbol}: shell ${shell.label} of atom ${shell.atomIndex + 1} has no matching image`,
      );
    }
    const components = cartesianExponents(shell.l);
    const nComponents = components.length / 3;
    const from = basis.shellOffsets[s];
    const to = basis.shellOffsets[t];
    for (let c = 0; c < nComponents; c++) {
      target[from + c] = to + c;
      sign[from + c] = monomialSign(op, components[3 * c], components[3 * c + 1], components[3 * c + 2]);
    }
  });
  return { target, sign };
}
