import type { ReactElement } from 'react';
import type { Figure } from '../lib/calculators/quick-result';
import { figureValue } from '../lib/calculators/quick-result';
import type { UnitSystem } from '../lib/hydraulics/units';

/** Result figures: label, number with its unit, and a note. */
export default function FigureList({ figures, system }: { figures: Figure[]; system: UnitSystem }): ReactElement {
  return (
    <dl className="grid grid-cols-2 gap-3">
      {figures.map((f) => (
        <div key={f.id} className="min-w-0 rounded-lg border border-rule bg-white p-3">
          <dt className="text-step--1 font-semibold text-ink-soft">{f.label}</dt>
          <dd className="text-step-1 leading-tight font-extrabold tabular-nums sm:text-step-2" data-figure={f.id}>
            {figureValue(f, system)}
          </dd>
          {f.note && <dd className="text-step--1 text-ink-faint">{f.note}</dd>}
        </div>
      ))}
    </dl>
  );
}
