import { describe, expect, test } from 'vitest';
import type { SiphonResult } from '../../../src/lib/hydraulics';
import { QUICK_DEFAULTS } from '../../../src/lib/calculators/quick-check';
import { quickAnswer } from '../../../src/lib/calculators/quick-result';
import type { QuickAnswer } from '../../../src/lib/calculators/quick-result';

// The promise the quick check prints ("the crest could rise X more before the working limit")
// must hold when a crew does exactly that with the same hose: raise the crest by the margin and
// the crest pressure meets the limit; any higher and it is below it.
function answerAt(crest_m: number): QuickAnswer {
  const a = quickAnswer({ ...QUICK_DEFAULTS, mode: 'siphon', crest_m });
  if ('error' in a || a.crestMarginM === undefined) throw new Error('no margin');
  return a;
}
const marginAt = (crest_m: number): number => answerAt(crest_m).crestMarginM!;
function roomPa(crest_m: number): number {
  const r = answerAt(crest_m).raw as SiphonResult;
  return r.crest_pressure_abs_pa - r.crest_limit_pa;
}

describe('quick check crest margin', () => {
  for (const crest of [1.5, 5, 7]) {
    test(`does put the crest at the working limit when raised by the margin, from ${crest} m`, () => {
      const m = marginAt(crest);
      expect(Math.abs(roomPa(crest + m))).toBeLessThan(5); // Pa, about 0.5 mm of water
      expect(roomPa(crest + m + 0.01)).toBeLessThan(0);
    });
  }

  test('does say how far to lower a crest already past the limit', () => {
    const m = marginAt(8.5);
    expect(m).toBeLessThan(0);
    expect(Math.abs(roomPa(8.5 + m))).toBeLessThan(5);
  });

  test('does stay below the fixed-geometry margin, which ignores the longer climb', () => {
    const r = answerAt(5).raw as SiphonResult;
    // (p_crest − p_limit)/(ρg) with 15 °C water, 999.1 kg/m³ (from memory), g = 9.80665 m/s².
    const fixed = (r.crest_pressure_abs_pa - r.crest_limit_pa) / (999.1 * 9.80665);
    expect(marginAt(5)).toBeLessThan(fixed);
  });
});
