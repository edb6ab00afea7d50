import { describe, expect, test } from 'vitest';
import {
  findFitting,
  findMaterial,
  findSize,
  fittings,
  materials,
  sizes,
} from '../../../src/lib/hydraulics/catalog';

// Structure of the catalogue. Its values are checked against outside tables in
// reference-catalog.test.ts (fluids' ASTM D1785 / ASME B36.10M tables and Crane-method K).
const all = [...materials, ...fittings, ...sizes];

describe('catalog', () => {
  test('does give every entry a unique kebab-case id and a source', () => {
    const ids = all.map((e) => e.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const e of all) {
      expect(e.id).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
      expect(e.source.length).toBeGreaterThan(10);
    }
  });

  test('does find entries by id and return undefined for unknown ids', () => {
    expect(findMaterial('pvc')?.roughness_m).toBeCloseTo(1.5e-6, 12);
    expect(findFitting('entrance-sharp')?.k).toBe(0.5);
    expect(findSize('garden-hose-0-75in')?.inner_diameter_m).toBeCloseTo(0.01905, 9);
    expect(findMaterial('nope')).toBeUndefined();
    expect(findFitting('nope')).toBeUndefined();
    expect(findSize('nope')).toBeUndefined();
  });

  test('does keep values physical', () => {
    for (const m of materials) expect(m.roughness_m).toBeGreaterThan(0);
    for (const f of fittings) expect(f.k).toBeGreaterThan(0);
    for (const s of sizes) {
      expect(s.inner_diameter_m).toBeGreaterThan(0.005);
      if (s.outer_diameter_m !== undefined) {
        expect(s.inner_diameter_m).toBeLessThan(s.outer_diameter_m);
        expect(s.outer_diameter_m - 2 * s.wall_m!).toBeCloseTo(s.inner_diameter_m, 5); // µm rounding
      }
      expect(findMaterial(s.material), s.id).toBeDefined();
      expect(s.name_us).not.toBe('');
      expect(s.name_metric).not.toBe('');
    }
  });

  test('does list ISO 4427 PE100 SDR 11 bores as OD − 2e (63 mm: e = 5.8 mm, from memory)', () => {
    // ISO 4427-2 dimension table, recalled: 63 mm SDR 11 has e_min = 5.8 mm → bore 51.4 mm.
    expect(findSize('hdpe-sdr11-63mm')?.inner_diameter_m).toBeCloseTo(0.0514, 9);
    for (const s of sizes.filter((x) => x.family === 'hdpe-sdr11' && x.id !== 'hdpe-sdr11-20mm')) {
      // SDR = OD / e = 11 within the standard's rounding of e to 0.1 mm (at 20 mm the 2.0 mm
      // minimum wall governs instead).
      expect(s.outer_diameter_m! / s.wall_m!).toBeGreaterThan(10.5);
      expect(s.outer_diameter_m! / s.wall_m!).toBeLessThan(11.5);
    }
  });
});
