import { describe, expect, test } from 'vitest';
import {
  LINE_LENGTH_RANGE,
  WATER_TEMPERATURE_RANGE,
  engineWaterTemperatureC,
  readField,
} from '../../../src/lib/calculators/field-input';
import { fluidInput, LINE_FIELD_DEFAULTS } from '../../../src/lib/calculators/tool-state';
import { resolveFluid } from '../../../src/lib/hydraulics';

const temp = {
  locale: 'en-US',
  system: 'us' as const,
  kind: 'temperature' as const,
  range: WATER_TEMPERATURE_RANGE,
};
const length = {
  locale: 'en-US',
  system: 'us' as const,
  kind: 'length' as const,
  range: LINE_LENGTH_RANGE,
};

describe('readField', () => {
  // Source: NIST SP 811 — the Fahrenheit scale puts 32 °F at 0 °C; °C = (°F − 32)/1.8.
  test('does accept 32 °F, the bottom of the hint "32 to 210 °F", as 0 °C', () => {
    expect(readField('32', temp)).toEqual({ ok: true, si: 0 });
    expect(readField('0', { ...temp, system: 'metric' })).toEqual({ ok: true, si: 0 });
  });

  test('does accept 210 °F at the top and refuse 31 °F and 211 °F in °F', () => {
    expect(readField('210', temp)).toMatchObject({ ok: true });
    expect(readField('31', temp)).toEqual({
      ok: false,
      empty: false,
      problem: 'Out of range: use 32 to 210.2 °F',
    });
    expect(readField('211', temp)).toMatchObject({
      ok: false,
      problem: 'Out of range: use 32 to 210.2 °F',
    });
  });

  // Source: NIST SP 811, 1 ft = 0.3048 m exactly, so 100 000 m = 328 083.99 ft.
  test('does call 1e9 ft out of range, with the range in feet, instead of "not a number"', () => {
    expect(readField('1e9', length)).toEqual({
      ok: false,
      empty: false,
      problem: 'Out of range: use 0 to 328084 ft',
    });
    expect(readField('1e9', { ...length, system: 'metric' })).toMatchObject({
      problem: 'Out of range: use 0 to 100000 m',
    });
    expect(readField('1e3', length)).toEqual({ ok: true, si: 304.8 });
  });

  test('does pass a number on a box without a range, and the parser’s problem otherwise', () => {
    expect(readField('1,500', { locale: 'en-US', system: 'us', kind: 'volume' })).toMatchObject({
      ok: true,
    });
    expect(readField('1,5', { locale: 'en-US', system: 'us', kind: 'volume' })).toMatchObject({
      ok: false,
      problem: expect.stringMatching(/^Use a point for decimals/),
    });
  });
});

describe('engineWaterTemperatureC', () => {
  // Source: IAPWS — the triple point of water is 0.01 °C, where the engine's equations start.
  test('does send ice water at 0 °C as the triple point, and leave other values alone', () => {
    expect(engineWaterTemperatureC(0)).toBe(0.01);
    expect(engineWaterTemperatureC(15)).toBe(15);
    expect(engineWaterTemperatureC(-1)).toBe(-1);
  });

  test('does let the engine accept 32 °F typed in a tool', () => {
    const fluid = fluidInput({ ...LINE_FIELD_DEFAULTS, temp_c: 0 });
    expect(() => resolveFluid(fluid)).not.toThrow();
  });
});
