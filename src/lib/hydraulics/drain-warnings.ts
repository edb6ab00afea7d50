/**
 * Plain-word warnings for a drain-down: why it stopped, outlets that stop along the way, a very
 * long job, and the flow warnings of each line or siphon at the start and at its lowest level.
 */
import type { DrainStop } from './drain';
import type { OutletModel } from './drain-outlets';
import type { Warning } from './types';
import { flowWarnings, makeWarning } from './warnings';
import type { WarningCode } from './warnings';

/**
 * Drain time beyond which the job is flagged as very long, s: 24 h, one working day and night
 * (our own planning threshold).
 */
export const LONG_DRAIN_TIME_S = 24 * 3600;

const STOP_CODES: Record<string, WarningCode> = {
  intake_uncovered: 'intake_uncovered',
  no_head: 'no_head',
  siphon_breaks: 'siphon_breaks_during_drain',
};

function stopWarning(o: OutletModel, last: boolean, atStart = false): Warning {
  const where = atStart ? ' It is already there at the starting level.' : '';
  const detail = last
    ? `(${o.path})${where}`
    : `(${o.path}; the other outlets keep draining.)${where}`;
  return makeWarning(STOP_CODES[o.reason], detail);
}

/** Flow warnings of line and siphon outlets at the start and at the lowest level they work. */
function lineWarnings(outlets: OutletModel[], stop: DrainStop, h0: number): Warning[] {
  const out: Warning[] = [];
  for (const o of outlets) {
    if (!o.state || o.cutoff >= h0) continue;
    for (const h of [h0, Math.max(o.cutoff, stop.depth)]) {
      const s = o.state(h);
      out.push(...flowWarnings(s.regime, s.reynolds, o.line?.relativeRoughness ?? 0, s.velocityMS));
    }
  }
  return out;
}

/** All warnings of a drain-down, one per code (first detail kept). */
export function drainWarnings(
  outlets: OutletModel[],
  stop: DrainStop,
  h0: number,
  timeS: number,
): Warning[] {
  const list: Warning[] = [];
  for (const o of outlets) {
    const stopsHere = o.cutoff === stop.depth || (stop.asymptotic && o.cutoff < stop.depth);
    const stopsOnTheWay = o.cutoff > stop.depth && o.cutoff < h0;
    if (o.cutoff >= h0) list.push(stopWarning(o, stop.noFlow, true));
    else if (stopsOnTheWay) list.push(stopWarning(o, false));
    else if (stopsHere && stop.reason !== 'final_depth') list.push(stopWarning(o, true));
  }
  if (outlets.some((o) => o.nearLimitAtStart && o.cutoff < h0)) {
    list.push(makeWarning('siphon_near_limit'));
  }
  if (stop.asymptotic) list.push(makeWarning('asymptotic_stop'));
  if (timeS > LONG_DRAIN_TIME_S) list.push(makeWarning('long_drain_time'));
  list.push(...lineWarnings(outlets, stop, h0));
  const seen = new Set<string>();
  return list.filter((w) => !seen.has(w.code) && seen.add(w.code) !== undefined);
}
