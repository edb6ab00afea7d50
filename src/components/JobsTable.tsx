import { useEffect, useState } from 'react';
import type { ReactElement } from 'react';

interface JobItem {
  id: string;
  title: string;
  client: string;
  siteAddress: string;
  status: string;
  updatedAt: string;
  calculationCount: number;
}

const STATUS_WORDS: Record<string, string> = { scoping: 'Scoping', quoted: 'Quoted', on_site: 'On site', wrapped_up: 'Wrapped up' };
const SORTS = [
  ['updated', 'Last changed'],
  ['created', 'Created'],
  ['title', 'Title'],
  ['client', 'Client'],
  ['status', 'Status'],
] as const;

/** The organisation's jobs, fetched from /api/jobs: search, status filter, sort and pages. */
export default function JobsTable(): ReactElement {
  const [q, setQ] = useState('');
  const [status, setStatus] = useState('');
  const [sort, setSort] = useState('updated');
  const [page, setPage] = useState(1);
  const [data, setData] = useState<{ items: JobItem[]; total: number; pageSize: number } | null>(null);
  const [error, setError] = useState('');

  useEffect(() => {
    const ctl = new AbortController();
    const params = new URLSearchParams({ q, status, sort, page: String(page), pageSize: '10' });
    fetch(`/api/jobs?${params}`, { signal: ctl.signal })
      .then(async (r) => {
        const body = await r.json();
        if (!r.ok) throw new Error(body.message ?? 'Could not load jobs.');
        setData(body);
        setError('');
      })
      .catch((e: Error) => e.name !== 'AbortError' && setError(e.message));
    return () => ctl.abort();
  }, [q, status, sort, page]);

  const pages = data ? Math.max(1, Math.ceil(data.total / data.pageSize)) : 1;
  const field = 'min-h-11 rounded-md border border-rule bg-white px-3 text-step-0';
  return (
    <div className="grid gap-3">
      <div className="grid gap-2 sm:grid-cols-3">
        <label className="grid gap-1">Search
          <input type="search" className={field} value={q} onChange={(e) => { setQ(e.target.value); setPage(1); }} placeholder="Title, client, site, notes" />
        </label>
        <label className="grid gap-1">Status
          <select className={field} value={status} onChange={(e) => { setStatus(e.target.value); setPage(1); }}>
            <option value="">Any</option>
            {Object.entries(STATUS_WORDS).map(([v, w]) => <option key={v} value={v}>{w}</option>)}
          </select>
        </label>
        <label className="grid gap-1">Sort by
          <select className={field} value={sort} onChange={(e) => setSort(e.target.value)}>
            {SORTS.map(([v, w]) => <option key={v} value={v}>{w}</option>)}
          </select>
        </label>
      </div>
      {error && <p role="alert" className="text-verdict-fails">{error}</p>}
      <div className="overflow-x-auto">
        <table className="w-full text-left text-step--1" data-testid="jobs-table">
          <thead><tr className="border-b border-rule"><th className="p-2">Job</th><th className="p-2">Client</th><th className="p-2">Status</th><th className="p-2">Calcs</th></tr></thead>
          <tbody>
            {data?.items.map((j) => (
              <tr key={j.id} className="border-b border-rule">
                <td className="p-2"><a className="text-teal-deep underline" href={`/app/jobs/${j.id}`}>{j.title}</a><div className="text-ink-faint">{j.siteAddress}</div></td>
                <td className="p-2">{j.client}</td>
                <td className="p-2">{STATUS_WORDS[j.status] ?? j.status}</td>
                <td className="p-2">{j.calculationCount}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {data && data.items.length === 0 && <p className="p-2">No jobs match.</p>}
      </div>
      <nav className="flex items-center gap-3" aria-label="Pages">
        <button type="button" className={field} disabled={page <= 1} onClick={() => setPage(page - 1)}>Previous</button>
        <span>Page {page} of {pages} · {data?.total ?? 0} jobs</span>
        <button type="button" className={field} disabled={page >= pages} onClick={() => setPage(page + 1)}>Next</button>
      </nav>
    </div>
  );
}
