import type { AssembledScan } from './types';

/** A CSV cell: numbers at full precision, text quoted when it holds a comma, quote or line break. */
function cell(value: string | number | null): string {
  if (value === null) return '';
  if (typeof value === 'number') return String(value);
  return /[",\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/**
 * The curves as CSV: one row per point, the coordinate first (in the scan's units), then each
 * curve's total energy in hartree, then each curve's error against the reference method.
 * An empty cell is a state or point without a value.
 */
export function scanToCsv(scan: AssembledScan): string {
  const header = [`coordinate (${scan.units})`, ...scan.curves.map((c) => `${c.label} (hartree)`)];
  const withErrors = scan.curves.filter((c) => c.errors);
  header.push(...withErrors.map((c) => `${c.label} error (hartree)`));
  const rows = scan.points.map((value, p) => [value, ...scan.curves.map((c) => c.energies[p]), ...withErrors.map((c) => c.errors![p])]);
  return [header, ...rows].map((row) => row.map(cell).join(',')).join('\n') + '\n';
}

/** The assembled scan as one JSON document (what `npm run -s solve -- scan.json` prints). */
export function scanToJson(scan: AssembledScan): string {
  return JSON.stringify(scan);
}
