'use client';
import { useState } from 'react';
import type { RootResult } from '../../solver/run/result';
import { sortDeterminants, type DeterminantSortKey, type SortDirection } from './sortDeterminants';

const COLUMNS: { key: DeterminantSortKey; label: string; numeric: boolean }[] = [
  { key: 'alpha', label: 'α occupation', numeric: false },
  { key: 'beta', label: 'β occupation', numeric: false },
  { key: 'coefficient', label: 'coefficient', numeric: true },
  { key: 'weight', label: 'weight', numeric: true },
  { key: 'excitationLevel', label: 'excitation', numeric: true },
];

/**
 * The determinants: Ketbook's occupation notation writes each determinant as an α and a β
 * bit string over the active orbitals, active orbital 0 first. Click a heading to sort.
 */
export function DeterminantsTable({ roots }: { roots: RootResult[] }) {
  const [rootIndex, setRootIndex] = useState(0);
  const [sortKey, setSortKey] = useState<DeterminantSortKey>('weight');
  const [direction, setDirection] = useState<SortDirection>('descending');
  const root = roots[Math.min(rootIndex, roots.length - 1)];
  if (!root) return null;
  const rows = sortDeterminants(root.leadingDeterminants, sortKey, direction);
  const choose = (key: DeterminantSortKey) => {
    if (key === sortKey) setDirection(direction === 'ascending' ? 'descending' : 'ascending');
    else {
      setSortKey(key);
      setDirection(key === 'weight' ? 'descending' : 'ascending');
    }
  };
  return (
    <div>
      {roots.length > 1 ? (
        <label className="mb-2 flex items-center gap-2 text-sm">
          <span className="font-semibold">Root</span>
          <select value={rootIndex} onChange={(e) => setRootIndex(Number(e.target.value))} className="rounded-md border border-ink-soft/30 px-2 py-1" data-testid="determinants-root">
            {roots.map((_, k) => (
              <option key={k} value={k}>
                {k + 1}
              </option>
            ))}
          </select>
        </label>
      ) : null}
      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="determinants-table">
          <thead className="text-xs text-ink-soft">
            <tr>
              {COLUMNS.map((c) => (
                <th key={c.key} className={`py-1 pr-3 font-semibold ${c.numeric ? 'text-right' : 'text-left'}`} aria-sort={sortKey === c.key ? direction : 'none'}>
                  <button type="button" onClick={() => choose(c.key)} className="hover:text-ket-700" data-testid={`sort-${c.key}`}>
                    {c.label}
                    {sortKey === c.key ? (direction === 'ascending' ? ' ▲' : ' ▼') : ''}
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="font-mono">
            {rows.map((d, i) => (
              <tr key={`${d.alpha}-${d.beta}`} className="border-t border-ink-soft/10" data-testid={`determinant-${i}`}>
                <td className="py-0.5 pr-3 tracking-wider">{d.alpha}</td>
                <td className="py-0.5 pr-3 tracking-wider">{d.beta}</td>
                <td className="py-0.5 pr-3 text-right">{d.coefficient.toFixed(8)}</td>
                <td className="py-0.5 pr-3 text-right">{d.weight.toFixed(8)}</td>
                <td className="py-0.5 pr-3 text-right">{d.excitationLevel}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-1 text-xs text-ink-soft">
        The {rows.length} determinant{rows.length === 1 ? '' : 's'} of largest weight in root {rootIndex + 1} (weight = coefficient²); the run file&apos;s
        output.leadingDeterminants sets how many are listed.
      </p>
    </div>
  );
}
