import type { ReactElement } from 'react';
import type { FittingRow } from '../lib/calculators/tool-state';
import { fittings } from '../lib/hydraulics';

const FITTINGS = fittings.filter((f) => f.kind === 'fitting');

interface Props {
  rows: FittingRow[];
  onChange: (rows: FittingRow[]) => void;
}

/** Fittings along the line from the catalogue, each with a count; K shown beside each. */
export default function FittingsEditor({ rows, onChange }: Props): ReactElement {
  const set = (i: number, patch: Partial<FittingRow>): void =>
    onChange(rows.map((r, j) => (j === i ? ({ ...r, ...patch } as FittingRow) : r)));
  const totalK = rows.reduce((s, r) => s + (FITTINGS.find((f) => f.id === r.id)?.k ?? 0) * r.count, 0);
  return (
    <fieldset className="min-w-0 rounded-lg border border-rule p-3">
      <legend className="px-1 font-semibold">Fittings along the line</legend>
      {rows.length === 0 && <p className="text-ink-faint">None: a straight run.</p>}
      <ul className="space-y-2">
        {rows.map((r, i) => (
          <li key={i} className="flex flex-wrap items-center gap-2" data-fitting-row={i}>
            <select
              aria-label={`Fitting ${i + 1}`}
              value={r.id}
              onChange={(e) => set(i, { id: e.target.value })}
              className="min-h-12 min-w-0 flex-1 basis-48 rounded-lg border border-rule bg-white px-2"
            >
              {FITTINGS.map((f) => (
                <option key={f.id} value={f.id}>
                  {f.name} (K {f.k})
                </option>
              ))}
            </select>
            <input
              aria-label={`How many of fitting ${i + 1}`}
              type="number"
              inputMode="numeric"
              min={1}
              step={1}
              value={r.count}
              onChange={(e) => set(i, { count: Math.max(1, Math.round(Number(e.target.value) || 1)) })}
              className="min-h-12 w-20 rounded-lg border border-rule bg-white px-2 text-step-1"
            />
            <button
              type="button"
              onClick={() => onChange(rows.filter((_, j) => j !== i))}
              className="min-h-12 min-w-12 rounded-lg border border-rule bg-white px-2 font-semibold"
              aria-label={`Remove fitting ${i + 1}`}
            >
              ✕
            </button>
          </li>
        ))}
      </ul>
      <div className="mt-2 flex flex-wrap items-center justify-between gap-2">
        <button
          type="button"
          onClick={() => onChange([...rows, { id: FITTINGS[0]!.id, count: 1 }])}
          className="min-h-12 rounded-lg border-2 border-teal bg-white px-3 font-semibold text-teal-deep"
        >
          Add a fitting
        </button>
        <span className="text-ink-soft" data-testid="fittings-k">
          ΣK = {Number(totalK.toFixed(3))}
        </span>
      </div>
    </fieldset>
  );
}
