import { describe, expect, test } from 'vitest';
import { readNumberText, separatorsFor, writeNumberText } from '../../../src/lib/number-text';

const value = (text: string, locale: string): number | string => {
  const r = readNumberText(text, locale);
  return r.ok ? r.value : r.problem;
};

describe('separatorsFor', () => {
  // Source: CLDR number symbols as the runtime's Intl reports them.
  test('does take the decimal and group marks from the locale data', () => {
    expect(separatorsFor('en-US')).toEqual({ decimal: '.', group: ',' });
    expect(separatorsFor('en-GB')).toEqual({ decimal: '.', group: ',' });
    expect(separatorsFor('de-DE')).toEqual({ decimal: ',', group: '.' });
    expect(separatorsFor('fr-FR').decimal).toBe(',');
    expect(separatorsFor('fr-FR').group).toMatch(/^[\u00a0\u202f ]$/);
  });

  test('does fall back to en-US marks for a tag Intl refuses', () => {
    expect(separatorsFor('not a tag!')).toEqual({ decimal: '.', group: ',' });
  });
});

describe('readNumberText', () => {
  // Source for every expectation below: the locale's marks from CLDR (via Intl); a comma groups
  // thousands in English and marks decimals in German and French.
  test('does read a comma as a thousands separator in en-US and en-GB', () => {
    expect(value('1,500', 'en-US')).toBe(1500);
    expect(value('1,500', 'en-GB')).toBe(1500);
    expect(value('2,000,000', 'en-US')).toBe(2_000_000);
    expect(value('1,500.25', 'en-GB')).toBe(1500.25);
  });

  test('does refuse a comma where English puts a decimal point, saying to use a point', () => {
    expect(value('1,5', 'en-US')).toMatch(/^Use a point for decimals/);
    expect(value('1,5', 'en-GB')).toMatch(/^Use a point for decimals/);
    expect(value('0,75', 'en-US')).toMatch(/^Use a point for decimals/);
  });

  test('does refuse group separators out of place', () => {
    expect(value('1,50.5', 'en-US')).toMatch(/^Group thousands in threes/);
    expect(value('12,34,567', 'en-US')).toMatch(/^Group thousands in threes/);
    expect(value('1.500,5', 'en-US')).not.toEqual(expect.any(Number));
    expect(value('1.2.3', 'en-US')).toMatch(/^Type one number/);
  });

  test('does read a decimal comma in de-DE and fr-FR', () => {
    expect(value('1,5', 'de-DE')).toBe(1.5);
    expect(value('1,500', 'de-DE')).toBe(1.5);
    expect(value('1.500,5', 'de-DE')).toBe(1500.5);
    expect(value('1.234.567', 'de-DE')).toBe(1_234_567);
    expect(value('1,5', 'fr-FR')).toBe(1.5);
    expect(value('1\u202f500,5', 'fr-FR')).toBe(1500.5);
    expect(value('1 500,5', 'fr-FR')).toBe(1500.5);
  });

  test('does keep a point as a decimal point in every locale', () => {
    for (const locale of ['en-US', 'en-GB', 'de-DE', 'fr-FR']) {
      expect(value('2.5', locale)).toBe(2.5);
      expect(value('.5', locale)).toBe(0.5);
    }
  });

  test('does refuse an entry that reads two ways rather than guess', () => {
    // de-DE groups thousands with a point, and a point is also taken as a decimal point
    expect(value('1.500', 'de-DE')).toMatch(/^Could be 1,5 or 1500/);
    expect(value('1.500', 'en-US')).toBe(1.5);
  });

  test('does read spaces between groups of three in any locale', () => {
    expect(value('1 500', 'en-US')).toBe(1500);
    expect(value('12\u202f500', 'en-GB')).toBe(12500);
  });

  test('does read signs and exponent notation, and refuses words', () => {
    expect(value('-3', 'en-US')).toBe(-3);
    expect(value('\u22123', 'en-US')).toBe(-3);
    expect(value('1e9', 'en-US')).toBe(1e9);
    expect(value('2.5E-3', 'en-GB')).toBe(0.0025);
    expect(value('abc', 'en-US')).toBe('Type a number, like 2.5');
    expect(value('100 ft', 'en-US')).toBe('Type a number, like 2.5');
    expect(value('x', 'de-DE')).toBe('Type a number, like 2,5');
    expect(readNumberText('  ', 'en-US')).toMatchObject({ ok: false, empty: true });
  });
});

describe('writeNumberText', () => {
  test('does write what it reads back, in each locale', () => {
    for (const locale of ['en-US', 'en-GB', 'de-DE', 'fr-FR'])
      for (const v of [1.234, 1500, 0.0005, 49.2126, 1e-7, 328084])
        expect(readNumberText(writeNumberText(v, locale), locale)).toEqual({ ok: true, value: v });
  });

  test('does use the locale decimal mark and no grouping', () => {
    expect(writeNumberText(1500.5, 'en-US')).toBe('1500.5');
    expect(writeNumberText(1500.5, 'de-DE')).toBe('1500,5');
  });
});
