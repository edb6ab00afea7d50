import { useCallback, useEffect, useState } from 'react';
import type { ReactElement } from 'react';
import { api, ApiError } from '../lib/jobs/client-api';
import JobConflict from './JobConflict';
import type { JobFieldsView } from './JobConflict';
import JobCalculations from './JobCalculations';
import type { Calc } from './JobCalculations';
import JobReportActions from './JobReportActions';
import type { Share } from './JobReportActions';

interface Job extends JobFieldsView { id: string }
interface Detail { job: Job; calculations: Calc[]; shares: Share[]; canWrite: boolean }
const STATUSES = [['scoping', 'Scoping'], ['quoted', 'Quoted'], ['on_site', 'On site'], ['wrapped_up', 'Wrapped up']] as const;
const field = 'min-h-11 rounded-md border border-rule bg-white px-3';

/** One job: its fields (editable when the plan allows), calculations, report and links. */
export default function JobDetail({ jobId }: { jobId: string }): ReactElement {
  const [d, setD] = useState<Detail | null>(null);
  const [form, setForm] = useState<Job | null>(null);
  const [msg, setMsg] = useState('');
  // The newer job a save lost to; the form keeps the user's text until they choose.
  const [theirs, setTheirs] = useState<Job | null>(null);
  const load = useCallback(() => {
    api<Detail>(`/api/jobs/${jobId}`).then((r) => { setD(r); setForm(r.job); setTheirs(null); }).catch((e: Error) => setMsg(e.message));
  }, [jobId]);
  useEffect(load, [load]);
  if (!d || !form) return <p role="status">{msg || 'Loading…'}</p>;
  const set = (k: keyof Job) => (e: { target: { value: string } }): void => setForm({ ...form, [k]: e.target.value });
  const save = (revision = form.revision): void => {
    const { title, client, siteAddress, notes, status } = form;
    setMsg('');
    api(`/api/jobs/${jobId}`, { method: 'PATCH', body: { title, client, siteAddress, notes, status, revision } })
      .then(() => { setMsg('Saved.'); load(); })
      .catch((e: Error) => (e instanceof ApiError && e.status === 409 ? setTheirs(e.body.job as Job) : setMsg(e.message)));
  };
  const remove = (): void => {
    if (confirm('Delete this job and all its calculations?')) api(`/api/jobs/${jobId}`, { method: 'DELETE' }).then(() => location.assign('/app/jobs')).catch((e: Error) => setMsg(e.message));
  };
  const ro = !d.canWrite;
  return (
    <div className="grid gap-6">
      <form className="grid gap-2" onSubmit={(e) => { e.preventDefault(); save(); }}>
        <label className="grid gap-1">Title<input className={field} value={form.title} onChange={set('title')} readOnly={ro} required /></label>
        <label className="grid gap-1">Client<input className={field} value={form.client} onChange={set('client')} readOnly={ro} /></label>
        <label className="grid gap-1">Site address<input className={field} value={form.siteAddress} onChange={set('siteAddress')} readOnly={ro} /></label>
        <label className="grid gap-1">Status
          <select className={field} value={form.status} onChange={set('status')} disabled={ro}>{STATUSES.map(([v, w]) => <option key={v} value={v}>{w}</option>)}</select>
        </label>
        <label className="grid gap-1">Notes<textarea className="min-h-24 rounded-md border border-rule p-2" value={form.notes} onChange={set('notes')} readOnly={ro} /></label>
        {d.canWrite ? (
          <div className="flex flex-wrap gap-2"><button className={field}>Save changes</button><button type="button" className={field} onClick={remove}>Delete job</button></div>
        ) : <p>This account is read-only: you can read, print and export, not change.</p>}
        {theirs && <JobConflict mine={form} theirs={theirs} onReload={load} onOverwrite={() => save(theirs.revision)} />}
        {msg && <p role="status">{msg}</p>}
      </form>
      <section className="grid gap-3"><h2 className="text-step-1 font-bold">Calculations</h2><JobCalculations calcs={d.calculations} canWrite={d.canWrite} onChanged={load} /></section>
      <JobReportActions jobId={jobId} client={d.job.client} shares={d.shares} canWrite={d.canWrite} onChanged={load} />
    </div>
  );
}
