import { useEffect, useState } from 'react';
import type { ReactElement } from 'react';
import { requestDrainHints } from '../lib/calculators/drain-hints-client';
import type { Hint } from '../lib/calculators/hints';
import type { DrainRequest, DrainResult, UnitSystem } from '../lib/hydraulics';
import { HintList } from './ToolLayout';

/** One solved drain-down: what the hints' inverse solvers start from. */
export interface SolvedDrain {
  req: DrainRequest;
  r: DrainResult;
  size: string;
  target: number;
}

/**
 * "What would help" for the drain-down. The inverse solvers cost several solves, so they run in
 * a web worker (drain-hints-client.ts) after the result is shown; until the first reply there
 * are none (nor in the static HTML), and a change of inputs keeps the last ones until the new
 * ones arrive.
 */
export default function DrainHints({
  solved,
  system,
}: {
  solved: SolvedDrain;
  system: UnitSystem;
}): ReactElement | null {
  const [hints, setHints] = useState<Hint[]>([]);
  useEffect(() => requestDrainHints({ ...solved, system }, setHints), [solved, system]);
  return <HintList hints={hints} />;
}
