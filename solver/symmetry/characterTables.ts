/**
 * Character tables of D2h and its subgroups, with their usual Mulliken labels, as printed in
 * Cotton, Chemical Applications of Group Theory, 3rd ed. (1990), appendix (a fact of the trade).
 *
 * Every group here is abelian and every irrep one-dimensional with characters ±1, so an irrep
 * is stored as a small integer whose bit j is set when its character under the group's
 * generator j is −1. Characters multiply, so the direct product of two irreps is the bitwise
 * XOR of their integers, and the totally symmetric irrep is 0. The generators are chosen so
 * that the integers follow the row order of the printed tables:
 *
 *   D2h  generators C2(y), C2(z), i   → Ag 0, B1g 1, B2g 2, B3g 3, Au 4, B1u 5, B2u 6, B3u 7
 *   D2   generators C2(y), C2(z)      → A 0, B1 1, B2 2, B3 3
 *   C2v  generators σ(xz), C2(z)      → A1 0, A2 1, B1 2, B2 3
 *   C2h  generators C2(z), i          → Ag 0, Bg 1, Au 2, Bu 3
 *   C2   generator  C2(z)             → A 0, B 1
 *   Cs   generator  σ(xy)             → A' 0, A'' 1
 *   Ci   generator  i                 → Ag 0, Au 1
 *   C1   no generator                 → A 0
 */
import { badInput } from '../errors';
import { operationByName, type OperationName, type SymmetryOperation } from './operations';

export type PointGroupName = 'D2h' | 'D2' | 'C2v' | 'C2h' | 'C2' | 'Cs' | 'Ci' | 'C1';

export const POINT_GROUP_NAMES: readonly PointGroupName[] = ['D2h', 'D2', 'C2v', 'C2h', 'C2', 'Cs', 'Ci', 'C1'];

export interface CharacterTable {
  group: PointGroupName;
  /** The group's operations, in the column order of the printed table. */
  operations: readonly SymmetryOperation[];
  generators: readonly SymmetryOperation[];
  /** Irrep labels indexed by the irrep integer. */
  labels: readonly string[];
  /** characters[irrep][k] = χ of that irrep under operations[k]. */
  characters: readonly (readonly number[])[];
}

interface TableSource {
  operations: OperationName[];
  generators: OperationName[];
  rows: [string, number[]][];
}

// Transcribed from the character tables (Cotton (1990), appendix), axes as in the module's
// orientation convention: the C2 of C2v, C2h and C2 is z, the mirror of Cs is xy.
const SOURCES: Record<PointGroupName, TableSource> = {
  D2h: {
    operations: ['E', 'C2z', 'C2y', 'C2x', 'i', 'sxy', 'sxz', 'syz'],
    generators: ['C2y', 'C2z', 'i'],
    rows: [
      ['Ag', [1, 1, 1, 1, 1, 1, 1, 1]],
      ['B1g', [1, 1, -1, -1, 1, 1, -1, -1]],
      ['B2g', [1, -1, 1, -1, 1, -1, 1, -1]],
      ['B3g', [1, -1, -1, 1, 1, -1, -1, 1]],
      ['Au', [1, 1, 1, 1, -1, -1, -1, -1]],
      ['B1u', [1, 1, -1, -1, -1, -1, 1, 1]],
      ['B2u', [1, -1, 1, -1, -1, 1, -1, 1]],
      ['B3u', [1, -1, -1, 1, -1, 1, 1, -1]],
    ],
  },
  D2: {
    operations: ['E', 'C2z', 'C2y', 'C2x'],
    generators: ['C2y', 'C2z'],
    rows: [
      ['A', [1, 1, 1, 1]],
      ['B1', [1, 1, -1, -1]],
      ['B2', [1, -1, 1, -1]],
      ['B3', [1, -1, -1, 1]],
    ],
  },
  C2v: {
    operations: ['E', 'C2z', 'sxz', 'syz'],
    generators: ['sxz', 'C2z'],
    rows: [
      ['A1', [1, 1, 1, 1]],
      ['A2', [1, 1, -1, -1]],
      ['B1', [1, -1, 1, -1]],
      ['B2', [1, -1, -1, 1]],
    ],
  },
  C2h: {
    operations: ['E', 'C2z', 'i', 'sxy'],
    generators: ['C2z', 'i'],
    rows: [
      ['Ag', [1, 1, 1, 1]],
      ['Bg', [1, -1, 1, -1]],
      ['Au', [1, 1, -1, -1]],
      ['Bu', [1, -1, -1, 1]],
    ],
  },
  C2: { operations: ['E', 'C2z'], generators: ['C2z'], rows: [['A', [1, 1]], ['B', [1, -1]]] },
  Cs: { operations: ['E', 'sxy'], generators: ['sxy'], rows: [["A'", [1, 1]], ["A''", [1, -1]]] },
  Ci: { operations: ['E', 'i'], generators: ['i'], rows: [['Ag', [1, 1]], ['Au', [1, -1]]] },
  C1: { operations: ['E'], generators: [], rows: [['A', [1]]] },
};

function buildTable(group: PointGroupName): CharacterTable {
  const source = SOURCES[group];
  const operations = source.operations.map(operationByName);
  const generators = source.generators.map(operationByName);
  const labels: string[] = new Array(source.rows.length);
  const characters: number[][] = new Array(source.rows.length);
  for (const [label, row] of source.rows) {
    let index = 0;
    generators.forEach((g, j) => {
      if (row[source.operations.indexOf(g.name)] === -1) index |= 1 << j;
    });
    labels[index] = label;
    characters[index] = row;
  }
  return Object.freeze({ group, operations, generators, labels, characters });
}

const TABLES = new Map<PointGroupName, CharacterTable>(POINT_GROUP_NAMES.map((g) => [g, buildTable(g)]));

export function isPointGroupName(name: string): name is PointGroupName {
  return TABLES.has(name as PointGroupName);
}

export function characterTable(group: PointGroupName | string): CharacterTable {
  const table = TABLES.get(group as PointGroupName);
  if (!table) throw badInput(`unknown point group "${group}"; Ketbook uses ${POINT_GROUP_NAMES.join(', ')}`);
  return table;
}

/** The Mulliken label of irrep `index` of `group`, e.g. irrepLabel('D2h', 5) = "B1u". */
export function irrepLabel(group: PointGroupName | string, index: number): string {
  const table = characterTable(group);
  const label = table.labels[index];
  if (label === undefined) throw badInput(`irrep ${index} does not exist in ${group}`);
  return label;
}

/**
 * The integer of an irrep given by its label. Matching ignores case, and a double prime may be
 * written as two apostrophes or one quotation mark (A'' = A").
 */
export function irrepIndex(group: PointGroupName | string, label: string, field = 'ci.irrep'): number {
  const table = characterTable(group);
  const wanted = label.trim().replace(/"/g, "''").toLowerCase();
  const index = table.labels.findIndex((l) => l.toLowerCase() === wanted);
  if (index < 0) {
    throw badInput(`"${label}" is not an irrep of ${group}; its irreps are ${table.labels.join(', ')}`, field);
  }
  return index;
}

/** Direct product of two irreps of the same abelian group. */
export function irrepProduct(a: number, b: number): number {
  return a ^ b;
}

/** χ of irrep `index` under `op`, or throws if `op` is not in the group. */
export function irrepCharacter(group: PointGroupName | string, index: number, op: SymmetryOperation): number {
  const table = characterTable(group);
  const k = table.operations.findIndex((o) => o.name === op.name);
  if (k < 0) throw badInput(`${op.symbol} is not an operation of ${group}`);
  return table.characters[index][k];
}

/**
 * The irrep spanned by a function of D2h parity `parityMask` (bit 0: odd in x, bit 1: odd in y,
 * bit 2: odd in z), e.g. the function z has mask 0b100. Its character under an operation that
 * reverses the axes in `flipMask` is (−1)^popcount(parityMask & flipMask).
 */
export function irrepOfParity(group: PointGroupName | string, parityMask: number): number {
  const table = characterTable(group);
  let index = 0;
  table.generators.forEach((g, j) => {
    if (oddBitCount(parityMask & g.flipMask)) index |= 1 << j;
  });
  return index;
}

function oddBitCount(x: number): boolean {
  return ((x & 1) ^ ((x >> 1) & 1) ^ ((x >> 2) & 1)) === 1;
}
