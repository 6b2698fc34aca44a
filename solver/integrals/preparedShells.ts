import type { BasisSet } from '../types';
import { cartesianCount, cartesianExponents, componentNormFactor } from '../basis/cartesian';
import { primitiveNorm } from '../basis/normalise';

/** A shell in the form the integral loops want: flat arrays, norms folded into coefficients. */
export interface PreparedShell {
  l: number;
  x: number;
  y: number;
  z: number;
  nPrimitives: number;
  exponents: Float64Array;
  /** Contraction coefficient × primitive norm of the x^l component. */
  weights: Float64Array;
  /** First basis function of the shell. */
  offset: number;
  nComponents: number;
  /** (lx, ly, lz) per component, flat. */
  components: Int32Array;
  /** Per-component factor making each Cartesian component normalised (solver/basis/cartesian.ts). */
  componentNorms: Float64Array;
}

export function prepareShells(basis: BasisSet): PreparedShell[] {
  return basis.shells.map((shell, s) => {
    const n = shell.exponents.length;
    const weights = new Float64Array(n);
    for (let k = 0; k < n; k++) weights[k] = shell.coefficients[k] * primitiveNorm(shell.exponents[k], shell.l);
    const components = cartesianExponents(shell.l);
    const nComponents = cartesianCount(shell.l);
    const componentNorms = new Float64Array(nComponents);
    for (let c = 0; c < nComponents; c++) {
      componentNorms[c] = componentNormFactor(components[3 * c], components[3 * c + 1], components[3 * c + 2]);
    }
    return {
      l: shell.l,
      x: shell.centerBohr[0],
      y: shell.centerBohr[1],
      z: shell.centerBohr[2],
      nPrimitives: n,
      exponents: shell.exponents,
      weights,
      offset: basis.shellOffsets[s],
      nComponents,
      components,
      componentNorms,
    };
  });
}
