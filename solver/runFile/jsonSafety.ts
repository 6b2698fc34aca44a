import { SolverError } from '../errors';

/**
 * Turn typed arrays into plain arrays and refuse any NaN or ±Infinity: JSON cannot carry
 * them, and a silent `null` in place of an energy would mislead. A non-finite number here
 * is a solver bug, reported with the path where it was found.
 */
export function toJsonSafe(value: unknown, path = 'result'): unknown {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new SolverError('internal', `non-finite number at ${path}`);
    return value;
  }
  if (value === null || typeof value !== 'object') return value;
  if (ArrayBuffer.isView(value) && !(value instanceof DataView)) {
    return Array.from(value as unknown as ArrayLike<number>, (x, i) => toJsonSafe(x, `${path}[${i}]`));
  }
  if (Array.isArray(value)) return value.map((x, i) => toJsonSafe(x, `${path}[${i}]`));
  const out: Record<string, unknown> = {};
  for (const [key, v] of Object.entries(value as Record<string, unknown>)) {
    if (v !== undefined) out[key] = toJsonSafe(v, `${path}.${key}`);
  }
  return out;
}
