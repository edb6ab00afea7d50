/**
 * The quick check's crest margin. Its hose is laid evenly (quickLengthToCrest), so raising the
 * crest also lengthens the hose up to it and adds friction before the crest: the fixed-geometry
 * margin of limits.ts would overstate the room, on the unsafe side. Here the crest height that
 * meets the working limit is found by bisection on the engine itself.
 */
import { solveSiphon } from '../hydraulics';
import { crestMarginM } from './limits';
import type { QuickState } from './quick-check';
import { quickSiphonRequest } from './quick-check';

/** Bisection steps: the bracket is under 12 m wide, so 30 halvings leave well under 0.1 mm. */
const STEPS = 30;

/**
 * Room at the crest, m: how much higher (positive) or lower (negative) the crest may sit before
 * its pressure reaches the working limit, with the hose re-laid for each height.
 * @param densityKgM3 density of the water, kg/m³, for the fixed-geometry first guess.
 */
export function quickCrestMarginM(
  s: QuickState,
  innerDiameterM: number,
  material: string,
  densityKgM3: number,
): number {
  const room = (crest: number): number => {
    const r = solveSiphon(quickSiphonRequest({ ...s, crest_m: crest }, innerDiameterM, material));
    return r.crest_pressure_abs_pa - r.crest_limit_pa;
  };
  const here = solveSiphon(quickSiphonRequest(s, innerDiameterM, material));
  const guess = s.crest_m + crestMarginM(here, densityKgM3);
  // With more friction the fixed-geometry guess lies beyond the true height: it brackets it.
  let [ok, bad] = guess >= s.crest_m ? [s.crest_m, guess] : [Math.max(guess, 0), s.crest_m];
  if (room(ok) < 0) return -s.crest_m; // past the limit even with the crest at the water line
  for (let i = 0; i < STEPS; i++) {
    const mid = (ok + bad) / 2;
    if (room(mid) >= 0) ok = mid;
    else bad = mid;
  }
  return ok - s.crest_m;
}
