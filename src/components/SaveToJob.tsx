import { useEffect, useState } from 'react';
import type { ReactElement } from 'react';
import { api } from '../lib/jobs/client-api';

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

  useEffect(() => {
    const q = new URLSearchParams(location.search);
    if (q.get('dwJob')) setTarget(q.get('dwJob')!);
    setRevise(q.get('dwRev'));
  }, []);
  useEffect(() => {
    if (!open || jobs) return;
    api<{ items: JobLite[] }>('/api/jobs?pageSize=100')
      .then((r) => setJobs(r.items))
      .catch((e: Error) => { setJobs([]); setMsg({ text: /sign in/i.test(e.message) || e.message.includes('401') ? 'Sign in with a Crew account to save jobs.' : e.message }); });
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
      setMsg({ text: (e as Error).message });
    } finally {
      setBusy(false);
    }
  };

  const field = 'min-h-11 w-full rounded-md border border-rule bg-white px-3';
  if (!open) return <button type="button" className="min-h-11 rounded-md border border-teal px-4 font-semibold text-teal-deep" onClick={() => setOpen(true)}>Save to a job</button>;
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
