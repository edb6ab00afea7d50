import { useState } from 'react';
import type { ReactElement } from 'react';
import type { FieldDiff, Scalar } from '../lib/flags/diff';
import type { Rerun } from '../lib/flags/rerun';

function show(v: Scalar | undefined): string {
  if (v === undefined) return '—';
  if (typeof v === 'number')
    return Number.isInteger(v) ? String(v) : String(Number(v.toPrecision(6)));
  return String(v);
}

function pct(d: FieldDiff): string {
  return d.relative === null
    ? ''
    : `${d.relative > 0 ? '+' : ''}${(d.relative * 100).toPrecision(3)} %`;
}

const CHANGE_TEXT: Record<FieldDiff['change'], string> = {
  same: 'same',
  changed: 'changed',
  added: 'new field',
  removed: 'gone',
};

function DiffTable({ diffs, showSame }: { diffs: FieldDiff[]; showSame: boolean }): ReactElement {
  const rows = showSame ? diffs : diffs.filter((d) => d.change !== 'same');
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-white">
      <table className="w-full min-w-[32rem] text-left text-step--1" data-testid="rerun-diff">
        <thead className="bg-paper-deep">
          <tr>
            <th className="p-2">Field</th>
            <th className="p-2">Frozen</th>
            <th className="p-2">Today</th>
            <th className="p-2">Change</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((d) => (
            <tr
              key={d.path}
              data-change={d.change}
              className={
                d.change === 'same'
                  ? 'border-t border-rule'
                  : 'border-t border-rule bg-verdict-edge-wash font-semibold'
              }
            >
              <td className="p-2 font-mono break-all">{d.path}</td>
              <td className="p-2">{show(d.before)}</td>
              <td className="p-2">{show(d.after)}</td>
              <td className="p-2">
                {d.change === 'same' ? 'same' : `▲ ${CHANGE_TEXT[d.change]} ${pct(d)}`}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** "Re-run on today's engine": solve the frozen inputs again and highlight what moved. */
export default function RerunDiff({ flagId }: { flagId: string }): ReactElement {
  const [rerun, setRerun] = useState<Rerun | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [showSame, setShowSame] = useState(false);

  const run = async (): Promise<void> => {
    setBusy(true);
    try {
      const res = await fetch(`/api/support/flags/${flagId}/rerun`);
      if (!res.ok) throw new Error(`Re-run failed (${res.status}).`);
      setRerun((await res.json()) as Rerun);
      setError(null);
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="space-y-3">
      <button
        type="button"
        onClick={run}
        disabled={busy}
        className="min-h-11 rounded-lg bg-teal px-4 font-semibold text-white hover:bg-teal-deep"
      >
        {busy ? 'Solving…' : "Re-run on today's engine"}
      </button>
      {error && (
        <p role="alert" className="font-semibold text-verdict-fails">
          {error}
        </p>
      )}
      {rerun && !rerun.ok && (
        <p
          role="status"
          className="rounded-lg border-l-8 border-verdict-fails bg-verdict-fails-wash p-3"
          data-testid="rerun-refused"
        >
          Engine {rerun.engineVersion} refuses these inputs — {rerun.error.path}:{' '}
          {rerun.error.message}
        </p>
      )}
      {rerun?.ok && (
        <>
          <p role="status" data-testid="rerun-summary" className="font-semibold">
            Engine {rerun.engineVersion}:{' '}
            {rerun.changed === 0
              ? 'every field matches the frozen result.'
              : `${rerun.changed} field${rerun.changed === 1 ? '' : 's'} differ from the frozen result.`}
          </p>
          <label className="flex min-h-11 items-center gap-2">
            <input
              type="checkbox"
              checked={showSame}
              onChange={(e) => setShowSame(e.target.checked)}
              className="size-5"
            />
            Show unchanged fields too
          </label>
          {(showSame || rerun.changed > 0) && <DiffTable diffs={rerun.diffs} showSame={showSame} />}
        </>
      )}
    </div>
  );
}
