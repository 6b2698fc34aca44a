import type { Atom, Shell } from '../types';
import type { EvenTemperedBasisSpec } from './schema';
import { makeShell } from './shellFactory';

type ElementSeries = EvenTemperedBasisSpec['elements'][string];

const TYPES: { key: 's' | 'p' | 'd'; l: number }[] = [
  { key: 's', l: 0 },
  { key: 'p', l: 1 },
  { key: 'd', l: 2 },
];

/**
 * Even-tempered primitives α_k = α·β^k, k = 0 … count−1, each its own uncontracted shell
 * (Raffenetti & Ruedenberg, J. Chem. Phys. 59, 5978 (1973)). Shells are labelled in the order
 * generated, numbered from the lowest principal number of their l (1s, 2s, …; 2p, 3p, …; 3d, …).
 */
export function evenTemperedShells(series: ElementSeries, atom: Atom, atomIndex: number): Shell[] {
  const shells: Shell[] = [];
  for (const { key, l } of TYPES) {
    const s = series[key];
    if (!s) continue;
    for (let k = 0; k < s.count; k++) {
      const exponent = s.alpha * Math.pow(s.beta, k);
      shells.push(makeShell(l, `${l + 1 + k}${key}`, atom.positionBohr, atomIndex, [exponent], [1]));
    }
  }
  return shells;
}
