import { useEffect, useId, useRef, useState } from 'react';
import type { ReactElement } from 'react';
import type { StageRow } from '../lib/calculators/drain-tool';
import type { UnitSystem } from '../lib/hydraulics';
import { unitLabel } from '../lib/hydraulics';
import { parseStageCsv, stageCsvText } from '../lib/stage-table-csv';
import { useInputLocale } from '../lib/stores/use-input-locale';
import { useReportPending } from '../lib/stores/pending-inputs';

interface Props {
  rows: StageRow[];
  onChange: (rows: StageRow[]) => void;
  system: UnitSystem;
}

/** A depth–area table typed as CSV or uploaded from a file, checked row by row. */
export default function StageTableEditor({ rows, onChange, system }: Props): ReactElement {
  const id = useId();
  const locale = useInputLocale();
  const [text, setText] = useState(() => stageCsvText(rows, system, locale));
  const [errors, setErrors] = useState<string[]>([]);
  // the typed table does not parse (a refused upload leaves the table, and the result, as they were)
  const [textBad, setTextBad] = useState(false);
  useReportPending(textBad);
  const [loaded, setLoaded] = useState('');
  const emitted = useRef<StageRow[] | null>(null);
  const shownIn = useRef(`${system} ${locale}`);
  useEffect(() => {
    // a change of units or a table from a link rewrites the text; the crew's own typing does not
    if (rows === emitted.current && shownIn.current === `${system} ${locale}`) return;
    shownIn.current = `${system} ${locale}`;
    setErrors([]);
    setTextBad(false);
    setText(stageCsvText(rows, system, locale));
  }, [system, rows, locale]);
  const apply = (t: string): void => {
    setText(t);
    const r = parseStageCsv(t, system, locale);
    setErrors(r.errors);
    setTextBad(r.errors.length > 0);
    if (r.errors.length === 0) {
      const next = r.points as StageRow[];
      emitted.current = next;
      onChange(next);
    }
  };
  return (
    <div className="space-y-2">
      <label htmlFor={id} className="block font-semibold">
        Depth–area table ({unitLabel('length', system)}, {unitLabel('area', system)})
      </label>
      <p id={`${id}-help`} className="text-step--1 text-ink-faint">
        One row per level: depth from the bottom, then the water surface area there. First depth 0.
      </p>
      <textarea
        id={id}
        name="stage"
        rows={6}
        value={text}
        aria-describedby={`${id}-help`}
        aria-invalid={errors.length > 0 || undefined}
        onChange={(e) => apply(e.target.value)}
        className="w-full rounded-lg border border-rule bg-white p-3 font-mono text-step-0"
      />
      <label className="flex min-h-12 w-fit cursor-pointer items-center rounded-lg border-2 border-teal bg-white px-3 font-semibold text-teal-deep has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-teal">
        Upload a CSV file
        <input
          type="file"
          accept=".csv,text/csv,text/plain"
          className="sr-only"
          data-testid="stage-upload"
          onChange={async (e) => {
            const file = e.target.files?.[0];
            if (!file) return;
            const t = await file.text();
            const r = parseStageCsv(t, system, locale);
            if (r.notText) {
              // a file that is not text leaves the typed table as it was
              setErrors([`“${file.name}”: ${r.errors[0]} The table above is unchanged.`]);
              return;
            }
            setLoaded(file.name);
            apply(t);
          }}
        />
      </label>
      {loaded && <p className="text-step--1 text-ink-soft">Read from {loaded}.</p>}
      {errors.length > 0 && (
        <ul
          role="alert"
          data-testid="stage-errors"
          className="space-y-1 rounded-lg border-l-8 border-verdict-fails bg-verdict-fails-wash p-3 font-semibold"
        >
          {errors.map((m) => (
            <li key={m}>{m}</li>
          ))}
        </ul>
      )}
      {errors.length === 0 && (
        <p className="text-step--1 text-ink-soft" data-testid="stage-count">
          {rows.length} levels in use.
        </p>
      )}
    </div>
  );
}
