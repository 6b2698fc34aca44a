import { eriIndex, eriLength } from '../../../solver/integrals/eriIndex';
import type { ScfProblem } from '../../../solver/scf';

/**
 * H2 in STO-3G (ζ = 1.24) at R = 1.4 bohr, integrals as printed to four decimals in
 * Szabo & Ostlund (1996) §3.5.2: S12 = 0.6593, H_core 11 = −1.1204, 12 = −0.9584,
 * (11|11) = 0.7746, (11|22) = 0.5697, (21|11) = 0.4441, (21|21) = 0.2970.
 */
export function h2SzaboProblem(): ScfProblem {
  const n = 2;
  const overlap = Float64Array.from([1, 0.6593, 0.6593, 1]);
  const coreHamiltonian = Float64Array.from([-1.1204, -0.9584, -0.9584, -1.1204]);
  const eri = new Float64Array(eriLength(n));
  eri[eriIndex(0, 0, 0, 0)] = 0.7746;
  eri[eriIndex(1, 1, 1, 1)] = 0.7746;
  eri[eriIndex(0, 0, 1, 1)] = 0.5697;
  eri[eriIndex(1, 0, 0, 0)] = 0.4441;
  eri[eriIndex(1, 0, 1, 1)] = 0.4441;
  eri[eriIndex(1, 0, 1, 0)] = 0.297;
  return { nBasis: n, overlap, coreHamiltonian, eri, nuclearRepulsionHartree: 1 / 1.4, nAlpha: 1, nBeta: 1 };
}
