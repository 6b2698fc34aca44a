import { badInput } from '../errors';

/** One chemical element as the solver needs it. */
export interface Element {
  symbol: string;
  atomicNumber: number;
  /** Mass of the most abundant isotope in unified atomic mass units (u). */
  isotopeMassU: number;
}

/**
 * Hydrogen to neon, the elements the built-in basis sets cover.
 * Masses of the most abundant isotope (¹H, ⁴He, ⁷Li, ⁹Be, ¹¹B, ¹²C, ¹⁴N, ¹⁶O, ¹⁹F, ²⁰Ne):
 * AME2020 atomic masses (Wang et al., Chin. Phys. C 45, 030003 (2021)), from memory.
 * They only enter the centre of mass (the dipole origin), so 1e-6 u is far more than enough.
 */
export const ELEMENTS: readonly Element[] = [
  { symbol: 'H', atomicNumber: 1, isotopeMassU: 1.00782503223 },
  { symbol: 'He', atomicNumber: 2, isotopeMassU: 4.00260325413 },
  { symbol: 'Li', atomicNumber: 3, isotopeMassU: 7.0160034366 },
  { symbol: 'Be', atomicNumber: 4, isotopeMassU: 9.012183065 },
  { symbol: 'B', atomicNumber: 5, isotopeMassU: 11.00930536 },
  { symbol: 'C', atomicNumber: 6, isotopeMassU: 12 },
  { symbol: 'N', atomicNumber: 7, isotopeMassU: 14.00307400443 },
  { symbol: 'O', atomicNumber: 8, isotopeMassU: 15.99491461957 },
  { symbol: 'F', atomicNumber: 9, isotopeMassU: 18.99840316273 },
  { symbol: 'Ne', atomicNumber: 10, isotopeMassU: 19.9924401762 },
];

/** Writes a symbol the usual way: first letter upper case, the rest lower case ("he" → "He"). */
export function normaliseSymbol(symbol: string): string {
  const trimmed = symbol.trim();
  return trimmed.charAt(0).toUpperCase() + trimmed.slice(1).toLowerCase();
}

/** Looks an element up by symbol, in any letter case; unknown symbols are bad input. */
export function elementBySymbol(symbol: string, field?: string): Element {
  const wanted = normaliseSymbol(symbol);
  const element = ELEMENTS.find((e) => e.symbol === wanted);
  if (!element) {
    throw badInput(`unknown element "${symbol}": the supported elements are H to Ne (Z = 1–10)`, field);
  }
  return element;
}
