import type { ReactElement } from 'react';
import type { Choice } from './SelectField';

interface Props {
  legend: string;
  value: string;
  choices: readonly Choice[];
  onChange: (value: string) => void;
  name: string;
}

/** Big radio choices for a few options (set-up, shape, outlet), wrapping on a phone. */
export default function ChoiceButtons(p: Props): ReactElement {
  return (
    <fieldset className="min-w-0">
      <legend className="mb-1 font-semibold">{p.legend}</legend>
      <div className="flex flex-wrap gap-2">
        {p.choices.map((c) => (
          <label
            key={c.value}
            className={`flex min-h-12 cursor-pointer items-center rounded-lg border-2 px-3 font-semibold has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-teal ${
              p.value === c.value ? 'border-teal bg-teal-wash text-teal-deep' : 'border-rule bg-white text-ink-soft'
            }`}
          >
            <input
              type="radio"
              className="sr-only"
              name={p.name}
              value={c.value}
              checked={p.value === c.value}
              onChange={() => p.onChange(c.value)}
            />
            {c.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
