'use client';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import type { ScanSummary } from '@/app/lib/queries/scans';
import { apiFetch } from '../forms/apiFetch';

const PAGE_SIZE = 10;

/** The workspace's saved scans, beside its runs: progress (points done of planned) and status per scan. */
export function ScansTable({ slug }: { slug: string }) {
  const [page, setPage] = useState(1);
  const query = useQuery({
    queryKey: ['scans', slug, page],
    queryFn: () => apiFetch<{ scans: ScanSummary[]; total: number; page: number; pageSize: number }>(`/api/workspaces/${slug}/scans?page=${page}&pageSize=${PAGE_SIZE}`),
    placeholderData: keepPreviousData,
  });
  const data = query.data;
  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  return (
    <div data-testid="scans-table-panel">
      <div className="mb-3 flex">
        <Link href="/scans/new" className="ml-auto rounded-md bg-ket-600 px-3 py-1.5 text-sm font-semibold text-white hover:bg-ket-700">
          New scan
        </Link>
      </div>
      {query.isError ? <p className="text-sm text-caution-700">{(query.error as Error).message}</p> : null}
      {data && data.total === 0 ? (
        <p className="rounded-lg border border-dashed border-ket-500/40 bg-ket-50/50 p-4 text-sm text-ink-soft" data-testid="scans-empty">
          No saved scans yet.
        </p>
      ) : null}
      {data && data.total > 0 ? (
        <>
          <table className="w-full text-sm" data-testid="scans-table">
            <thead>
              <tr className="border-b border-ink-soft/20 text-left text-ink-soft">
                <th className="px-2 py-1 font-medium">Title</th>
                <th className="px-2 py-1 font-medium">System</th>
                <th className="px-2 py-1 font-medium">Basis</th>
                <th className="px-2 py-1 font-medium">Methods</th>
                <th className="px-2 py-1 font-medium">Points</th>
                <th className="px-2 py-1 font-medium">Status</th>
                <th className="px-2 py-1 font-medium">Saved</th>
              </tr>
            </thead>
            <tbody>
              {data.scans.map((s) => (
                <tr key={s.id} className="border-b border-ink-soft/10" data-testid="scans-row">
                  <td className="px-2 py-1">
                    <Link href={`/workspaces/${slug}/scans/${s.id}`} className="font-medium text-ket-700 underline">
                      {s.title}
                    </Link>
                  </td>
                  <td className="px-2 py-1">{s.system}</td>
                  <td className="px-2 py-1">{s.basis}</td>
                  <td className="px-2 py-1">{s.methods}</td>
                  <td className="px-2 py-1 font-mono">
                    {s.pointsDone} / {s.pointCount}
                  </td>
                  <td className="px-2 py-1">{s.status === 'running' && s.pointsDone < s.pointCount ? 'unfinished' : s.status}</td>
                  <td className="px-2 py-1 whitespace-nowrap">{s.createdAt.slice(0, 10)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          {pages > 1 ? (
            <div className="mt-2 flex items-center gap-3 text-sm">
              <button type="button" disabled={page <= 1} onClick={() => setPage(page - 1)} className="rounded border px-2 py-0.5 disabled:opacity-40">
                Previous
              </button>
              <span>
                Page {data.page} of {pages}
              </span>
              <button type="button" disabled={page >= pages} onClick={() => setPage(page + 1)} className="rounded border px-2 py-0.5 disabled:opacity-40">
                Next
              </button>
            </div>
          ) : null}
        </>
      ) : null}
    </div>
  );
}
