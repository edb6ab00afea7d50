import { describe, expect, test } from 'vitest';
import {
  geopotentialAltitude,
  standardAtmospherePressure,
} from '../../../src/lib/hydraulics/atmosphere';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe('standardAtmospherePressure', () => {
  // US Standard Atmosphere 1976, table by GEOMETRIC altitude (5 significant figures; values
  // from memory), so the tolerance is half a unit in the 5th figure.
  test.each([
    [-500, 1.0748e5],
    [0, 1.01325e5],
    [1000, 8.9876e4],
    [2000, 7.9501e4],
    [5000, 5.4048e4],
  ])('matches the 1976 table at %d m geometric to 5 figures', (z, p) => {
    expect(rel(standardAtmospherePressure(z), p)).toBeLessThan(6e-5);
  });

  // python3-fluids 1.0.22: fluids.atmosphere.ATMOSPHERE_1976(Z).P, Z geometric altitude.
  test.each([
    [-500, 107478.00229517762],
    [1000, 89876.28518727123],
    [2000, 79501.42464166698],
    [5000, 54048.28614576141],
    [6000, 47217.64247589497],
  ])('matches python3-fluids ATMOSPHERE_1976 at %d m to 1e-9 relative', (z, p) => {
    expect(rel(standardAtmospherePressure(z), p)).toBeLessThan(1e-9);
  });
});

describe('geopotentialAltitude', () => {
  // python3-fluids 1.0.22: ATMOSPHERE_1976(Z).H (geopotential altitude of geometric Z).
  test.each([
    [1000, 999.8427120469674],
    [6000, 5994.342083301508],
    [-500, -500.03933126776],
  ])('converts %d m geometric like python3-fluids to 1e-9 m', (z, h) => {
    expect(Math.abs(geopotentialAltitude(z) - h)).toBeLessThan(1e-9);
  });
});
