import { badInput } from '../errors';
import { normaliseSymbol } from '../system/elements';
import type { ZetaSpec } from './schema';

/** Slater exponents of one element's shells; `valence` is absent for H and He. */
export interface SlaterExponents {
  core: number;
  valence?: number;
}

/**
 * The standard molecular Slater exponents ζ used with STO-nG: Hehre, Stewart & Pople,
 * J. Chem. Phys. 51, 2657 (1969), their table of recommended molecular ζ (from memory of that
 * table). H 1.24 is the value Szabo & Ostlund (1996) §3.5 also use; for He the paper's 1.69
 * is kept (Szabo & Ostlund take 2.0925 for HeH⁺; give it through `zeta`).
 */
export const STANDARD_ZETA: Readonly<Record<string, SlaterExponents>> = {
  H: { core: 1.24 },
  He: { core: 1.69 },
  Li: { core: 2.69, valence: 0.8 },
  Be: { core: 3.68, valence: 1.15 },
  B: { core: 4.68, valence: 1.5 },
  C: { core: 5.67, valence: 1.72 },
  N: { core: 6.67, valence: 1.95 },
  O: { core: 7.66, valence: 2.25 },
  F: { core: 8.65, valence: 2.55 },
  Ne: { core: 9.64, valence: 2.88 },
};

/**
 * The Slater exponents for each element, the standard ones overridden by the user's `zeta`.
 * A bare number is allowed for H and He only (their one shell, 1s); Li–Ne take
 * { "1s": …, "2sp": … } with either key optional.
 */
export function resolveZeta(zeta: ZetaSpec | undefined): Record<string, SlaterExponents> {
  const out: Record<string, SlaterExponents> = {};
  for (const [symbol, value] of Object.entries(STANDARD_ZETA)) out[symbol] = { ...value };
  if (!zeta) return out;
  for (const [key, value] of Object.entries(zeta)) {
    const symbol = normaliseSymbol(key);
    const field = `system.zeta.${key}`;
    const entry = out[symbol];
    if (!entry) throw badInput(`zeta: unknown element "${key}" (supported: H to Ne)`, field);
    const hasValence = entry.valence !== undefined;
    if (typeof value === 'number') {
      if (hasValence) {
        throw badInput(`zeta: ${symbol} has two shells; give {"1s": ζ, "2sp": ζ} instead of a bare number`, field);
      }
      entry.core = value;
      continue;
    }
    if (value['1s'] !== undefined) entry.core = value['1s'];
    if (value['2sp'] !== undefined) {
      if (!hasValence) throw badInput(`zeta: ${symbol} has no 2sp shell in STO-nG`, field);
      entry.valence = value['2sp'];
    }
  }
  return out;
}
