'use client';
import { useState } from 'react';
import type { DeterminantEntry, RootResult } from '../../solver/run/result';
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
export function DeterminantsTable({
  roots,
  onPickPair,
}: {
  roots: RootResult[];
  /** With it, up to two rows can be picked for ⟨D_I|H|D_J⟩ (one row: its diagonal element). */
  onPickPair?: (first: DeterminantEntry, second: DeterminantEntry) => void;
}) {
  const [rootIndex, setRootIndex] = useState(0);
  const [picked, setPicked] = useState<DeterminantEntry[]>([]);
  const keyOf = (d: DeterminantEntry) => `${d.alpha}-${d.beta}`;
  const isPicked = (d: DeterminantEntry) => picked.some((p) => keyOf(p) === keyOf(d));
  const togglePick = (d: DeterminantEntry) =>
    setPicked((list) => (list.some((p) => keyOf(p) === keyOf(d)) ? list.filter((p) => keyOf(p) !== keyOf(d)) : [...list, d].slice(-2)));
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
              {onPickPair ? <th className="py-1 pr-2 text-left font-semibold">pick</th> : null}
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
                {onPickPair ? (
                  <td className="py-0.5 pr-2">
                    <input
                      type="checkbox"
                      checked={isPicked(d)}
                      onChange={() => togglePick(d)}
                      aria-label={`pick α ${d.alpha} β ${d.beta}`}
                      data-testid={`pick-determinant-${i}`}
                    />
                  </td>
                ) : null}
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
      {onPickPair ? (
        <div className="mt-2 flex flex-wrap items-center gap-2 text-sm">
          <button
            type="button"
            disabled={picked.length === 0}
            onClick={() => onPickPair(picked[0], picked[picked.length - 1])}
            className="rounded-md border border-ket-500 px-3 py-1 font-semibold text-ket-700 hover:bg-ket-50 disabled:opacity-50"
            data-testid="pick-pair-show"
          >
            Take ⟨D_I|H|D_J⟩ apart
          </button>
          <span className="text-xs text-ink-soft" data-testid="pick-pair-state">
            {picked.length === 0
              ? 'Pick two rows (or one, for its diagonal element).'
              : picked.map((d, k) => `${k === 0 ? 'D_I' : 'D_J'}: α ${d.alpha} β ${d.beta}`).join(' · ')}
          </span>
        </div>
      ) : null}
      <p className="mt-1 text-xs text-ink-soft">
        The {rows.length} determinant{rows.length === 1 ? '' : 's'} of largest weight in root {rootIndex + 1} (weight = coefficient²); the run file&apos;s
        output.leadingDeterminants sets how many are listed.
      </p>
    </div>
  );
}
