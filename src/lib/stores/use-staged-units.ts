/**
 * The unit system, switched one part of a tool at a time. A switch rewrites every number, unit
 * and hose name of a full tool; committed at once that is one long task on a phone, and it comes
 * on every first visit from a US browser, where hydration (metric, as prerendered) is followed by
 * the switch to US units. Lighthouse's trace of /siphon put that one commit at 74 ms of the host's
 * own time (about 300 ms on its simulated phone). Staged, part k takes the new system only after
 * part k − 1 has been committed, each in a task of its own, as a low-priority update.
 */
import { startTransition, useEffect, useState } from 'react';
import type { UnitSystem } from '../hydraulics/units';
import type { ShareRow, ShareState } from '../share-url';
import type { CalcState } from './use-calc-state';
import { useCalcState, useUnitSystem } from './use-calc-state';

interface Staging {
  from: UnitSystem;
  to: UnitSystem;
  /** Parts 0 … reached − 1 show `to`, the rest `from`. */
  reached: number;
}

export interface StagedUnits {
  /** The crew's unit system (what a saved job records). */
  system: UnitSystem;
  /** The system part `stage` shows now. */
  at: (stage: number) => UnitSystem;
  /** True when every part shows `system`. */
  settled: boolean;
}

/** The unit system for a tool of `stages` parts, switched part by part. */
export function useStagedUnits(stages: number): StagedUnits {
  const system = useUnitSystem();
  const [staging, setStaging] = useState<Staging>({ from: system, to: system, reached: stages });
  useEffect(() => {
    const { from, to, reached } = staging;
    if (system !== to) {
      // A switch while one is still under way (a quick double toggle) finishes at once.
      const next =
        reached < stages
          ? { from: system, to: system, reached: stages }
          : { from: to, to: system, reached: 1 };
      startTransition(() => setStaging(next));
      return;
    }
    if (reached >= stages) return;
    const timer = setTimeout(
      () => startTransition(() => setStaging({ from, to, reached: reached + 1 })),
      0,
    );
    return () => clearTimeout(timer);
  }, [system, staging, stages]);
  return {
    system,
    at: (stage) => (stage < staging.reached ? staging.to : staging.from),
    settled: staging.to === system && staging.reached >= stages,
  };
}

/** A full tool's parts, switched in this order: its inputs in three, the figures, the drawings. */
const TOOL_PARTS = 5;

export interface StagedTool<T extends ShareState> extends CalcState<T> {
  units: StagedUnits;
  /** The system the result figures show now (part 3). */
  figuresIn: UnitSystem;
  /** The system the drawings, charts and tables show now (part 4). */
  drawingsIn: UnitSystem;
}

/** A full tool's state (use-calc-state.ts), marked ready once its unit switch has settled. */
export function useStagedTool<T extends ShareState>(
  defaults: T,
  rowTemplates: Record<string, ShareRow> = {},
  usStart: Partial<T> = {},
): StagedTool<T> {
  const units = useStagedUnits(TOOL_PARTS);
  const calc = useCalcState(defaults, rowTemplates, units.settled, usStart);
  return { ...calc, units, figuresIn: units.at(3), drawingsIn: units.at(4) };
}
