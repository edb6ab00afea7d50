import type { ReactElement } from 'react';
import type { QuickState } from '../lib/calculators/quick-check';
import type { QuickAnswer, QuickError } from '../lib/calculators/quick-result';
import { quickFlag } from '../lib/flags/quick-flag';
import type { UnitSystem } from '../lib/hydraulics/units';
import FlagResult from './FlagResult';

/** FlagResult for the quick check: freezes the engine request behind the answer on screen. */
export default function QuickFlagResult(p: {
  state: QuickState;
  answer: QuickAnswer | QuickError;
  system: UnitSystem;
}): ReactElement | null {
  const flag = quickFlag(p.state, p.answer);
  return flag ? <FlagResult {...flag} unitSystem={p.system} /> : null;
}
