import { describe, expect, it } from 'vitest';
import { sortDeterminants } from '../../../components/results/sortDeterminants';
import type { DeterminantEntry } from '../../../solver/run/result';

// Sorting semantics only (common practice, no source); the entries are arbitrary test rows.
const rows: DeterminantEntry[] = [
  { alpha: '10', beta: '10', coefficient: 0.99, weight: 0.9801, excitationLevel: 0 },
  { alpha: '01', beta: '01', coefficient: -0.11, weight: 0.0121, excitationLevel: 2 },
  { alpha: '10', beta: '01', coefficient: 0.05, weight: 0.0025, excitationLevel: 1 },
  { alpha: '01', beta: '10', coefficient: 0.05, weight: 0.0025, excitationLevel: 1 },
];

describe('sorting the determinants table', () => {
  it('puts the heaviest first by weight, descending', () => {
    expect(sortDeterminants(rows, 'weight', 'descending').map((r) => r.weight)).toEqual([0.9801, 0.0121, 0.0025, 0.0025]);
  });

  it('keeps the original order for ties (stable)', () => {
    const sorted = sortDeterminants(rows, 'excitationLevel', 'ascending');
    expect(sorted.map((r) => `${r.alpha}/${r.beta}`)).toEqual(['10/10', '10/01', '01/10', '01/01']);
  });

  it('sorts signed coefficients and bit strings', () => {
    expect(sortDeterminants(rows, 'coefficient', 'ascending')[0].coefficient).toBe(-0.11);
    expect(sortDeterminants(rows, 'alpha', 'ascending').map((r) => r.alpha)).toEqual(['01', '01', '10', '10']);
  });

  it('does not modify its input', () => {
    const copy = rows.map((r) => ({ ...r }));
    sortDeterminants(rows, 'coefficient', 'descending');
    expect(rows).toEqual(copy);
  });
});
