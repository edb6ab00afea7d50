import { memo } from 'react';
import type { ReactElement } from 'react';
import { LINE_LENGTH_RANGE } from '../lib/calculators/field-input';
import type { LineFieldsState } from '../lib/calculators/tool-state';
import type { UnitSystem } from '../lib/hydraulics';
import { fittings, materials, sizes } from '../lib/hydraulics';
import FittingsEditor from './FittingsEditor';
import NumberField from './NumberField';
import SelectField from './SelectField';

interface Props {
  s: LineFieldsState;
  update: (p: Partial<LineFieldsState>) => void;
  system: UnitSystem;
}

const ENTRANCES = fittings.filter((f) => f.kind === 'entrance');

/** The hose or pipe: catalogue size or own bore, material, length, entrance, fittings, lines. */
function LineFields({ s, update, system }: Props): ReactElement {
  const sizeChoices = [
    ...sizes.map((z) => ({ value: z.id, label: system === 'us' ? z.name_us : z.name_metric })),
    { value: 'custom', label: 'Other: type the inside diameter' },
  ];
  const matChoices = [
    { value: 'auto', label: 'As the size (catalogue material)' },
    ...materials.map((m) => ({ value: m.id, label: m.name })),
  ];
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <SelectField
        name="size"
        label="Hose or pipe size"
        value={s.size}
        choices={sizeChoices}
        onChange={(v) => update({ size: v })}
      />
      {s.size === 'custom' && (
        <NumberField
          name="diameter_m"
          label="Inside diameter"
          kind="diameter"
          system={system}
          value={s.diameter_m}
          onChange={(v) => update({ diameter_m: v })}
        />
      )}
      <SelectField
        name="material"
        label="Material (roughness)"
        value={s.material}
        choices={matChoices}
        onChange={(v) => update({ material: v })}
      />
      <NumberField
        name="length_m"
        label="Line length"
        kind="length"
        system={system}
        value={s.length_m}
        onChange={(v) => update({ length_m: v })}
        range={LINE_LENGTH_RANGE}
      />
      <SelectField
        name="entrance"
        label="Intake"
        value={s.entrance}
        choices={ENTRANCES.map((f) => ({ value: f.id, label: `${f.name} (K ${f.k})` }))}
        onChange={(v) => update({ entrance: v })}
      />
      <NumberField
        name="parallel"
        label="Lines side by side"
        unit="lines"
        system={system}
        value={s.parallel}
        onChange={(v) => update({ parallel: v })}
        hint="Identical lines, 1 to 50"
      />
      <div className="sm:col-span-2">
        <FittingsEditor rows={s.fittings} onChange={(rows) => update({ fittings: rows })} />
      </div>
    </div>
  );
}

// Memoised: while the units switch part by part (use-staged-units.ts), the other parts skip
// rendering, and React rewrites no input's attributes there.
export default memo(LineFields);
