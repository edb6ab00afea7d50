import { describe, expect, test } from 'vitest';
import {
  densityIF97Region1,
  saturationPressureIF97,
  viscosityIAPWS2008,
  waterDensity,
  waterProperties,
  waterViscosity,
} from '../../../src/lib/hydraulics/water';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe('saturationPressureIF97', () => {
  // IAPWS-IF97 release, Table 35 (computer-program verification values for Eq. 30), MPa.
  test.each([
    [300, 0.353658941e-2],
    [500, 0.263889776e1],
    [600, 0.123443146e2],
  ])('matches IF97 Table 35 at %d K to 1e-8 relative', (t, pMPa) => {
    expect(rel(saturationPressureIF97(t), pMPa * 1e6)).toBeLessThan(1e-8);
  });

  // python3-iapws 1.5.2: iapws.iapws97._PSat_T(T) * 1e6
  test.each([
    [273.16, 611.6570000106653],
    [288.15, 1705.7448743923737],
    [313.15, 7384.42748706953],
    [353.15, 47414.71992637833],
    [372.15, 97851.84664009008],
  ])('matches python3-iapws _PSat_T at %d K to 1e-12 relative', (t, p) => {
    expect(rel(saturationPressureIF97(t), p)).toBeLessThan(1e-12);
  });

  test('gives 611.657 Pa at the triple point (IAPWS triple-point pressure, from memory)', () => {
    expect(saturationPressureIF97(273.16)).toBeCloseTo(611.657, 2);
  });
});

describe('densityIF97Region1', () => {
  // IAPWS-IF97 release, Table 5 (verification values for region 1), specific volume m³/kg.
  test.each([
    [300, 3e6, 0.100215168e-2],
    [300, 80e6, 0.971180894e-3],
    [500, 3e6, 0.1202418e-2],
  ])('matches IF97 Table 5 at %d K, %d Pa to 1e-8 relative', (t, p, v) => {
    expect(rel(1 / densityIF97Region1(t, p), v)).toBeLessThan(1e-8);
  });
});

describe('waterDensity', () => {
  // python3-iapws 1.5.2: 1 / iapws.iapws97._Region1(T, 0.101325)['v']
  test.each([
    [0.01, 999.8449831215293],
    [15, 999.101114187188],
    [40, 992.2242580187883],
    [80, 971.8028995563232],
    [99, 959.0716654063074],
  ])('matches python3-iapws IF97 region 1 at %d °C to 1e-12 relative', (tc, rho) => {
    expect(rel(waterDensity(tc), rho)).toBeLessThan(1e-12);
  });

  test('is about 998.2 kg/m³ at 20 °C (handbook water table, from memory)', () => {
    expect(waterDensity(20)).toBeCloseTo(998.2, 1);
  });
});

describe('viscosityIAPWS2008', () => {
  // IAPWS R12-08 Table 4 check values (µPa·s, from memory), confirmed by python3-iapws 1.5.2
  // iapws._iapws._Viscosity(rho, T).
  test.each([
    [298.15, 998, 889.7351],
    [298.15, 1200, 1437.649467],
    [373.15, 1000, 307.883622],
  ])('matches the release check value at %d K, %d kg/m³ to 1e-7 relative', (t, rho, mu) => {
    expect(rel(viscosityIAPWS2008(t, rho), mu * 1e-6)).toBeLessThan(1e-7);
  });
});

describe('waterViscosity', () => {
  // python3-iapws 1.5.2: _Viscosity(1/_Region1(T, 0.101325)['v'], T)
  test.each([
    [0.01, 0.0017911266582293585],
    [15, 0.0011375693361148573],
    [20, 0.00100159685462303],
    [60, 0.0004660432080668163],
    [99, 0.00028456857399394413],
  ])('matches python3-iapws at %d °C to 1e-12 relative', (tc, mu) => {
    expect(rel(waterViscosity(tc), mu)).toBeLessThan(1e-12);
  });
});

describe('waterProperties', () => {
  test('rejects temperatures outside 0.01–99 °C', () => {
    expect(() => waterProperties(0)).toThrow(RangeError);
    expect(() => waterProperties(99.5)).toThrow(RangeError);
    expect(() => waterProperties(Number.NaN)).toThrow(RangeError);
  });

  test('returns IF97 vapour pressure within 0.1 % at 15 °C (python3-iapws _PSat_T)', () => {
    expect(rel(waterProperties(15).vapor_pressure_pa, 1705.7448743923737)).toBeLessThan(1e-3);
  });
});
