import { memo } from 'react';
import type { ReactElement } from 'react';
import type { LineToolState } from '../lib/calculators/line-tool';
import type { UnitSystem } from '../lib/hydraulics';
import NumberField from './NumberField';

interface Props {
  s: LineToolState;
  update: (p: Partial<LineToolState>) => void;
  system: UnitSystem;
}

/** Source surface, outlet and (optionally) a tailwater, as elevations above the crew's datum. */
function LevelFields({ s, update, system }: Props): ReactElement {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <NumberField
        name="source_level_m"
        label="Source water surface"
        kind="elevation"
        system={system}
        value={s.source_level_m}
        onChange={(v) => update({ source_level_m: v })}
        hint="Above your datum (any level you pick)"
      />
      <NumberField
        name="outlet_m"
        label="Outlet elevation"
        kind="elevation"
        system={system}
        value={s.outlet_m}
        onChange={(v) => update({ outlet_m: v })}
        hint="Negative when below the datum"
      />
      <label className="flex min-h-12 items-center gap-3 font-semibold sm:col-span-2">
        <input
          type="checkbox"
          className="h-6 w-6 accent-teal"
          checked={s.has_tail}
          onChange={(e) => update({ has_tail: e.target.checked })}
        />
        The outlet is under water (a tailwater)
      </label>
      {s.has_tail && (
        <NumberField
          name="tailwater_m"
          label="Tailwater surface"
          kind="elevation"
          system={system}
          value={s.tailwater_m}
          onChange={(v) => update({ tailwater_m: v })}
        />
      )}
    </div>
  );
}

// Memoised: while the units switch part by part (use-staged-units.ts), the other parts skip
// rendering, and React rewrites no input's attributes there.
export default memo(LevelFields);
