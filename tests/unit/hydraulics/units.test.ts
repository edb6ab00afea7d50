import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  displayUnits,
  formatDuration,
  formatNumber,
  formatQuantity,
  fromDisplay,
  quantityKinds,
  toDisplay,
  unitLabel,
  unitSystems,
  unitsByKind,
} from '../../../src/lib/hydraulics/units';

// Expected factors: NIST SP 811 (2008) Appendix B.8/B.9, "Factors for units listed
// alphabetically / by kind of quantity". Exact ones are compared to 1e-15 relative; the ones
// NIST prints rounded to 7 significant figures are compared at the 7th figure (5e-7 relative).
const EXACT = 1e-15;
const SEVEN_FIGURES = 5e-7;

describe('fromDisplay against NIST SP 811 Appendix B', () => {
  const cases: [string, Parameters<typeof fromDisplay>[0], 'metric' | 'us', number, number][] = [
    ['foot → 3.048 E-01 m (exact)', 'length', 'us', 0.3048, EXACT],
    ['foot of elevation → 3.048 E-01 m (exact)', 'elevation', 'us', 0.3048, EXACT],
    ['inch → 2.54 E-02 m (exact)', 'diameter', 'us', 0.0254, EXACT],
    ['inch of roughness → 2.54 E-02 m (exact)', 'roughness', 'us', 0.0254, EXACT],
    ['gallon (US) → 3.785 412 E-03 m³', 'volume', 'us', 3.785412e-3, SEVEN_FIGURES],
    ['gallon (US) per minute → 6.309 020 E-05 m³/s', 'flow', 'us', 6.30902e-5, SEVEN_FIGURES],
    [
      'pound-force per square inch → 6.894 757 E+03 Pa',
      'pressure',
      'us',
      6.894757e3,
      SEVEN_FIGURES,
    ],
    ['foot per second → 3.048 E-01 m/s (exact)', 'velocity', 'us', 0.3048, EXACT],
    ['square foot → 9.290 304 E-02 m² (exact)', 'area', 'us', 9.290304e-2, EXACT],
    ['pound per cubic foot → 1.601 846 E+01 kg/m³', 'density', 'us', 1.601846e1, SEVEN_FIGURES],
    ['centipoise → 1.0 E-03 Pa·s (exact)', 'viscosity', 'us', 1e-3, EXACT],
    ['liter → 1.0 E-03 m³ (exact)', 'volume', 'metric', 1e-3, EXACT],
    ['liter per second → 1.0 E-03 m³/s (exact)', 'flow', 'metric', 1e-3, EXACT],
    ['kilopascal → 1.0 E+03 Pa (exact)', 'pressure', 'metric', 1e3, EXACT],
    ['millimetre → 1.0 E-03 m (exact)', 'diameter', 'metric', 1e-3, EXACT],
    ['hour → 3.6 E+03 s (exact)', 'time', 'us', 3600, EXACT],
  ];
  test.each(cases)('converts one display unit: %s', (_name, kind, system, si, tol) => {
    expect(Math.abs(fromDisplay(kind, 1, system) / si - 1)).toBeLessThanOrEqual(tol);
  });

  test('uses the exact definitions behind the rounded table values', () => {
    // NIST SP 811 B.8 footnotes: 1 US gal = 231 in³; 1 lbf/in² from 1 lb = 0.453 592 37 kg and
    // standard gravity 9.806 65 m/s².
    expect(fromDisplay('volume', 1, 'us')).toBeCloseTo(231 * 0.0254 ** 3, 18);
    expect(fromDisplay('pressure', 1, 'us')).toBeCloseTo((0.45359237 * 9.80665) / 0.0254 ** 2, 9);
    expect(fromDisplay('flow', 1, 'metric', 'm3/h')).toBeCloseTo(1 / 3600, 18);
    expect(fromDisplay('volume', 1, 'us', 'ft3')).toBeCloseTo(0.3048 ** 3, 18);
  });

  test('shows one standard atmosphere (1.013 25 E+05 Pa) as 14.695 95 psia', () => {
    // NIST SP 811 B.8: atmosphere, standard → 1.013 25 E+05 Pa; 14.695 95 psi follows.
    expect(toDisplay('pressure', 101325, 'us')).toBeCloseTo(14.69595, 5);
    expect(toDisplay('pressure', 101325, 'metric')).toBeCloseTo(101.325, 12);
  });
});

describe('temperature', () => {
  // NIST SP 811 B.9 / §4.2.1.1: t/°C = (t/°F − 32)/1.8 (exact).
  test.each([
    [-40, -40],
    [0, 32],
    [15, 59],
    [37, 98.6],
    [100, 212],
  ])('shows %d °C as %d °F', (c, f) => {
    expect(toDisplay('temperature', c, 'us')).toBeCloseTo(f, 12);
    expect(fromDisplay('temperature', f, 'us')).toBeCloseTo(c, 12);
    expect(toDisplay('temperature', c, 'metric')).toBe(c);
  });
});

describe('round trips', () => {
  const units = quantityKinds.flatMap((kind) =>
    unitSystems.flatMap((system) =>
      unitsByKind[kind][system].map((unit) => ({ kind, system, unit })),
    ),
  );
  test('does fromDisplay(toDisplay(x)) = x within 1e-12 for every unit (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...units),
        fc.double({ min: -1e9, max: 1e9, noNaN: true }),
        ({ kind, system, unit }, x) => {
          const back = fromDisplay(kind, toDisplay(kind, x, system, unit), system, unit);
          return Math.abs(back - x) <= 1e-12 * Math.max(1, Math.abs(x));
        },
      ),
      { numRuns: 2000 },
    );
  });

  test('does toDisplay(fromDisplay(v)) = v within 1e-12 for every unit (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...units),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        ({ kind, system, unit }, v) => {
          const back = toDisplay(kind, fromDisplay(kind, v, system, unit), system, unit);
          return Math.abs(back - v) <= 1e-11 * Math.max(1, Math.abs(v));
        },
      ),
      { numRuns: 2000 },
    );
  });
});

describe('unitLabel and unit choice', () => {
  test('labels every kind in both systems', () => {
    for (const kind of quantityKinds) {
      for (const system of unitSystems) expect(unitLabel(kind, system)).not.toBe('');
    }
    expect(unitLabel('flow', 'us')).toBe('US gal/min');
    expect(unitLabel('flow', 'metric')).toBe('L/s');
    expect(unitLabel('pressure', 'us')).toBe('psia');
    expect(unitLabel('pressure', 'metric')).toBe('kPa abs');
  });

  test('rejects a unit of the wrong kind or system with a clear error', () => {
    expect(() => toDisplay('flow', 1, 'us', 'l/s')).toThrow(/not a us unit of flow/);
    expect(() => toDisplay('flow', 1, 'metric', 'ft')).toThrow(RangeError);
    expect(() => toDisplay('bogus' as never, 1, 'us')).toThrow(/Unknown quantity kind/);
  });

  test('defines every listed unit', () => {
    for (const kind of quantityKinds) {
      for (const system of unitSystems) {
        for (const unit of unitsByKind[kind][system]) expect(displayUnits[unit]).toBeDefined();
      }
    }
  });
});

describe('formatNumber', () => {
  test.each([
    [0, '0'],
    [1.23456, '1.23'],
    [0.99951, '1.00'],
    [0.000123456, '0.000123'],
    [-2.5e-4, '-0.000250'],
    [999.6, '1000'],
    [12345.6, '12\u202f300'],
    [Number.NaN, '—'],
    [Infinity, '—'],
  ])('writes %d to 3 significant figures as %s', (v, s) => {
    expect(formatNumber(v)).toBe(s);
  });

  test('rejects a bad digit count', () => {
    expect(() => formatNumber(1, 0)).toThrow(RangeError);
  });
});

describe('formatDuration', () => {
  test.each([
    [0, '0 s'],
    [45, '45 s'],
    [60, '0:01'],
    [3725, '1:02'],
    [3599, '1:00'],
    [259200, '72:00'],
    [-1, '—'],
    [Number.NaN, '—'],
  ])('writes %d s as %s', (s, text) => {
    expect(formatDuration(s)).toBe(text);
  });
});

describe('formatQuantity', () => {
  test('writes SI values in the crew’s units with the label', () => {
    // 1 L/s = 1e-3 / 6.309 020 E-05 = 15.850 US gal/min (NIST SP 811 factor).
    expect(formatQuantity('flow', 1e-3, 'us')).toBe('15.9 US gal/min');
    expect(formatQuantity('flow', 1e-3, 'metric')).toBe('1.00 L/s');
    expect(formatQuantity('flow', 1e-3, 'metric', 3, 'm3/h')).toBe('3.60 m³/h');
    // NIST SP 811 §7.2: a space separates the number from °C / °F.
    expect(formatQuantity('temperature', 15, 'us')).toBe('59.0 °F');
    expect(formatQuantity('diameter', 0.0254, 'us', 2)).toBe('1.0 in');
    expect(formatQuantity('time', 3725, 'metric')).toBe('1:02 h:min');
    expect(formatQuantity('time', 30, 'us')).toBe('30 s');
  });
});
