import { useState } from 'react';
import type { ReactElement } from 'react';
import { api } from '../lib/jobs/client-api';

export interface Share { id: string; expiresAt: string; revokedAt: string | null }
const btn = 'min-h-11 rounded-md border border-rule bg-white px-3';
/** A random form key; getRandomValues works on plain http too, unlike randomUUID. */
const newKey = (): string => Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, '0')).join('');

/** Report view and download, e-mail to the client, and read-only links. */
export default function JobReportActions({ jobId, client, shares, canWrite, onChanged }: { jobId: string; client: string; shares: Share[]; canWrite: boolean; onChanged: () => void }): ReactElement {
  const [to, setTo] = useState('');
  const [note, setNote] = useState('');
  const [msg, setMsg] = useState('');
  const [link, setLink] = useState('');
  // One key per form state: a double click repeats the same send; a finished send starts a new key.
  const [sendKey, setSendKey] = useState(newKey);
  const [sending, setSending] = useState(false);
  const sendReport = (): void => {
    if (sending) return;
    setSending(true);
    run(api(`/api/jobs/${jobId}/report/email`, { method: 'POST', body: { to, message: note, idempotencyKey: sendKey } }).then(() => setSendKey(newKey())).finally(() => setSending(false)), `Report sent to ${to}.`);
  };
  const run = (p: Promise<unknown>, ok: string): void => void p.then(() => setMsg(ok)).catch((e: Error) => setMsg(e.message));
  const live = shares.filter((s) => !s.revokedAt && new Date(s.expiresAt) > new Date());
  return (
    <section className="grid gap-3">
      <h2 className="text-step-1 font-bold">Report</h2>
      <div className="flex flex-wrap gap-2">
        <a className={`${btn} inline-flex items-center`} href={`/app/jobs/${jobId}/report`}>Open printable report</a>
        <a className={`${btn} inline-flex items-center`} href={`/app/jobs/${jobId}/report.pdf`} download data-testid="job-pdf">Download PDF</a>
      </div>
      {canWrite && (
        <form className="grid gap-2" onSubmit={(e) => { e.preventDefault(); sendReport(); }}>
          <label className="grid gap-1">E-mail the PDF to {client || 'the client'}
            <input type="email" required className={btn} value={to} onChange={(e) => setTo(e.target.value)} placeholder="client@example.com" />
          </label>
          <label className="grid gap-1">Note (optional)<textarea className="rounded-md border border-rule p-2" value={note} onChange={(e) => setNote(e.target.value)} /></label>
          <button className={btn} disabled={sending} aria-busy={sending}>{sending ? 'Sending…' : 'Send report'}</button>
        </form>
      )}
      <h3 className="font-bold">Read-only links</h3>
      <ul>{live.map((s) => (
        <li key={s.id} className="flex flex-wrap items-center gap-2">Link {s.id.slice(4, 12)}… expires {new Date(s.expiresAt).toLocaleDateString()}
          <button type="button" className={btn} onClick={() => run(api(`/api/jobs/${jobId}/shares/${s.id}`, { method: 'DELETE' }).then(onChanged), 'Link withdrawn.')}>Withdraw</button>
        </li>))}
      </ul>
      {canWrite && <button type="button" className={btn} onClick={() => run(api<{ url: string }>(`/api/jobs/${jobId}/shares`, { method: 'POST', body: { days: 30 } }).then((r) => { setLink(r.url); onChanged(); }), 'Link made; it works for 30 days.')}>Make a 30-day link</button>}
      {link && <input readOnly className={btn} value={link} aria-label="New report link" onFocus={(e) => e.target.select()} />}
      {msg && <p role="status">{msg}</p>}
    </section>
  );
}
