import { useId } from 'react';
import type { ReactElement } from 'react';

export interface Choice {
  value: string;
  label: string;
}

interface Props {
  label: string;
  value: string;
  choices: readonly Choice[];
  onChange: (value: string) => void;
  name?: string;
  hint?: string;
}

/** A labelled native select (the phone's own picker), at least 48 px tall. */
export default function SelectField(p: Props): ReactElement {
  const id = useId();
  // When the labels change (a unit switch renames every hose size), a new select replaces the
  // old one: the browser redoes a select's option list for each option renamed in place, a
  // millisecond apiece on a phone.
  const labels = p.choices.map((c) => c.label).join('\n');
  return (
    <div className="min-w-0">
      <label htmlFor={id} className="block font-semibold">
        {p.label}
      </label>
      <select
        key={labels}
        id={id}
        name={p.name}
        value={p.value}
        onChange={(e) => p.onChange(e.target.value)}
        className="mt-1 min-h-12 w-full min-w-0 rounded-lg border border-rule bg-white px-3 text-step-0"
      >
        {p.choices.map((c) => (
          <option key={c.value} value={c.value}>
            {c.label}
          </option>
        ))}
      </select>
      {p.hint && <p className="mt-1 text-step--1 text-ink-faint">{p.hint}</p>}
    </div>
  );
}
