import { describe, expect, test } from 'vitest';
import { inputText } from '../../../src/components/NumberField';
import { DRAIN_TOOL_US_START } from '../../../src/lib/calculators/drain-tool';
import { LINE_TOOL_US_START, SIPHON_TOOL_US_START } from '../../../src/lib/calculators/line-tool';
import { QUICK_US_START } from '../../../src/lib/calculators/quick-check';
import type { QuantityKind } from '../../../src/lib/hydraulics/units';

// Exact factors from NIST SP 811 (2008), Appendix B: 1 ft = 0.3048 m, 1 in = 0.0254 m,
// 1 US gal = 3.785411784 L, °C = (°F − 32)/1.8, 1 psi = 6894.757 Pa (to 7 figures).
describe('US starting values', () => {
  test('does store each one as the SI value of its round US figure (NIST SP 811)', () => {
    expect(QUICK_US_START.length_m).toBeCloseTo(50 * 0.3048, 12);
    expect(QUICK_US_START.hole_diameter_m).toBeCloseTo(0.0254, 12);
    expect(QUICK_US_START.volume_m3).toBeCloseTo(1500 * 3.785411784e-3, 12);
    expect(SIPHON_TOOL_US_START.outlet_m).toBeCloseTo(-8 * 0.3048, 12);
    expect(SIPHON_TOOL_US_START.temp_c).toBeCloseTo((60 - 32) / 1.8, 12);
    expect(SIPHON_TOOL_US_START.min_crest_pa).toBeCloseTo(3.5 * 6894.757, 2);
    expect(DRAIN_TOOL_US_START.stage?.[2]?.area_m2).toBeCloseTo(450 * 0.3048 ** 2, 10);
    expect(LINE_TOOL_US_START.source_level_m).toBeCloseTo(3.048, 12);
  });

  // The field shows a value as up to 6 significant figures in the crew's units; a start that
  // does not read back as a short round figure would show as 49.2126 ft.
  const kinds: Record<string, QuantityKind> = {
    volume_m3: 'volume',
    hole_diameter_m: 'diameter',
    diameter_m: 'diameter',
    temp_c: 'temperature',
    pressure_pa: 'pressure',
    min_crest_pa: 'pressure',
  };
  const starts = { QUICK_US_START, LINE_TOOL_US_START, SIPHON_TOOL_US_START, DRAIN_TOOL_US_START };
  for (const [name, start] of Object.entries(starts)) {
    test(`does show every number of ${name} in US fields as typed, at most one decimal`, () => {
      for (const [key, value] of Object.entries(start)) {
        if (typeof value !== 'number') continue;
        const text = inputText(value, 'us', kinds[key] ?? 'length');
        expect(text, key).toMatch(/^-?\d+(\.\d)?$/);
      }
    });
  }
});
