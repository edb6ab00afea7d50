import { memo, Suspense, lazy } from 'react';
import type { ReactElement } from 'react';
import type { DrainToolState, VesselShape } from '../lib/calculators/drain-tool';
import { SHAPES } from '../lib/calculators/input-words';
import type { UnitSystem } from '../lib/hydraulics';
import NumberField from './NumberField';
import SelectField from './SelectField';

// the table editor brings the CSV parser: loaded only when a crew picks a depth–area table
const StageTableEditor = lazy(() => import('./StageTableEditor'));

interface Props {
  s: DrainToolState;
  update: (p: Partial<DrainToolState>) => void;
  system: UnitSystem;
}

type Key = keyof DrainToolState & string;

/** The vessel: its shape and the dimensions that shape needs. */
function VesselFields({ s, update, system }: Props): ReactElement {
  const len = (label: string, key: Key, hint?: string): ReactElement => (
    <NumberField
      key={key}
      name={key}
      label={label}
      kind="length"
      hint={hint}
      system={system}
      value={s[key] as number}
      onChange={(v) => update({ [key]: v } as Partial<DrainToolState>)}
    />
  );
  const dims: Record<VesselShape, ReactElement[]> = {
    box: [
      len('Length', 'v_length_m'),
      len('Width', 'v_width_m'),
      len('Depth to the brim', 'v_depth_m'),
    ],
    vertical_cylinder: [len('Diameter', 'v_diameter_m'), len('Depth to the brim', 'v_depth_m')],
    horizontal_cylinder: [len('Diameter', 'v_diameter_m'), len('Length', 'v_length_m')],
    sphere: [len('Diameter', 'v_diameter_m')],
    cone_bottom: [
      len('Diameter', 'v_diameter_m'),
      len('Cone height', 'v_cone_height_m', 'Apex down'),
      len('Total depth', 'v_depth_m', 'Apex to brim'),
    ],
    sloped_pond: [
      len('Bottom length', 'v_bottom_length_m'),
      len('Bottom width', 'v_bottom_width_m'),
      <NumberField
        key="v_slope"
        name="v_slope"
        label="Side slope"
        unit="across per 1 up"
        system={system}
        value={s.v_slope}
        onChange={(v) => update({ v_slope: v })}
      />,
      len('Depth to the brim', 'v_depth_m'),
    ],
    stage_table: [],
  };
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <div className="sm:col-span-2">
        <SelectField
          name="shape"
          label="Shape"
          value={s.shape}
          choices={SHAPES}
          onChange={(v) => update({ shape: v as VesselShape })}
        />
      </div>
      {dims[s.shape]}
      {s.shape === 'stage_table' && (
        <div className="sm:col-span-2">
          <Suspense fallback={<p className="text-ink-faint">Loading the table editor…</p>}>
            <StageTableEditor
              rows={s.stage}
              onChange={(rows) => update({ stage: rows })}
              system={system}
            />
          </Suspense>
        </div>
      )}
      <NumberField
        name="initial_depth_m"
        label="Water depth now"
        kind="length"
        system={system}
        value={s.initial_depth_m}
        onChange={(v) => update({ initial_depth_m: v })}
      />
      <NumberField
        name="final_depth_m"
        label="Drain down to depth"
        kind="length"
        system={system}
        value={s.final_depth_m}
        onChange={(v) => update({ final_depth_m: v })}
        hint="0 to empty it"
      />
      <NumberField
        name="bottom_m"
        label="Bottom elevation"
        kind="elevation"
        system={system}
        value={s.bottom_m}
        onChange={(v) => update({ bottom_m: v })}
        hint="Above your datum"
      />
    </div>
  );
}

// Memoised: while the units switch part by part (use-staged-units.ts), the other parts skip
// rendering, and React rewrites no input's attributes there.
export default memo(VesselFields);
