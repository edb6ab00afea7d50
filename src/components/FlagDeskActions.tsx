import { useState } from 'react';
import type { FormEvent, ReactElement } from 'react';
import { STATUS_LABELS } from '../lib/flags/labels';
import type { FlagStatus } from '../lib/flags/labels';

interface Props {
  flagId: string;
  status: FlagStatus;
  assigneeUserId: string | null;
  staff: { id: string; name: string | null; email: string }[];
}

async function call(url: string, method: string, body: unknown): Promise<string | null> {
  try {
    const res = await fetch(url, {
      method,
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify(body),
    });
    if (res.ok) return null;
    const err = (await res.json().catch(() => ({}))) as {
      message?: string;
      issues?: { message: string }[];
    };
    return err.message ?? err.issues?.map((i) => i.message).join('; ') ?? `Failed (${res.status}).`;
  } catch {
    return 'No connection to the server.';
  }
}

function MessageForm(p: {
  label: string;
  button: string;
  onSend: (body: string) => Promise<string | null>;
  name: string;
}): ReactElement {
  const [body, setBody] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const submit = async (e: FormEvent): Promise<void> => {
    e.preventDefault();
    setBusy(true);
    const err = await p.onSend(body);
    setBusy(false);
    if (err) setError(err);
    else window.location.reload();
  };
  return (
    <form onSubmit={submit} className="space-y-2">
      <label className="block">
        <span className="font-semibold">{p.label}</span>
        <textarea
          name={p.name}
          value={body}
          onChange={(e) => setBody(e.target.value)}
          required
          rows={4}
          maxLength={8000}
          className="mt-1 block w-full rounded border border-rule bg-white p-2"
        />
      </label>
      {error && (
        <p role="alert" className="font-semibold text-verdict-fails">
          {error}
        </p>
      )}
      <button
        type="submit"
        disabled={busy}
        className="min-h-11 rounded-lg bg-teal px-4 font-semibold text-white hover:bg-teal-deep"
      >
        {busy ? 'Saving…' : p.button}
      </button>
    </form>
  );
}

/** The desk's controls on one flag: status, assignment, a reply to the reporter, a note. */
export default function FlagDeskActions(p: Props): ReactElement {
  const [error, setError] = useState<string | null>(null);
  const patch = async (change: Record<string, unknown>): Promise<void> => {
    const err = await call(`/api/support/flags/${p.flagId}`, 'PATCH', change);
    if (err) setError(err);
    else window.location.reload();
  };
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap gap-3">
        <label className="flex flex-col font-semibold">
          Status
          <select
            name="status"
            value={p.status}
            onChange={(e) => void patch({ status: e.target.value })}
            className="min-h-11 rounded border border-rule bg-white px-2"
          >
            {Object.entries(STATUS_LABELS).map(([v, l]) => (
              <option key={v} value={v}>
                {l}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col font-semibold">
          Assigned to
          <select
            name="assignee"
            value={p.assigneeUserId ?? ''}
            onChange={(e) => void patch({ assigneeUserId: e.target.value || null })}
            className="min-h-11 rounded border border-rule bg-white px-2"
          >
            <option value="">Nobody</option>
            {p.staff.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name ?? s.email}
              </option>
            ))}
          </select>
        </label>
      </div>
      {error && (
        <p role="alert" className="font-semibold text-verdict-fails">
          {error}
        </p>
      )}
      <MessageForm
        name="reply"
        label="Reply to the reporter (sent by e-mail)"
        button="Send reply"
        onSend={(body) => call(`/api/support/flags/${p.flagId}/replies`, 'POST', { body })}
      />
      <MessageForm
        name="note"
        label="Internal note (staff only)"
        button="Add note"
        onSend={(body) => call(`/api/support/flags/${p.flagId}/notes`, 'POST', { body })}
      />
    </div>
  );
}
