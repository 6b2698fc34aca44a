import { badInput } from '../errors';
import { ELEMENTS, normaliseSymbol } from '../system/elements';

/**
 * Re-keys a per-element table by the usual symbol spelling ("h" → "H") and refuses unknown
 * or duplicated element keys, naming them.
 */
export function byElementSymbol<T>(table: Record<string, T>, field: string): Map<string, T> {
  const known = new Set(ELEMENTS.map((e) => e.symbol));
  const out = new Map<string, T>();
  for (const [key, value] of Object.entries(table)) {
    const symbol = normaliseSymbol(key);
    if (!known.has(symbol)) throw badInput(`unknown element "${key}" in the basis set (supported: H to Ne)`, `${field}.${key}`);
    if (out.has(symbol)) throw badInput(`element ${symbol} is given twice in the basis set`, `${field}.${key}`);
    out.set(symbol, value);
  }
  return out;
}
