import type { Shell, Vec3 } from '../types';
import { normaliseContraction } from './normalise';

/** Makes one shell with its contraction renormalised (see solver/basis/cartesian.ts). */
export function makeShell(
  l: number,
  label: string,
  centerBohr: Vec3,
  atomIndex: number,
  exponents: ArrayLike<number>,
  coefficients: ArrayLike<number>,
): Shell {
  return {
    l,
    label,
    centerBohr: [centerBohr[0], centerBohr[1], centerBohr[2]],
    atomIndex,
    exponents: Float64Array.from(exponents as ArrayLike<number>),
    coefficients: normaliseContraction(exponents, coefficients, l),
  };
}
