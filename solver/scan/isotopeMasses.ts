import { elementBySymbol } from '../system/elements';
import { DALTON_TO_ELECTRON_MASS } from '../constants';
import { badInput } from '../errors';

/**
 * Masses for harmonic frequencies: the most abundant isotope of each element (¹H, ⁴He, ⁷Li,
 * ⁹Be, ¹¹B, ¹²C, ¹⁴N, ¹⁶O, ¹⁹F, ²⁰Ne). The table itself lives once, in solver/system/elements.ts:
 * atomic masses of the 2020 Atomic Mass Evaluation (Wang et al., Chin. Phys. C 45, 030003
 * (2021)), typed there from memory. This module only reads it and converts to electron masses
 * with the CODATA 2018 atomic mass constant.
 */
export function mostAbundantIsotopeMassU(symbol: string): number {
  return elementBySymbol(symbol).isotopeMassU;
}

/** μ = m_A m_B / (m_A + m_B) of two groups of atoms, in electron masses (atomic units). */
export function reducedMassElectronMasses(groupA: string[], groupB: string[]): number {
  const mass = (group: string[]) => group.reduce((sum, symbol) => sum + mostAbundantIsotopeMassU(symbol), 0);
  const a = mass(groupA);
  const b = mass(groupB);
  if (a <= 0 || b <= 0) throw badInput('a reduced mass needs atoms with mass on both sides (ghost atoms carry none)');
  return ((a * b) / (a + b)) * DALTON_TO_ELECTRON_MASS;
}
