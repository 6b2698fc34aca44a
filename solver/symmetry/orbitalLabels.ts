import { characterTable, type PointGroupName } from './characterTables';

/**
 * Numbered orbital labels in the usual style: lower-case irrep, counted upwards within each
 * irrep in the given (energy) order, e.g. 1a1, 2a1, 1b2, 3a1, 1b1 (common practice, no source).
 */
export function numberedOrbitalLabels(group: PointGroupName | string, irreps: ArrayLike<number>): string[] {
  const table = characterTable(group);
  const counts = new Array<number>(table.labels.length).fill(0);
  return Array.from(irreps, (x) => `${++counts[x]}${table.labels[x].toLowerCase()}`);
}
