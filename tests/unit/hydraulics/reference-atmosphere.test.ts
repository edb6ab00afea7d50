import { describe, expect, test } from 'vitest';
import { standardAtmospherePressure } from '../../../src/lib/hydraulics/atmosphere';
import { loadFixture, logMax, relDev } from './reference-fixture';

// Reference: fluids.atmosphere.ATMOSPHERE_1976 (Python, Debian python3-fluids), US Standard
// Atmosphere 1976, at GEOMETRIC altitude (the class converts to geopotential itself), via
// tests/fixtures/atmosphere-1976.json. Tolerance 0.1 %.
const fx = loadFixture<{ altitude_m: number; pressure_pa: number }>('atmosphere-1976.json');

describe(`standardAtmospherePressure against fluids ${fx.libraries.fluids} ATMOSPHERE_1976`, () => {
  test('does pressure within 0.1 % at geometric altitudes −500…6000 m', () => {
    const devs = fx.cases.map((r) =>
      relDev(standardAtmospherePressure(r.altitude_m), r.pressure_pa),
    );
    logMax('atmosphere vs fluids ATMOSPHERE_1976', devs);
    for (const d of devs) expect(d).toBeLessThan(1e-3);
  });
});
