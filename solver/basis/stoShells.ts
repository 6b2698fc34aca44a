import type { Atom, Shell } from '../types';
import type { StoName } from './schema';
import type { SlaterExponents } from './slaterExponents';
import { STO_1S, STO_2SP } from './stoExpansions';
import { makeShell } from './shellFactory';

function scaled(exponents: readonly number[], zeta: number): number[] {
  // A Slater function with exponent ζ is the ζ = 1 one with r → ζr, so Gaussian exponents go as ζ².
  return exponents.map((a) => a * zeta * zeta);
}

/** The STO-nG shells of one atom: 1s for H and He; 1s, 2s, 2p for Li–Ne. */
export function stoShells(name: StoName, atom: Atom, atomIndex: number, zeta: SlaterExponents): Shell[] {
  const n = Number(name.charAt(4));
  const core = STO_1S[n];
  const shells = [makeShell(0, '1s', atom.positionBohr, atomIndex, scaled(core.exponents, zeta.core), core.coefficients)];
  if (zeta.valence !== undefined) {
    const sp = STO_2SP[n];
    const exponents = scaled(sp.exponents, zeta.valence);
    shells.push(makeShell(0, '2s', atom.positionBohr, atomIndex, exponents, sp.coefficientsS));
    shells.push(makeShell(1, '2p', atom.positionBohr, atomIndex, exponents, sp.coefficientsP));
  }
  return shells;
}
