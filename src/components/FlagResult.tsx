import { useId, useState } from 'react';
import type { FormEvent, ReactElement } from 'react';
import { ENGINE_VERSION } from '../lib/hydraulics/constants';
import { REASON_LABELS } from '../lib/flags/labels';
import type { FlagReason, FlagTool } from '../lib/flags/labels';

export interface FlagResultProps {
  /** Which engine solver produced the result. */
  tool: FlagTool;
  /** The engine request exactly as solved (SI, API v1 shape), so support can re-run it. */
  inputs: object;
  /** The engine result the user is looking at. */
  results: object;
  unitSystem: 'metric' | 'us';
  /** Path of the page; defaults to the current address (with its query string). */
  page?: string;
}

type Phase =
  | { step: 'closed' }
  | { step: 'open'; error?: string }
  | { step: 'sending' }
  | { step: 'sent'; email: string };

const REASONS = Object.entries(REASON_LABELS) as [FlagReason, string][];

function engineVersionOf(results: object): string {
  const v = (results as { engine_version?: unknown }).engine_version;
  return typeof v === 'string' && v ? v : ENGINE_VERSION;
}

/** What went wrong, in the form's own words; fields the crew never sees are not named. */
function flagErrorText(
  err: { message?: string; issues?: { path: string; message: string }[] },
  typedEmail: string,
): string {
  const issue = err.issues?.[0];
  if (!issue) return err.message ?? 'Sending failed; try again.';
  if (issue.path === 'email') {
    return typedEmail
      ? 'That e-mail address does not look complete; check it.'
      : 'Leave an e-mail address so we can answer you.';
  }
  if (issue.path === 'message') return `Tell us more: ${issue.message}`;
  return `This result could not be attached to the flag (${issue.message}).`;
}

/** Send the flag; the address we will write to, or what went wrong. */
async function sendFlag(
  p: FlagResultProps,
  reason: FlagReason,
  message: string,
  email: string,
): Promise<{ error: string } | { email: string }> {
  const page = p.page ?? `${window.location.pathname}${window.location.search}`;
  const body = {
    tool: p.tool,
    reason,
    message,
    ...(email ? { email } : {}),
    snapshot: {
      inputs: p.inputs,
      results: p.results,
      engineVersion: engineVersionOf(p.results),
      unitSystem: p.unitSystem,
      page,
    },
  };
  try {
    const res = await fetch('/api/flags', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify(body),
    });
    const answer = (await res.json().catch(() => ({}))) as {
      email?: string;
      message?: string;
      issues?: { path: string; message: string }[];
    };
    if (res.ok) return { email: answer.email ?? email };
    return { error: flagErrorText(answer, email) };
  } catch {
    return { error: 'No connection; try again when you have signal.' };
  }
}

/** "Flag this result": tell our support desk a result looks doubtful, with the result frozen. */
export default function FlagResult(p: FlagResultProps): ReactElement {
  const id = useId();
  const [phase, setPhase] = useState<Phase>({ step: 'closed' });
  const [reason, setReason] = useState<FlagReason>('looks_wrong');
  const [message, setMessage] = useState('');
  const [email, setEmail] = useState('');

  if (phase.step === 'closed') {
    return (
      <button
        type="button"
        className="min-h-11 rounded-lg border-2 border-rule bg-white px-3 font-semibold text-ink-soft hover:border-teal"
        onClick={() => setPhase({ step: 'open' })}
      >
        Flag this result
      </button>
    );
  }
  if (phase.step === 'sent') {
    return (
      <p
        role="status"
        className="rounded-lg border-l-8 border-teal bg-teal-wash p-3"
        data-testid="flag-sent"
      >
        Thanks — our support desk has it. We will write to {phase.email || 'your account address'}{' '}
        with a link to follow the answer.
      </p>
    );
  }

  const submit = async (e: FormEvent): Promise<void> => {
    e.preventDefault();
    setPhase({ step: 'sending' });
    const sent = await sendFlag(p, reason, message.trim(), email.trim());
    setPhase('error' in sent ? { step: 'open', error: sent.error } : { step: 'sent', ...sent });
  };

  return (
    <form
      onSubmit={submit}
      aria-label="Flag this result"
      className="space-y-3 rounded-lg border border-rule bg-white p-3"
    >
      <fieldset>
        <legend className="font-extrabold">What is the matter?</legend>
        {REASONS.map(([value, label]) => (
          <label key={value} className="flex min-h-11 items-center gap-2">
            <input
              type="radio"
              name={`${id}-reason`}
              value={value}
              checked={reason === value}
              onChange={() => setReason(value)}
              className="size-5"
            />
            {label}
          </label>
        ))}
      </fieldset>
      <label className="block">
        <span className="font-semibold">Tell us more (optional)</span>
        <textarea
          value={message}
          onChange={(e) => setMessage(e.target.value)}
          maxLength={4000}
          rows={3}
          className="mt-1 block w-full rounded border border-rule p-2"
          name="message"
        />
      </label>
      <label className="block">
        <span className="font-semibold">Your e-mail, so we can answer</span>
        <input
          type="email"
          autoComplete="email"
          inputMode="email"
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          className="mt-1 block min-h-11 w-full rounded border border-rule px-2"
          name="email"
        />
        <span className="text-step--1 text-ink-faint">Signed in? You can leave this empty.</span>
      </label>
      <p className="text-step--1 text-ink-faint">
        We keep a copy of these inputs and results so support can check them.
      </p>
      {phase.step === 'open' && phase.error && (
        <p role="alert" className="font-semibold text-verdict-fails">
          {phase.error}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <button
          type="submit"
          disabled={phase.step === 'sending'}
          className="min-h-11 rounded-lg bg-teal px-4 font-semibold text-white hover:bg-teal-deep"
        >
          {phase.step === 'sending' ? 'Sending…' : 'Send to support'}
        </button>
        <button
          type="button"
          onClick={() => setPhase({ step: 'closed' })}
          className="min-h-11 rounded-lg px-3 font-semibold text-ink-soft underline"
        >
          Cancel
        </button>
      </div>
    </form>
  );
}
