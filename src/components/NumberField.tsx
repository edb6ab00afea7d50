import { useEffect, useId, useState } from 'react';
import type { ReactElement } from 'react';
import type { QuantityKind, UnitSystem } from '../lib/hydraulics/units';
import { fromDisplay, toDisplay, unitLabel } from '../lib/hydraulics/units';

interface Props {
  label: string;
  /** SI value. */
  value: number;
  onChange: (si: number) => void;
  system: UnitSystem;
  /** Quantity kind for unit conversion; none for plain numbers (counts, K, Cd). */
  kind?: QuantityKind;
  /** Unit text for plain numbers. */
  unit?: string;
  hint?: string;
  /** Name used in the query string and by tests. */
  name?: string;
}

/** Up to 6 significant figures, no trailing zeros, so a converted value reads cleanly. */
export function inputText(si: number, system: UnitSystem, kind?: QuantityKind): string {
  const v = kind ? toDisplay(kind, si, system) : si;
  return Number.isFinite(v) ? String(Number(v.toPrecision(6))) : '';
}

/** A typed number with a decimal comma or point; NaN when it is not one. */
export function readTyped(text: string): number {
  const t = text.trim().replace(',', '.');
  return /^[-+]?(\d+\.?\d*|\.\d+)$/.test(t) ? Number(t) : NaN;
}

/** A labelled number input in the crew's units, with the unit beside it. */
export default function NumberField(p: Props): ReactElement {
  const id = useId();
  const toSI = (v: number): number => (p.kind ? fromDisplay(p.kind, v, p.system) : v);
  const [text, setText] = useState(() => inputText(p.value, p.system, p.kind));
  const typed = readTyped(text);
  useEffect(() => {
    const current = readTyped(text);
    const same = Number.isFinite(current) && Math.abs(toSI(current) - p.value) <= 1e-9 * Math.abs(p.value);
    if (!same) setText(inputText(p.value, p.system, p.kind));
    // re-sync only when the value or the unit system changes from outside
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [p.value, p.system]);
  const unit = p.kind ? unitLabel(p.kind, p.system) : p.unit;
  const bad = text.trim() !== '' && !Number.isFinite(typed);
  return (
    <div className="min-w-0">
      <label htmlFor={id} className="block font-semibold">
        {p.label}
      </label>
      <div className="mt-1 flex items-stretch">
        <input
          id={id}
          name={p.name}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          value={text}
          aria-invalid={bad || undefined}
          aria-describedby={p.hint || bad ? `${id}-hint` : undefined}
          onChange={(e) => {
            setText(e.target.value);
            const v = readTyped(e.target.value);
            if (Number.isFinite(v)) p.onChange(toSI(v));
          }}
          className="min-h-12 w-full min-w-0 rounded-l-lg border border-rule bg-white px-3 text-step-1 tabular-nums"
        />
        {unit && (
          <span className="flex min-w-14 items-center justify-center rounded-r-lg border border-l-0 border-rule bg-paper-deep px-2 text-ink-soft">
            {unit}
          </span>
        )}
      </div>
      {(p.hint || bad) && (
        <p id={`${id}-hint`} className={`mt-1 text-step--1 ${bad ? 'font-semibold text-verdict-fails' : 'text-ink-faint'}`}>
          {bad ? 'Type a number, like 2.5' : p.hint}
        </p>
      )}
    </div>
  );
}
