import { describe, expect, test } from 'vitest';
import { resolveAtmosphere, resolveFluid } from '../../../src/lib/hydraulics/fluid';
import { EngineInputError } from '../../../src/lib/hydraulics/types';

const pathOf = (fn: () => unknown): string | undefined => {
  try {
    fn();
  } catch (e) {
    return e instanceof EngineInputError ? e.path : 'not an EngineInputError';
  }
  return undefined;
};

describe('resolveFluid', () => {
  test('defaults to water at 15 °C (python3-iapws 1.5.2 IF97 region 1 and _PSat_T at 288.15 K)', () => {
    const f = resolveFluid();
    expect(Math.abs(f.density_kg_m3 - 999.101114187188)).toBeLessThan(1e-9);
    expect(Math.abs(f.vapor_pressure_pa - 1705.7448743923737)).toBeLessThan(1e-9);
  });

  test('passes a custom liquid through unchanged', () => {
    const liquid = { density_kg_m3: 870, viscosity_pa_s: 0.05, vapor_pressure_pa: 10 };
    expect(resolveFluid(liquid)).toEqual(liquid);
  });

  test.each([
    [{ water_temperature_c: 0 }, 'fluid.water_temperature_c'],
    [{ water_temperature_c: 100 }, 'fluid.water_temperature_c'],
    [{ water_temperature_c: Number.NaN }, 'fluid.water_temperature_c'],
    [{ density_kg_m3: 0, viscosity_pa_s: 1, vapor_pressure_pa: 1 }, 'fluid.density_kg_m3'],
    [{ density_kg_m3: 1, viscosity_pa_s: -1, vapor_pressure_pa: 1 }, 'fluid.viscosity_pa_s'],
    [{ density_kg_m3: 1, viscosity_pa_s: 1 }, 'fluid.vapor_pressure_pa'],
  ])('rejects %j at %s', (fluid, path) => {
    expect(pathOf(() => resolveFluid(fluid as never))).toBe(path);
  });
});

describe('resolveAtmosphere', () => {
  test('defaults to 101 325 Pa (US Standard Atmosphere 1976 sea level)', () => {
    expect(resolveAtmosphere()).toBe(101325);
  });

  test('uses a barometer reading as given and an altitude through the 1976 standard', () => {
    expect(resolveAtmosphere({ atmospheric_pressure_pa: 95_000 })).toBe(95_000);
    // python3-fluids 1.0.22: ATMOSPHERE_1976(1000).P
    expect(Math.abs(resolveAtmosphere({ altitude_m: 1000 }) - 89876.28518727123)).toBeLessThan(
      1e-4,
    );
  });

  test.each([
    [{ altitude_m: -501 }, 'site.altitude_m'],
    [{ altitude_m: 6001 }, 'site.altitude_m'],
    [{ atmospheric_pressure_pa: 29_999 }, 'site.atmospheric_pressure_pa'],
    [{ atmospheric_pressure_pa: 110_001 }, 'site.atmospheric_pressure_pa'],
  ])('rejects %j at %s', (site, path) => {
    expect(pathOf(() => resolveAtmosphere(site))).toBe(path);
  });
});
