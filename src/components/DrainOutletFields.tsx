import { memo } from 'react';
import type { ReactElement } from 'react';
import type { DrainToolState } from '../lib/calculators/drain-tool';
import { OUTLET_TYPES } from '../lib/calculators/input-words';
import type { UnitSystem } from '../lib/hydraulics';
import ChoiceButtons from './ChoiceButtons';
import LineFields from './LineFields';
import NumberField from './NumberField';

interface Props {
  s: DrainToolState;
  update: (p: Partial<DrainToolState>) => void;
  system: UnitSystem;
}

type Key = keyof DrainToolState & string;

/** How the water leaves: holes, a gravity line, or a siphon over the rim. */
function DrainOutletFields({ s, update, system }: Props): ReactElement {
  const f = (
    label: string,
    key: Key,
    kind: 'length' | 'elevation' | 'diameter',
    hint?: string,
  ): ReactElement => (
    <NumberField
      key={key}
      name={key}
      label={label}
      kind={kind}
      hint={hint}
      system={system}
      value={s[key] as number}
      onChange={(v) => update({ [key]: v } as Partial<DrainToolState>)}
    />
  );
  return (
    <div className="space-y-4">
      <ChoiceButtons
        legend="Drains through"
        name="outlet"
        value={s.outlet}
        choices={OUTLET_TYPES}
        onChange={(v) => update({ outlet: v as DrainToolState['outlet'] })}
      />
      {s.outlet === 'orifice' ? (
        <div className="grid gap-4 sm:grid-cols-2">
          {f('Hole diameter', 'hole_diameter_m', 'diameter')}
          <NumberField
            name="cd"
            label="Discharge coefficient"
            unit="Cd"
            system={system}
            value={s.cd}
            onChange={(v) => update({ cd: v })}
            hint="0.61 for a sharp-edged hole"
          />
          {f('Hole height above the bottom', 'hole_height_m', 'length')}
          <NumberField
            name="hole_count"
            label="How many holes"
            unit="holes"
            system={system}
            value={s.hole_count}
            onChange={(v) => update({ hole_count: v })}
          />
        </div>
      ) : (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            {f('Intake height above the bottom', 'intake_height_m', 'length')}
            {f('Outlet elevation', 'outlet_m', 'elevation', 'Same datum as the bottom')}
            {s.outlet === 'siphon' &&
              f(
                'Crest elevation',
                'crest_m',
                'elevation',
                'Top of the rim or bank the hose goes over',
              )}
            {s.outlet === 'siphon' &&
              f('Length from intake to crest', 'length_to_crest_m', 'length')}
            {s.outlet === 'siphon' && (
              <NumberField
                name="k_to_crest"
                label="Fittings K before the crest"
                unit="K"
                system={system}
                value={s.k_to_crest}
                onChange={(v) => update({ k_to_crest: v })}
              />
            )}
            <label className="flex min-h-12 items-center gap-3 font-semibold sm:col-span-2">
              <input
                type="checkbox"
                className="h-6 w-6 accent-teal"
                checked={s.has_tail}
                onChange={(e) => update({ has_tail: e.target.checked })}
              />
              The outlet is under water (a tailwater)
            </label>
            {s.has_tail && f('Tailwater surface', 'tailwater_m', 'elevation')}
          </div>
          <LineFields s={s} update={update} system={system} />
        </>
      )}
    </div>
  );
}

// Memoised: while the units switch part by part (use-staged-units.ts), the other parts skip
// rendering, and React rewrites no input's attributes there.
export default memo(DrainOutletFields);
