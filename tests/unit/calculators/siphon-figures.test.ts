import { describe, expect, test } from 'vitest';
import { QUICK_DEFAULTS } from '../../../src/lib/calculators/quick-check';
import { figureValue, quickAnswer } from '../../../src/lib/calculators/quick-result';
import type { QuickAnswer } from '../../../src/lib/calculators/quick-result';

// Closed form: the standard atmosphere at sea level (101 325 Pa, US Standard Atmosphere 1976)
// holds up a column of 15 °C water (999.1 kg/m³, from memory) of 101325 / (999.1 × 9.80665)
// ≈ 10.34 m. A crest 12.2 m (40 ft) above the water therefore cannot run full anywhere.
const answer = (crest_m: number): QuickAnswer => {
  const a = quickAnswer({ ...QUICK_DEFAULTS, mode: 'siphon', crest_m });
  if ('error' in a) throw new Error(a.error);
  return a;
};

describe('siphon figures past the atmosphere’s reach', () => {
  test('does lead with the crest in words, never an absolute pressure below zero', () => {
    const a = answer(12.2);
    expect(a.verdict.word).toBe('Won’t hold');
    expect(a.figures[0].id).toBe('crest-pressure');
    expect(figureValue(a.figures[0], 'us')).toBe('below vapour pressure');
    for (const f of a.figures) expect(figureValue(f, 'metric')).not.toMatch(/^−|^-/);
  });

  test('does name the flow as the one it would give if it ran full', () => {
    const flow = answer(12.2).figures.find((f) => f.id === 'flow')!;
    expect(flow.label).toBe('Flow if it ran full');
    expect(answer(1.5).figures.find((f) => f.id === 'flow')!.label).toBe('Flow');
  });

  test('does show the number while the crest is within reach', () => {
    const crest = answer(1.5).figures.find((f) => f.id === 'crest-pressure')!;
    expect(crest.text).toBeUndefined();
    expect(figureValue(crest, 'metric')).toMatch(/kPa abs$/);
  });
});
