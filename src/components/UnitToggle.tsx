import type { ReactElement } from 'react';
import type { UnitSystem } from '../lib/hydraulics/units';
import { setUnitSystem } from '../lib/stores/unit-system';
import { useUnitSystem } from '../lib/stores/use-calc-state';

const OPTIONS: { id: UnitSystem; label: string }[] = [
  { id: 'metric', label: 'Metric' },
  { id: 'us', label: 'US units' },
];

/** Metric / US customary switch; the choice is shared by the page and remembered. */
export default function UnitToggle(): ReactElement {
  const system = useUnitSystem();
  return (
    <div role="group" aria-label="Units" className="inline-flex rounded-lg border border-rule bg-white p-1">
      {OPTIONS.map((o) => (
        <button
          key={o.id}
          type="button"
          aria-pressed={system === o.id}
          onClick={() => setUnitSystem(o.id)}
          className={`min-h-11 min-w-11 rounded-md px-3 font-semibold ${
            system === o.id ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-deep'
          }`}
        >
          {o.label}
        </button>
      ))}
    </div>
  );
}
