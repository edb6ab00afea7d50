/**
 * What limits a result: the biggest share of the head loss, and a siphon's room at the crest.
 */
import type { LossBreakdown, SiphonResult } from '../hydraulics';
import { G, workingCrestPressure } from '../hydraulics';

export type LossPart = keyof LossBreakdown;

export const LOSS_NAMES: Record<LossPart, string> = {
  entrance: 'Entrance',
  fittings: 'Fittings',
  friction: 'Hose friction',
  exit: 'Exit (velocity left in the jet)',
};

export interface BiggestLoss {
  part: LossPart;
  name: string;
  /** Head lost in that part, m. */
  head_m: number;
  /** Its share of all losses, 0–1. */
  share: number;
}

/** The largest part of the loss breakdown, or null when nothing flows. */
export function biggestLoss(losses: LossBreakdown): BiggestLoss | null {
  const parts = Object.entries(losses) as [LossPart, number][];
  const total = parts.reduce((s, [, v]) => s + v, 0);
  if (!(total > 0)) return null;
  const [part, head] = parts.reduce((a, b) => (b[1] > a[1] ? b : a));
  return { part, name: LOSS_NAMES[part], head_m: head, share: head / total };
}

/**
 * Room at the crest, as water height: how much higher the crest could go before its pressure
 * reaches the working limit (never below the vapour pressure), (p_crest − p_limit)/(ρg), m.
 * Negative when already past it.
 * @param densityKgM3 density of the liquid, kg/m³.
 */
export function crestMarginM(r: SiphonResult, densityKgM3: number): number {
  const floor = workingCrestPressure(r.crest_limit_pa, r.vapor_pressure_pa);
  return (r.crest_pressure_abs_pa - floor) / (densityKgM3 * G);
}
