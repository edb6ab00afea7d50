import type { ReactElement } from 'react';
import type { QuickState } from '../lib/calculators/quick-check';
import type { QuickAnswer, QuickError } from '../lib/calculators/quick-result';
import { quickFlag } from '../lib/flags/quick-flag';
import type { UnitSystem } from '../lib/hydraulics/units';
import SaveToJob from './SaveToJob';

/** SaveToJob for the quick check: the same engine request the answer on screen came from. */
export default function QuickSaveToJob(p: {
  state: QuickState;
  answer: QuickAnswer | QuickError;
  system: UnitSystem;
  query: string;
}): ReactElement | null {
  const calc = quickFlag(p.state, p.answer);
  if (!calc) return null;
  return <SaveToJob tool={calc.tool} inputs={calc.inputs} unitSystem={p.system} openPath={p.query ? `/check?${p.query}` : '/check'} />;
}
