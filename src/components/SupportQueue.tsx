import { useEffect, useState } from 'react';
import type { ReactElement } from 'react';
import { REASON_LABELS, STATUS_LABELS, TOOL_LABELS } from '../lib/flags/labels';
import type { QueuePage, QueueRow } from '../lib/flags/queue';

interface Query {
  status: string;
  tool: string;
  sort: 'oldest' | 'newest';
  page: number;
}

const STATUS_CHOICES: [string, string][] = [
  ['open', 'All open'],
  ...Object.entries(STATUS_LABELS),
  ['all', 'Everything'],
];
const TOOL_CHOICES: [string, string][] = [['all', 'All tools'], ...Object.entries(TOOL_LABELS)];
const PER_PAGE = 20;

/** "3 h", "2 d": how long a flag has waited, as a desk reads it at a glance. */
export function ageText(iso: string, now = Date.now()): string {
  const minutes = Math.max(0, Math.round((now - Date.parse(iso)) / 60_000));
  if (minutes < 60) return `${minutes} min`;
  if (minutes < 48 * 60) return `${Math.round(minutes / 60)} h`;
  return `${Math.round(minutes / 1440)} d`;
}

function Select(p: {
  label: string;
  value: string;
  choices: [string, string][];
  onChange: (v: string) => void;
}): ReactElement {
  return (
    <label className="flex flex-col text-step--1 font-semibold">
      {p.label}
      <select
        value={p.value}
        onChange={(e) => p.onChange(e.target.value)}
        className="min-h-11 rounded border border-rule bg-white px-2 text-step-0"
      >
        {p.choices.map(([v, l]) => (
          <option key={v} value={v}>
            {l}
          </option>
        ))}
      </select>
    </label>
  );
}

function Row({ f }: { f: QueueRow }): ReactElement {
  return (
    <tr className="border-t border-rule align-top">
      <td className="p-2">
        <a href={`/support/flags/${f.id}`} className="font-semibold text-teal-deep underline">
          {STATUS_LABELS[f.status]}
        </a>
      </td>
      <td className="p-2" title={f.createdAt}>
        {ageText(f.createdAt)}
      </td>
      <td className="p-2">
        {TOOL_LABELS[f.tool]}
        <div className="text-step--1 text-ink-faint">{REASON_LABELS[f.reason]}</div>
      </td>
      <td className="p-2 break-all">{f.reporterName ?? f.reporterEmail}</td>
      <td className="p-2">{f.organisationName ?? '—'}</td>
      <td className="p-2">{f.assigneeName ?? '—'}</td>
    </tr>
  );
}

/** The support queue: its rows come from GET /api/support/flags as the filters change. */
export default function SupportQueue(): ReactElement {
  const [q, setQ] = useState<Query>({ status: 'open', tool: 'all', sort: 'oldest', page: 1 });
  const [data, setData] = useState<QueuePage | null>(null);
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    const params = new URLSearchParams({
      status: q.status,
      tool: q.tool,
      sort: q.sort,
      page: String(q.page),
      perPage: String(PER_PAGE),
    });
    let live = true;
    fetch(`/api/support/flags?${params}`, { headers: { Accept: 'application/json' } })
      .then(async (res) => {
        if (!res.ok)
          throw new Error(
            res.status === 403
              ? 'This account cannot see the support queue.'
              : `The queue did not load (${res.status}).`,
          );
        return (await res.json()) as QueuePage;
      })
      .then((page) => live && (setData(page), setError(null)))
      .catch((e: Error) => live && setError(e.message));
    return () => {
      live = false;
    };
  }, [q]);

  const set = (patch: Partial<Query>): void => setQ((old) => ({ ...old, page: 1, ...patch }));
  const pages = data ? Math.max(1, Math.ceil(data.total / data.perPage)) : 1;
  return (
    <div className="space-y-3">
      <div className="flex flex-wrap gap-3">
        <Select
          label="Status"
          value={q.status}
          choices={STATUS_CHOICES}
          onChange={(status) => set({ status })}
        />
        <Select
          label="Tool"
          value={q.tool}
          choices={TOOL_CHOICES}
          onChange={(tool) => set({ tool })}
        />
        <Select
          label="Order"
          value={q.sort}
          choices={[
            ['oldest', 'Oldest first'],
            ['newest', 'Newest first'],
          ]}
          onChange={(sort) => set({ sort: sort as Query['sort'] })}
        />
      </div>
      {error && (
        <p role="alert" className="font-semibold text-verdict-fails">
          {error}
        </p>
      )}
      <div className="overflow-x-auto rounded-lg border border-rule bg-white">
        <table className="w-full min-w-[36rem] text-left" data-testid="queue">
          <thead className="bg-paper-deep text-step--1">
            <tr>
              <th className="p-2">Status</th>
              <th className="p-2">Waiting</th>
              <th className="p-2">Tool</th>
              <th className="p-2">Reporter</th>
              <th className="p-2">Organisation</th>
              <th className="p-2">Assigned</th>
            </tr>
          </thead>
          <tbody>
            {data?.flags.map((f) => (
              <Row key={f.id} f={f} />
            ))}
            {data && data.flags.length === 0 && (
              <tr>
                <td colSpan={6} className="p-4 text-ink-soft">
                  Nothing here. The desk is clear for these filters.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <nav aria-label="Queue pages" className="flex items-center gap-3">
        <button
          type="button"
          disabled={q.page <= 1}
          onClick={() => setQ({ ...q, page: q.page - 1 })}
          className="min-h-11 rounded border border-rule px-3 disabled:opacity-40"
        >
          Previous
        </button>
        <span>
          Page {q.page} of {pages} · {data?.total ?? 0} flags
        </span>
        <button
          type="button"
          disabled={q.page >= pages}
          onClick={() => setQ({ ...q, page: q.page + 1 })}
          className="min-h-11 rounded border border-rule px-3 disabled:opacity-40"
        >
          Next
        </button>
      </nav>
    </div>
  );
}
