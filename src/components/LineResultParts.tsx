import { lazy } from 'react';
import type { ReactElement } from 'react';
import { flowFactsText } from '../lib/calculators/result-figures';
import type { LineResult, SiphonResult, UnitSystem } from '../lib/hydraulics';
import ChartPanel from './ChartPanel';
import LossTable from './LossTable';

const LossChart = lazy(() => import('./LossChart'));

export { lineFigures } from '../lib/calculators/result-figures';

/** Reynolds number, friction factor and regime, in words a crew can check. */
export function FlowFacts({ r }: { r: LineResult | SiphonResult }): ReactElement {
  return (
    <p className="text-ink-soft" data-testid="flow-facts">
      {flowFactsText(r)}
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
