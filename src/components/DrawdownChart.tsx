import type { ReactElement } from 'react';
import { Line } from 'react-chartjs-2';
import { INK, TEAL } from '../lib/chart-kit';
import type { DrainCurvePoint, UnitSystem } from '../lib/hydraulics';
import { toDisplay, unitLabel } from '../lib/hydraulics';

/** Water depth and flow against time (loaded lazily). */
export default function DrawdownChart({ curve, system }: { curve: DrainCurvePoint[]; system: UnitSystem }): ReactElement {
  const hours = (s: number): number => s / 3600;
  return (
    <Line
      aria-label="Drawdown chart: depth and flow against time; the same figures are in the table below"
      role="img"
      options={{
        maintainAspectRatio: false,
        parsing: false,
        scales: {
          x: { type: 'linear', title: { display: true, text: 'Time (h)' } },
          depth: { type: 'linear', position: 'left', title: { display: true, text: `Depth (${unitLabel('length', system)})` } },
          flow: { type: 'linear', position: 'right', grid: { drawOnChartArea: false }, title: { display: true, text: `Flow (${unitLabel('flow', system)})` } },
        },
      }}
      data={{
        datasets: [
          { label: 'Depth', yAxisID: 'depth', borderColor: TEAL, pointRadius: 0, data: curve.map((p) => ({ x: hours(p.time_s), y: toDisplay('length', p.depth_m, system) })) },
          { label: 'Flow', yAxisID: 'flow', borderColor: INK, borderDash: [6, 4], pointRadius: 0, data: curve.map((p) => ({ x: hours(p.time_s), y: toDisplay('flow', p.flow_m3_s, system) })) },
        ],
      }}
    />
  );
}
