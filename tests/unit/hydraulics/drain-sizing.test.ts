import { describe, expect, test } from 'vitest';
import { smallestSizeForDrain } from '../../../src/lib/hydraulics/drain-sizing';
import type { SizeForDrainRequest } from '../../../src/lib/hydraulics/drain-sizing';
import { sizes } from '../../../src/lib/hydraulics/catalog';
import { EngineInputError } from '../../../src/lib/hydraulics/types';

const G = 9.80665;

// A line of zero length has no friction, so the energy equation H = (1 + K_e)·V²/(2g) makes it an
// orifice with Cd = 1/√(1 + K_e); Torricelli then gives t = A_tank·√(1 + K_e)/a·√(2h₀/g), and the
// bore needed for a target time is a = A_tank·√(1 + K_e)·√(2h₀/g)/t.
const req: SizeForDrainRequest = {
  vessel: { shape: 'box', length_m: 2, width_m: 1, depth_m: 2 },
  initial_depth_m: 1.5,
  outlet: { type: 'line', line: { length_m: 0, entrance_k: 0.5 }, outlet_elevation_m: 0 },
  target_time_s: 600,
};

describe('smallestSizeForDrain', () => {
  test('picks the smallest catalogue bore at or above the Torricelli bore for the target time', () => {
    const a = (2 * Math.sqrt(1.5) * Math.sqrt((2 * 1.5) / G)) / 600;
    const dMin = Math.sqrt((4 * a) / Math.PI);
    const expected = sizes
      .filter((s) => s.inner_diameter_m >= dMin)
      .sort((x, y) => x.inner_diameter_m - y.inner_diameter_m)[0];
    const r = smallestSizeForDrain(req);
    expect(r.size?.id).toBe(expected.id);
    expect(r.result?.status).toBe('drains');
    expect(r.result!.time_s).toBeLessThanOrEqual(600);
  });

  test('keeps to the families asked for', () => {
    const r = smallestSizeForDrain({ ...req, families: ['pvc-sch80'] });
    expect(r.size?.family).toBe('pvc-sch80');
  });

  test('answers null when no size reaches the final depth (intake above it)', () => {
    const r = smallestSizeForDrain({ ...req, outlet: { ...req.outlet, intake_elevation_m: 0.5 } });
    expect(r).toEqual({ size: null, result: null });
  });

  test('rejects a target time that is not > 0 and an orifice outlet', () => {
    expect(() => smallestSizeForDrain({ ...req, target_time_s: 0 })).toThrow(EngineInputError);
    const orifice = {
      type: 'orifice',
      diameter_m: 0.05,
    } as unknown as SizeForDrainRequest['outlet'];
    expect(() => smallestSizeForDrain({ ...req, outlet: orifice })).toThrow(EngineInputError);
  });
});
