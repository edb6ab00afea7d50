import { lazy } from 'react';
import type { ReactElement } from 'react';
import type { Figure } from '../lib/calculators/quick-result';
import type { LineResult, SiphonResult, UnitSystem } from '../lib/hydraulics';
import ChartPanel from './ChartPanel';
import LossTable from './LossTable';

const LossChart = lazy(() => import('./LossChart'));

/** The figures every full-pipe result shows. */
export function lineFigures(r: LineResult | SiphonResult): Figure[] {
  return [
    { id: 'flow', label: 'Flow', kind: 'flow', si: r.flow_m3_s },
    { id: 'head', label: 'Head', kind: 'length', si: r.head_m },
    { id: 'velocity', label: 'Speed in the line', kind: 'velocity', si: r.velocity_m_s },
  ];
}

/**
 * 1234567 → "1,234,567". Not toLocaleString: its first call loads the browser's number-format
 * data, a long main-thread task on a slow phone just as the page becomes interactive.
 */
function groupThousands(n: number): string {
  return String(n).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

/** Reynolds number, friction factor and regime, in words a crew can check. */
export function FlowFacts({ r }: { r: LineResult | SiphonResult }): ReactElement {
  return (
    <p className="text-ink-soft" data-testid="flow-facts">
      Reynolds number {groupThousands(Math.round(r.reynolds))} ({r.regime}), friction factor{' '}
      {r.friction_factor > 0 ? r.friction_factor.toFixed(4) : '—'}.
    </p>
  );
}

/** Loss breakdown: a table, and a chart on demand. */
export function LossPanel({ r, system }: { r: LineResult | SiphonResult; system: UnitSystem }): ReactElement {
  return (
    <ChartPanel
      title="Loss breakdown"
      table={<LossTable losses={r.losses_m} system={system} />}
      chart={() => <LossChart losses={r.losses_m} system={system} />}
    />
  );
}
