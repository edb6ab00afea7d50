import { memo } from 'react';
import type { ReactElement } from 'react';
import type { SiphonToolState } from '../lib/calculators/line-tool';
import type { UnitSystem } from '../lib/hydraulics';
import ChoiceButtons from './ChoiceButtons';
import NumberField from './NumberField';

interface Props {
  s: SiphonToolState;
  update: (p: Partial<SiphonToolState>) => void;
  system: UnitSystem;
}

/** The crest: its elevation, the run up to it, the fittings before it, the pressure limit. */
function SiphonCrestFields({ s, update, system }: Props): ReactElement {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <NumberField
        name="crest_m"
        label="Crest elevation"
        kind="elevation"
        system={system}
        value={s.crest_m}
        onChange={(v) => update({ crest_m: v })}
        hint="The highest point of the line"
      />
      <NumberField
        name="length_to_crest_m"
        label="Length from intake to crest"
        kind="length"
        system={system}
        value={s.length_to_crest_m}
        onChange={(v) => update({ length_to_crest_m: v })}
      />
      <NumberField
        name="k_to_crest"
        label="Fittings K before the crest"
        unit="K"
        system={system}
        value={s.k_to_crest}
        onChange={(v) => update({ k_to_crest: v })}
        hint="Part of ΣK below that sits before the crest"
      />
      <ChoiceButtons
        legend="Lowest crest pressure"
        name="limit_mode"
        value={s.limit_mode}
        choices={[
          { value: 'default', label: 'Drainwright margin' },
          { value: 'custom', label: 'My own' },
        ]}
        onChange={(v) => update({ limit_mode: v as SiphonToolState['limit_mode'] })}
      />
      {s.limit_mode === 'custom' && (
        <NumberField
          name="min_crest_pa"
          label="Lowest crest pressure (absolute)"
          kind="pressure"
          system={system}
          value={s.min_crest_pa}
          onChange={(v) => update({ min_crest_pa: v })}
        />
      )}
    </div>
  );
}

// Memoised: while the units switch part by part (use-staged-units.ts), the other parts skip
// rendering, and React rewrites no input's attributes there.
export default memo(SiphonCrestFields);
