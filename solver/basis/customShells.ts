import type { Atom, Shell } from '../types';
import type { CustomShellSpec } from './schema';
import { angularLetter } from './cartesian';
import { makeShell } from './shellFactory';

/**
 * A user's contracted shells on one atom, in the order given. An sp shell becomes an s and a
 * p shell sharing its exponents. Labels count shells per l from the lowest principal number
 * (1s, 2s, …; 2p, …; 3d, …), so a set written core-first reads naturally.
 */
export function customShells(spec: readonly CustomShellSpec[], atom: Atom, atomIndex: number): Shell[] {
  const seen = [0, 0, 0];
  const shells: Shell[] = [];
  const add = (l: number, exponents: number[], coefficients: number[]) => {
    const label = `${l + 1 + seen[l]}${angularLetter(l)}`;
    seen[l]++;
    shells.push(makeShell(l, label, atom.positionBohr, atomIndex, exponents, coefficients));
  };
  for (const shell of spec) {
    if (shell.shell === 's') add(0, shell.exponents, shell.coefficients);
    else if (shell.shell === 'p') add(1, shell.exponents, shell.coefficients);
    else if (shell.shell === 'd') add(2, shell.exponents, shell.coefficients);
    else {
      add(0, shell.exponents, shell.coefficients);
      add(1, shell.exponents, shell.coefficientsP ?? []);
    }
  }
  return shells;
}
