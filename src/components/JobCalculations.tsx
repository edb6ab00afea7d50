import { useState } from 'react';
import type { ReactElement } from 'react';
import { TOOL_NAMES, api, reopenHref } from '../lib/jobs/client-api';
import { headlineOf } from '../lib/jobs/headline';

export interface Calc {
  id: string;
  jobId: string;
  tool: 'line' | 'siphon' | 'drain';
  label: string;
  inputs: Record<string, unknown>;
  results: Record<string, unknown>;
  unitSystem: 'metric' | 'us';
  engineVersion: string;
  revisionOf: string | null;
  openPath: string | null;
  createdAt: string;
}
interface Change { path: string; before: unknown; after: unknown }
interface Rerun { engineVersion?: string; changes?: Change[]; error?: { message?: string } }

const btn = 'min-h-11 rounded-md border border-rule bg-white px-3';
const TONE_BORDER = { runs: 'border-verdict-runs', edge: 'border-verdict-edge', fails: 'border-verdict-fails' } as const;

/** The saved result in a line: verdict word, then the key figures in the units it was saved in. */
function CalcHeadline({ c }: { c: Calc }): ReactElement {
  const h = headlineOf(c.tool, c.results, c.unitSystem);
  return (
    <div className={`border-l-4 pl-2 ${h.verdict ? TONE_BORDER[h.verdict.tone] : 'border-rule'}`}>
      {h.verdict && <p className="font-extrabold" data-testid="calc-verdict" data-verdict={h.verdict.tone}>{h.verdict.word}</p>}
      <dl className="flex flex-wrap gap-x-4 gap-y-1 text-step--1">
        {h.figures.map((f) => (
          <div key={f.label} className="flex gap-1">
            <dt className="text-ink-soft">{f.label}</dt>
            <dd className="font-semibold tabular-nums" data-calc-figure={f.label}>{f.value}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}

function CalcItem({ c, canWrite, onChanged }: { c: Calc; canWrite: boolean; onChanged: () => void }): ReactElement {
  const [rerun, setRerun] = useState<Rerun | null>(null);
  const [error, setError] = useState('');
  const run = (p: Promise<unknown>): void => void p.then(() => setError('')).catch((e: Error) => setError(e.message));
  const check = (): void => run(api<{ rerun: Rerun }>(`/api/jobs/${c.jobId}/calculations/${c.id}?rerun=1`).then((r) => setRerun(r.rerun)));
  const revise = (): void =>
    run(api(`/api/jobs/${c.jobId}/calculations`, { method: 'POST', body: { tool: c.tool, label: c.label, inputs: c.inputs, unitSystem: c.unitSystem, revisionOf: c.id, ...(c.openPath ? { openPath: c.openPath } : {}) } }).then(onChanged));
  const remove = (): void => {
    if (confirm('Delete this calculation?')) run(api(`/api/jobs/${c.jobId}/calculations/${c.id}`, { method: 'DELETE' }).then(onChanged));
  };
  return (
    <li className="grid gap-2 rounded-lg border border-rule bg-white p-3" data-testid="calculation">
      <div className="font-semibold">{c.label || TOOL_NAMES[c.tool]} <span className="text-ink-faint">· {TOOL_NAMES[c.tool]}</span></div>
      <CalcHeadline c={c} />
      <div className="text-step--1 text-ink-faint">{c.id} · engine {c.engineVersion} · {new Date(c.createdAt).toLocaleString()}{c.revisionOf ? ` · revises ${c.revisionOf}` : ''}</div>
      <div className="flex flex-wrap gap-2">
        <a className={`${btn} inline-flex items-center`} href={reopenHref(c)}>Open in its tool</a>
        <button type="button" className={btn} onClick={check}>Re-run on today's engine</button>
        {canWrite && <button type="button" className={btn} onClick={remove}>Delete</button>}
      </div>
      {rerun && (
        <div className="rounded-md bg-paper-deep p-2 text-step--1" data-testid="rerun-diff">
          {rerun.error ? <p>Today's engine cannot run these inputs: {rerun.error.message}</p>
            : rerun.changes?.length ? (
              <ul>{rerun.changes.map((ch) => <li key={ch.path}>{ch.path}: {String(ch.before)} → {String(ch.after)}</li>)}</ul>
            ) : <p>No change: engine {rerun.engineVersion} gives the same results.</p>}
          {canWrite && !rerun.error && <button type="button" className={btn} onClick={revise}>Save as a new revision</button>}
        </div>
      )}
      {error && <p role="alert" className="text-verdict-fails">{error}</p>}
    </li>
  );
}

export default function JobCalculations({ calcs, canWrite, onChanged }: { calcs: Calc[]; canWrite: boolean; onChanged: () => void }): ReactElement {
  if (!calcs.length) return <p>No calculations yet. Use “Save to a job” under any result.</p>;
  return <ul className="grid gap-3">{calcs.map((c) => <CalcItem key={c.id} c={c} canWrite={canWrite} onChanged={onChanged} />)}</ul>;
}
