import { useEffect, useState } from 'react';
import type { ReactElement } from 'react';
import { ApiError, api } from '../lib/jobs/client-api';

interface Props {
  tool: 'line' | 'siphon' | 'drain';
  /** The engine request the result came from (SI, API v1 shape); the server re-runs it. */
  inputs: unknown;
  unitSystem: 'metric' | 'us';
  /** Calculator link that reopens these inputs; default: the page's current path and query. */
  openPath?: string;
  label?: string;
}
interface JobLite { id: string; title: string }
/** Why saving cannot happen here: signed out, or an account without the Crew plan. */
type Blocked = 'signed-out' | 'plan';

function blockedBy(e: Error): Blocked | null {
  if (!(e instanceof ApiError)) return null;
  if (e.status === 401) return 'signed-out';
  return e.status === 403 && e.code === 'plan_required' ? 'plan' : null;
}

/** Instead of a form that cannot work: what saving needs, with the way there. The calculation stays on the page. */
function SaveBlocked({ why }: { why: Blocked }): ReactElement {
  const here = `${location.pathname}${location.search}`;
  const link = 'inline-flex min-h-11 items-center rounded-md px-4 font-semibold';
  return (
    <div role="status" className="grid gap-2 rounded-lg border border-rule bg-paper p-3" data-save-blocked={why}>
      <p>{why === 'signed-out' ? 'Saving jobs needs a Crew account. Sign in and this calculation stays on the page.' : 'Saved jobs are part of the Crew plan.'}</p>
      <p className="flex flex-wrap gap-2">
        {why === 'signed-out' && <a className={`${link} bg-teal-deep text-white`} href={`/signin?next=${encodeURIComponent(here)}`}>Sign in</a>}
        <a className={`${link} border border-teal text-teal-deep`} href="/pricing">See the plans</a>
      </p>
    </div>
  );
}

/**
 * "Save to a job": stores the calculation in a new or an existing job. Opened from a job's
 * "Open in its tool" link (?dwJob=&dwRev=), it saves a new revision of that calculation.
 */
export default function SaveToJob({ tool, inputs, unitSystem, openPath, label = '' }: Props): ReactElement {
  const [open, setOpen] = useState(false);
  const [jobs, setJobs] = useState<JobLite[] | null>(null);
  const [target, setTarget] = useState('new');
  const [title, setTitle] = useState('');
  const [name, setName] = useState(label);
  const [msg, setMsg] = useState<{ text: string; href?: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [revise, setRevise] = useState<string | null>(null);
  const [blocked, setBlocked] = useState<Blocked | null>(null);

  useEffect(() => {
    const q = new URLSearchParams(location.search);
    if (q.get('dwJob')) setTarget(q.get('dwJob')!);
    setRevise(q.get('dwRev'));
  }, []);
  useEffect(() => {
    if (!open || jobs) return;
    api<{ items: JobLite[] }>('/api/jobs?pageSize=100')
      .then((r) => setJobs(r.items))
      .catch((e: Error) => {
        setJobs([]);
        const why = blockedBy(e);
        if (why) setBlocked(why);
        else setMsg({ text: e.message });
      });
  }, [open, jobs]);

  const save = async (): Promise<void> => {
    setBusy(true);
    try {
      const jobId = target === 'new' ? (await api<{ job: JobLite }>('/api/jobs', { method: 'POST', body: { title: title || 'Untitled job' } })).job.id : target;
      const path = openPath ?? `${location.pathname}${location.search.replace(/([?&])dw(Job|Rev)=[^&]*/g, '$1').replace(/[?&]+$/, '')}`;
      const body = { tool, label: name, inputs, unitSystem, ...(/^\/(check|siphon|gravity-line|drain)\b/.test(path) ? { openPath: path } : {}), ...(revise && target !== 'new' ? { revisionOf: revise } : {}) };
      await api(`/api/jobs/${jobId}/calculations`, { method: 'POST', body });
      setMsg({ text: 'Saved to the job.', href: `/app/jobs/${jobId}` });
    } catch (e) {
      const why = blockedBy(e as Error);
      if (why) setBlocked(why);
      else setMsg({ text: (e as Error).message });
    } finally {
      setBusy(false);
    }
  };

  const field = 'min-h-11 w-full rounded-md border border-rule bg-white px-3';
  if (!open) return <button type="button" className="min-h-11 rounded-md border border-teal px-4 font-semibold text-teal-deep" onClick={() => setOpen(true)}>Save to a job</button>;
  if (blocked) return <SaveBlocked why={blocked} />;
  return (
    <form className="grid gap-2 rounded-lg border border-rule bg-paper p-3" onSubmit={(e) => { e.preventDefault(); void save(); }} aria-label="Save to a job">
      <label className="grid gap-1">Job
        <select className={field} value={target} onChange={(e) => setTarget(e.target.value)} name="job">
          <option value="new">A new job…</option>
          {jobs?.map((j) => <option key={j.id} value={j.id}>{j.title}</option>)}
        </select>
      </label>
      {target === 'new' && <label className="grid gap-1">New job title<input className={field} name="title" value={title} onChange={(e) => setTitle(e.target.value)} required maxLength={200} /></label>}
      <label className="grid gap-1">Label for this calculation<input className={field} name="label" value={name} onChange={(e) => setName(e.target.value)} maxLength={200} /></label>
      {revise && target !== 'new' && <p className="text-step--1">Saves as a new revision of {revise}.</p>}
      <button className="min-h-11 rounded-md bg-teal-deep px-4 font-semibold text-white" disabled={busy}>{busy ? 'Saving…' : 'Save'}</button>
      {msg && <p role="status">{msg.text} {msg.href && <a className="underline" href={msg.href}>Open the job</a>}</p>}
    </form>
  );
}
