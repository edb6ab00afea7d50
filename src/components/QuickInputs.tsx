import type { ReactElement } from 'react';
import { LINE_LENGTH_RANGE } from '../lib/calculators/field-input';
import type { QuickState } from '../lib/calculators/quick-check';
import { QUICK_SIZE_FAMILIES } from '../lib/calculators/quick-check';
import type { UnitSystem } from '../lib/hydraulics/units';
import { sizes } from '../lib/hydraulics';
import ChoiceButtons from './ChoiceButtons';
import NumberField from './NumberField';
import SelectField from './SelectField';

interface Props {
  s: QuickState;
  update: (p: Partial<QuickState>) => void;
  system: UnitSystem;
}

const hoseChoices = (system: UnitSystem) =>
  sizes
    .filter((z) => (QUICK_SIZE_FAMILIES as readonly string[]).includes(z.family))
    .map((z) => ({ value: z.id, label: system === 'us' ? z.name_us : z.name_metric }));

/** The few inputs of each quick-check set-up. */
export default function QuickInputs({ s, update, system }: Props): ReactElement {
  const n = (label: string, key: keyof QuickState & string, kind: 'length' | 'volume' | 'diameter', hint?: string) => (
    <NumberField
      key={key}
      name={key}
      label={label}
      kind={kind}
      hint={hint}
      system={system}
      value={s[key] as number}
      onChange={(v) => update({ [key]: v } as Partial<QuickState>)}
      range={key === 'length_m' ? LINE_LENGTH_RANGE : undefined}
    />
  );
  const hose = (
    <SelectField key="size" name="size" label="Hose" value={s.size} choices={hoseChoices(system)} onChange={(v) => update({ size: v })} />
  );
  if (s.mode === 'siphon')
    return (
      <div className="grid gap-4 sm:grid-cols-2">
        {hose}
        {n('Hose length', 'length_m', 'length')}
        {n('Crest height above the water', 'crest_m', 'length', 'The highest point the hose goes over')}
        {n('Outlet below the water', 'fall_m', 'length', 'Where the hose ends, below the source surface')}
        {n('Water to move', 'volume_m3', 'volume')}
      </div>
    );
  if (s.mode === 'line')
    return (
      <div className="grid gap-4 sm:grid-cols-2">
        {hose}
        {n('Hose length', 'length_m', 'length')}
        {n('Fall from water surface to outlet', 'fall_m', 'length')}
        {n('Water to move', 'volume_m3', 'volume')}
      </div>
    );
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <ChoiceButtons
        legend="Tank shape"
        name="tank_shape"
        value={s.tank_shape}
        choices={[
          { value: 'box', label: 'Square or oblong' },
          { value: 'vertical_cylinder', label: 'Round, upright' },
        ]}
        onChange={(v) => update({ tank_shape: v as QuickState['tank_shape'] })}
      />
      {s.tank_shape === 'box' ? (
        <>
          {n('Tank length', 'tank_length_m', 'length')}
          {n('Tank width', 'tank_width_m', 'length')}
        </>
      ) : (
        n('Tank diameter', 'tank_diameter_m', 'length')
      )}
      {n('Water depth', 'water_depth_m', 'length')}
      <ChoiceButtons
        legend="Drains through"
        name="tank_outlet"
        value={s.tank_outlet}
        choices={[
          { value: 'hose', label: 'A hose from the bottom' },
          { value: 'hole', label: 'A hole or open valve' },
        ]}
        onChange={(v) => update({ tank_outlet: v as QuickState['tank_outlet'] })}
      />
      {s.tank_outlet === 'hose' ? (
        <>
          {hose}
          {n('Hose length', 'length_m', 'length')}
          {n('Hose end below the tank bottom', 'drop_m', 'length')}
        </>
      ) : (
        n('Hole diameter', 'hole_diameter_m', 'diameter', 'Sharp-edged hole in the bottom')
      )}
    </div>
  );
}
