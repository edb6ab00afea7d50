import { useEffect, useState } from 'react';
import type { ReactElement } from 'react';
import { requestDrainHints } from '../lib/calculators/drain-hints-client';
import type { DrainHintsJob } from '../lib/calculators/drain-hints';
import type { Hint } from '../lib/calculators/hints';
import type { UnitSystem } from '../lib/hydraulics';
import { HintList } from './ToolLayout';

/** One solved drain-down: what the hints' inverse solvers start from. */
export type SolvedDrain = Omit<DrainHintsJob, 'system'>;

/** The latest hints and the inputs they answer. */
interface Answer {
  hints: Hint[];
  for?: SolvedDrain;
  system?: UnitSystem;
}

/**
 * "What would help" for the drain-down. The inverse solvers cost several solves, so they run in
 * a web worker (drain-hints-client.ts) after the result is shown; until the first reply there
 * are none (nor in the static HTML). When the inputs change, the last hints stay, marked as
 * updating, until the new ones arrive: no flicker, and no old advice passed off as current.
 */
export default function DrainHints({
  solved,
  system,
}: {
  solved: SolvedDrain;
  system: UnitSystem;
}): ReactElement | null {
  const [answer, setAnswer] = useState<Answer>({ hints: [] });
  useEffect(
    () =>
      requestDrainHints({ ...solved, system }, (hints) =>
        setAnswer({ hints, for: solved, system }),
      ),
    [solved, system],
  );
  const current = answer.for === solved && answer.system === system;
  return <HintList hints={answer.hints} busy={!current} />;
}
