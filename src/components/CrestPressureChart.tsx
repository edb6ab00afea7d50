import type { ReactElement } from 'react';
import { Line } from 'react-chartjs-2';
import { EDGE, FAILS, TEAL } from '../lib/chart-kit';
import type { ProfilePoint } from '../lib/calculators/siphon-profile';
import type { UnitSystem } from '../lib/hydraulics';
import { toDisplay, unitLabel } from '../lib/hydraulics';

interface Props {
  points: ProfilePoint[];
  vaporPa: number;
  limitPa: number;
  system: UnitSystem;
}

/** Absolute pressure along the siphon against vapour pressure and the working limit (lazy). */
export default function CrestPressureChart({ points, vaporPa, limitPa, system }: Props): ReactElement {
  const x = (m: number): number => toDisplay('length', m, system);
  const p = (pa: number): number => toDisplay('pressure', pa, system);
  const ends = [points[0]!.s_m, points[points.length - 1]!.s_m];
  return (
    <Line
      aria-label="Pressure along the siphon against vapour pressure and the working limit; the same figures are in the table below"
      role="img"
      options={{
        maintainAspectRatio: false,
        parsing: false,
        scales: {
          x: { type: 'linear', title: { display: true, text: `Along the line from the intake (${unitLabel('length', system)})` } },
          y: { type: 'linear', min: 0, title: { display: true, text: `Pressure (${unitLabel('pressure', system)})` } },
        },
      }}
      data={{
        datasets: [
          { label: 'Pressure in the line', borderColor: TEAL, pointRadius: 0, data: points.map((q) => ({ x: x(q.s_m), y: p(q.p_pa) })) },
          { label: 'Working limit', borderColor: EDGE, borderDash: [8, 4], pointRadius: 0, data: ends.map((s) => ({ x: x(s), y: p(limitPa) })) },
          { label: 'Vapour pressure', borderColor: FAILS, borderDash: [2, 3], pointRadius: 0, data: ends.map((s) => ({ x: x(s), y: p(vaporPa) })) },
        ],
      }}
    />
  );
}
