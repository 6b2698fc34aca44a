import type { DeterminantEntry } from '../../solver/run/result';

export type DeterminantSortKey = 'weight' | 'coefficient' | 'excitationLevel' | 'alpha' | 'beta';
export type SortDirection = 'ascending' | 'descending';

/**
 * The determinants table's order. Ties keep the solver's order (a stable sort), so the list
 * never reshuffles entries the chosen column cannot tell apart.
 */
export function sortDeterminants(entries: readonly DeterminantEntry[], key: DeterminantSortKey, direction: SortDirection): DeterminantEntry[] {
  const sign = direction === 'ascending' ? 1 : -1;
  const indexed = entries.map((entry, index) => ({ entry, index }));
  indexed.sort((a, b) => {
    const x = a.entry[key];
    const y = b.entry[key];
    const order = typeof x === 'string' && typeof y === 'string' ? (x < y ? -1 : x > y ? 1 : 0) : (x as number) - (y as number);
    return order !== 0 ? sign * order : a.index - b.index;
  });
  return indexed.map((i) => i.entry);
}
