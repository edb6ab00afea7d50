import type { ReactElement } from 'react';
import { Bar } from 'react-chartjs-2';
import { TEAL } from '../lib/chart-kit';
import type { LossPart } from '../lib/calculators/limits';
import { LOSS_NAMES } from '../lib/calculators/limits';
import type { LossBreakdown, UnitSystem } from '../lib/hydraulics';
import { toDisplay, unitLabel } from '../lib/hydraulics';

/** Bar chart of the head lost in each part (loaded lazily). */
export default function LossChart({ losses, system }: { losses: LossBreakdown; system: UnitSystem }): ReactElement {
  const parts = Object.keys(LOSS_NAMES) as LossPart[];
  return (
    <Bar
      aria-label="Loss breakdown chart; the same figures are in the table below"
      role="img"
      options={{
        indexAxis: 'y',
        maintainAspectRatio: false,
        plugins: { legend: { display: false } },
        scales: { x: { title: { display: true, text: `Head lost (${unitLabel('length', system)})` } } },
      }}
      data={{
        labels: parts.map((k) => LOSS_NAMES[k]),
        datasets: [{ data: parts.map((k) => toDisplay('length', losses[k], system)), backgroundColor: TEAL }],
      }}
    />
  );
}
