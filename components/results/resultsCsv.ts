import type { RunResult } from '../../solver/run/result';

/**
 * The results as CSV (RFC 4180: comma-separated fields, CRLF after every record, a header
 * record, and a field holding a comma, a double quote, CR or LF enclosed in double quotes with
 * inner quotes doubled). Two files, because RFC 4180 wants every record of a file to have the
 * same number of fields: the roots, and the leading determinants of every root.
 * Numbers are written in full (JavaScript's shortest round-trip form), in the run's energy unit.
 */
export function csvField(value: string | number | null): string {
  const text = value === null ? '' : String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function csvText(rows: (string | number | null)[][]): string {
  return rows.map((row) => row.map(csvField).join(',')).join('\r\n') + '\r\n';
}

export function rootsCsv(result: RunResult): string {
  const unit = result.energyUnit;
  const header = ['root', `energy_${unit}`, `correlation_energy_${unit}`, `excitation_energy_${unit}`, 's_squared', 'multiplicity', 'irrep', 'c0_squared'];
  const roots = result.ci?.roots ?? [];
  const rows: (string | number | null)[][] =
    roots.length > 0
      ? roots.map((r, k) => [k + 1, r.energy, r.correlationEnergy, r.excitationEnergy, r.s2, r.multiplicity, r.irrep, r.referenceWeight])
      : // SCF only: the reference is the one state
        [[1, result.energies.reference, 0, 0, result.s2[0] ?? null, null, null, 1]];
  return csvText([header, ...rows]);
}

export function determinantsCsv(result: RunResult): string {
  const header = ['root', 'rank', 'alpha', 'beta', 'coefficient', 'weight', 'excitation_level'];
  const rows: (string | number)[][] = [];
  (result.ci?.roots ?? []).forEach((r, k) =>
    r.leadingDeterminants.forEach((d, i) => rows.push([k + 1, i + 1, d.alpha, d.beta, d.coefficient, d.weight, d.excitationLevel])),
  );
  return csvText([header, ...rows]);
}
