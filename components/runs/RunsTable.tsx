'use client';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useEffect, useState } from 'react';
import type { RunSummary } from '@/app/lib/queries/runs';
import { RUN_SORT_KEYS } from '@/app/lib/runs/saveRunSchema';
import { apiFetch } from '../forms/apiFetch';

type SortKey = (typeof RUN_SORT_KEYS)[number];

interface RunPage {
  runs: RunSummary[];
  total: number;
  page: number;
  pageSize: number;
  tags: string[];
}

const PAGE_SIZE = 20;

const COLUMNS: { key: SortKey | null; label: string }[] = [
  { key: 'title', label: 'Title' },
  { key: 'system', label: 'System' },
  { key: null, label: 'Basis' },
  { key: 'method', label: 'Method' },
  { key: 'energy', label: 'Lowest energy' },
  { key: 'determinants', label: 'Determinants' },
  { key: null, label: 'Tags' },
  { key: 'created', label: 'Saved' },
];

function useDebounced<T>(value: T, ms: number): T {
  const [v, setV] = useState(value);
  useEffect(() => {
    const id = setTimeout(() => setV(value), ms);
    return () => clearTimeout(id);
  }, [value, ms]);
  return v;
}

/** The workspace's saved runs: search, tag filter, sortable columns and pages, all answered by the server. */
export function RunsTable({ slug }: { slug: string }) {
  const [search, setSearch] = useState('');
  const [tag, setTag] = useState('');
  const [sort, setSort] = useState<SortKey>('created');
  const [dir, setDir] = useState<'asc' | 'desc'>('desc');
  const [page, setPage] = useState(1);
  const q = useDebounced(search.trim(), 250);
  useEffect(() => setPage(1), [q, tag, sort, dir]);

  const params = new URLSearchParams({ sort, dir, page: String(page), pageSize: String(PAGE_SIZE) });
  if (q) params.set('q', q);
  if (tag) params.set('tag', tag);
  const query = useQuery({
    queryKey: ['runs', slug, params.toString()],
    queryFn: () => apiFetch<RunPage>(`/api/workspaces/${slug}/runs?${params}`),
    placeholderData: keepPreviousData,
  });
  const data = query.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;

  const onSort = (key: SortKey) => {
    if (key === sort) setDir(dir === 'asc' ? 'desc' : 'asc');
    else {
      setSort(key);
      setDir(key === 'created' ? 'desc' : 'asc');
    }
  };

  return (
    <div data-testid="runs-table-panel">
      <div className="mb-3 flex flex-wrap items-end gap-3">
        <label className="text-sm text-ink">
          Search
          <input
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
            placeholder="title, system, method or basis"
            className="ml-2 w-64 rounded-md border border-ink-soft/30 px-2 py-1 text-sm"
            data-testid="runs-search"
          />
        </label>
        <label className="text-sm text-ink">
          Tag
          <select value={tag} onChange={(e) => setTag(e.target.value)} className="ml-2 rounded-md border border-ink-soft/30 px-2 py-1 text-sm" data-testid="runs-tag-filter">
            <option value="">any</option>
            {(data?.tags ?? []).map((t) => (
              <option key={t} value={t}>
                {t}
              </option>
            ))}
          </select>
        </label>
        <Link href="/runs/new" className="ml-auto rounded-md bg-ket-600 px-3 py-1.5 text-sm font-semibold text-white hover:bg-ket-700">
          New run
        </Link>
      </div>
      {query.isError ? <p className="text-sm text-caution-700">{(query.error as Error).message}</p> : null}
      {data && data.total === 0 ? (
        <p className="rounded-lg border border-dashed border-ket-500/40 bg-ket-50/50 p-4 text-sm text-ink-soft" data-testid="runs-empty">
          {q || tag ? 'No saved run matches.' : 'No saved runs yet. Compute one on the new-run page and save it here.'}
        </p>
      ) : null}
      {data && data.total > 0 ? (
        <div className="overflow-x-auto">
          <table className="w-full text-sm" data-testid="runs-table">
            <thead>
              <tr className="border-b border-ink-soft/20 text-left text-ink-soft">
                {COLUMNS.map((c) => (
                  <th key={c.label} className="px-2 py-1 font-medium" aria-sort={c.key === sort ? (dir === 'asc' ? 'ascending' : 'descending') : undefined}>
                    {c.key ? (
                      <button type="button" onClick={() => onSort(c.key!)} className="hover:text-ink" data-testid={`runs-sort-${c.key}`}>
                        {c.label}
                        {c.key === sort ? (dir === 'asc' ? ' ▲' : ' ▼') : ''}
                      </button>
                    ) : (
                      c.label
                    )}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {data.runs.map((r) => (
                <tr key={r.id} className="border-b border-ink-soft/10" data-testid="runs-row">
                  <td className="px-2 py-1">
                    <Link href={`/workspaces/${slug}/runs/${r.id}`} className="font-medium text-ket-700 underline" data-testid="runs-row-link">
                      {r.title}
                    </Link>
                  </td>
                  <td className="px-2 py-1">{r.system}</td>
                  <td className="px-2 py-1">{r.basis}</td>
                  <td className="px-2 py-1">{r.method}</td>
                  <td className="px-2 py-1 font-mono">
                    {r.lowestEnergy === null ? '—' : `${r.lowestEnergy.toFixed(8)} ${r.energyUnit === 'hartree' ? 'Eh' : 't'}`}
                  </td>
                  <td className="px-2 py-1 text-right font-mono">{r.determinantCount.toLocaleString('en')}</td>
                  <td className="px-2 py-1">{r.tags.join(', ')}</td>
                  <td className="px-2 py-1 whitespace-nowrap">{r.createdAt.slice(0, 10)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <div className="mt-2 flex items-center gap-3 text-sm" data-testid="runs-pages">
            <button type="button" disabled={page <= 1} onClick={() => setPage(page - 1)} className="rounded border px-2 py-0.5 disabled:opacity-40">
              Previous
            </button>
            <span data-testid="runs-page-label">
              Page {data.page} of {pages} · {data.total} runs
            </span>
            <button type="button" disabled={page >= pages} onClick={() => setPage(page + 1)} className="rounded border px-2 py-0.5 disabled:opacity-40">
              Next
            </button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
