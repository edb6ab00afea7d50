import { memo } from 'react';
import type { ReactElement } from 'react';
import { WATER_TEMPERATURE_RANGE } from '../lib/calculators/field-input';
import type { LineFieldsState } from '../lib/calculators/tool-state';
import type { UnitSystem } from '../lib/hydraulics';
import ChoiceButtons from './ChoiceButtons';
import NumberField from './NumberField';

interface Props {
  s: LineFieldsState;
  update: (p: Partial<LineFieldsState>) => void;
  system: UnitSystem;
}

/** Water temperature, and the site's air pressure from altitude or a barometer. */
function WaterSiteFields({ s, update, system }: Props): ReactElement {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <NumberField
        name="temp_c"
        label="Water temperature"
        kind="temperature"
        system={system}
        value={s.temp_c}
        onChange={(v) => update({ temp_c: v })}
        range={WATER_TEMPERATURE_RANGE}
        hint="0 to 99 °C (32 to 210 °F)"
      />
      <ChoiceButtons
        legend="Air pressure from"
        name="site_mode"
        value={s.site_mode}
        choices={[
          { value: 'altitude', label: 'Site altitude' },
          { value: 'barometer', label: 'Barometer reading' },
        ]}
        onChange={(v) => update({ site_mode: v as LineFieldsState['site_mode'] })}
      />
      {s.site_mode === 'altitude' ? (
        <NumberField
          name="altitude_m"
          label="Altitude above sea level"
          kind="elevation"
          system={system}
          value={s.altitude_m}
          onChange={(v) => update({ altitude_m: v })}
        />
      ) : (
        <NumberField
          name="pressure_pa"
          label="Barometer (absolute, not sea-level corrected)"
          kind="pressure"
          system={system}
          value={s.pressure_pa}
          onChange={(v) => update({ pressure_pa: v })}
        />
      )}
    </div>
  );
}

// Memoised: while the units switch part by part (use-staged-units.ts), the other parts skip
// rendering, and React rewrites no input's attributes there.
export default memo(WaterSiteFields);
