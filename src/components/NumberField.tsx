import { useEffect, useId, useState } from 'react';
import type { ReactElement } from 'react';
import type { FieldRange } from '../lib/calculators/field-input';
import { readField } from '../lib/calculators/field-input';
import type { QuantityKind, UnitSystem } from '../lib/hydraulics/units';
import { toDisplay, unitLabel } from '../lib/hydraulics/units';
import { writeNumberText } from '../lib/number-text';
import { useReportPending } from '../lib/stores/pending-inputs';
import { useInputLocale } from '../lib/stores/use-input-locale';

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
  /** Lowest and highest SI value accepted; outside it the box says so in the crew's units. */
  range?: FieldRange;
}

/** Up to 6 significant figures, no trailing zeros, in the locale's decimal mark. */
export function inputText(
  si: number,
  system: UnitSystem,
  kind?: QuantityKind,
  locale?: string,
): string {
  return writeNumberText(kind ? toDisplay(kind, si, system) : si, locale);
}

/** A labelled number input in the crew's units, with the unit beside it. */
export default function NumberField(p: Props): ReactElement {
  const id = useId();
  const locale = useInputLocale();
  const spec = { locale, system: p.system, kind: p.kind, unit: p.unit, range: p.range };
  const [text, setText] = useState(() => inputText(p.value, p.system, p.kind, locale));
  const typed = readField(text, spec);
  useReportPending(!typed.ok);
  useEffect(() => {
    const current = readField(text, spec);
    const same = current.ok && Math.abs(current.si - p.value) <= 1e-9 * Math.abs(p.value);
    if (!same) setText(inputText(p.value, p.system, p.kind, locale));
    // re-sync only when the value, the unit system or the locale changes from outside
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [p.value, p.system, locale]);
  const unit = p.kind ? unitLabel(p.kind, p.system) : p.unit;
  const problem = !typed.ok && !typed.empty ? typed.problem : null;
  const bad = problem !== null;
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
            const r = readField(e.target.value, spec);
            if (r.ok) p.onChange(r.si);
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
        <p
          id={`${id}-hint`}
          className={`mt-1 text-step--1 ${bad ? 'font-semibold text-verdict-fails' : 'text-ink-faint'}`}
        >
          {problem ?? p.hint}
        </p>
      )}
    </div>
  );
}
