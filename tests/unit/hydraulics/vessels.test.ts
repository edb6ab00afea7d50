import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { vesselGeometry } from '../../../src/lib/hydraulics/vessels';
import { EngineInputError } from '../../../src/lib/hydraulics/types';
import type { VesselInput } from '../../../src/lib/hydraulics/types';

/** |a − b| ≤ tol·|b|. */
const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

describe('vesselGeometry', () => {
  // Reference: fluids 1.0.22, fluids.geometry.V_from_h(h, D=2.0, L=5.0, horizontal=True)
  // (flat-ended horizontal tank). Tolerance 1e-12 relative.
  test.each([
    [0.3, 1.4774942009307206],
    [1.0, 7.853981633974483],
    [1.7, 14.230469067018245],
  ])('gives a horizontal cylinder the volume of fluids V_from_h at h = %f m', (h, v) => {
    const g = vesselGeometry({ shape: 'horizontal_cylinder', diameter_m: 2, length_m: 5 });
    expect(rel(g.volume(h), v)).toBeLessThan(1e-12);
  });

  // Reference: fluids 1.0.22, fluids.geometry.V_partial_sphere(2.0, h). Tolerance 1e-12 relative.
  test.each([
    [0.25, 0.17998707911191525],
    [1.0, 2.0943951023931953],
    [1.9, 4.158421475801689],
  ])('gives a sphere the volume of fluids V_partial_sphere at h = %f m', (h, v) => {
    const g = vesselGeometry({ shape: 'sphere', diameter_m: 2 });
    expect(rel(g.volume(h), v)).toBeLessThan(1e-12);
  });

  // Reference: fluids 1.0.22, fluids.geometry.V_from_h(h, D=1.2, L=1.4, horizontal=False,
  // sideA='conical', sideA_a=0.6) (vertical tank, conical bottom). Tolerance 1e-12 relative.
  test.each([
    [0.3, 0.02827433388230814],
    [0.6, 0.22619467105846514],
    [1.5, 1.244070690821558],
  ])('gives a cone-bottom tank the volume of fluids V_from_h at h = %f m', (h, v) => {
    const g = vesselGeometry({
      shape: 'cone_bottom',
      diameter_m: 1.2,
      cone_height_m: 0.6,
      depth_m: 2,
    });
    expect(rel(g.volume(h), v)).toBeLessThan(1e-12);
  });

  test('matches the circular-segment area (R²/2)(θ − sin θ) of a horizontal cylinder', () => {
    // Handbook form of the segment with central angle θ = 2·acos((R − h)/R), times the length.
    const r = 0.75;
    const l = 3.2;
    const g = vesselGeometry({ shape: 'horizontal_cylinder', diameter_m: 2 * r, length_m: l });
    for (const h of [0.01, 0.4, 0.75, 1.1, 1.49]) {
      const theta = 2 * Math.acos((r - h) / r);
      expect(rel(g.volume(h), ((r * r) / 2) * (theta - Math.sin(theta)) * l)).toBeLessThan(1e-12);
    }
  });

  test('keeps its precision for a horizontal cylinder at a film of water', () => {
    // For h ≪ D the segment is ∫₀ʰ 2√(Dx)·(1 − x/2D…) dx ≈ (4/3)√D·h^{3/2}, relative error ~h/D.
    const g = vesselGeometry({ shape: 'horizontal_cylinder', diameter_m: 5, length_m: 2 });
    for (const h of [1e-12, 1e-9, 1e-7]) {
      expect(rel(g.volume(h), 2 * (4 / 3) * Math.sqrt(5) * h ** 1.5)).toBeLessThan(1e-6);
    }
  });

  test('matches the spherical cap πh(3a² + h²)/6 with base radius a² = h(2R − h)', () => {
    // Handbook cap formula in terms of the cap's base radius (a different form from the engine's).
    const g = vesselGeometry({ shape: 'sphere', diameter_m: 3 });
    for (const h of [0.1, 1.2, 1.5, 2.9]) {
      const a2 = h * (3 - h);
      expect(rel(g.volume(h), (Math.PI * h * (3 * a2 + h * h)) / 6)).toBeLessThan(1e-12);
      expect(rel(g.area(h), Math.PI * a2)).toBeLessThan(1e-12);
    }
  });

  test('gives a square-bottomed pond the frustum volume h/3·(A₁ + A₂ + √(A₁A₂))', () => {
    // Square bottom + equal side slopes is a frustum of a square pyramid (handbook frustum).
    const g = vesselGeometry({
      shape: 'sloped_pond',
      bottom_length_m: 6,
      bottom_width_m: 6,
      side_slope_h_per_v: 2.5,
      depth_m: 2,
    });
    const h = 1.6;
    const a1 = 36;
    const a2 = (6 + 2 * 2.5 * h) ** 2;
    expect(rel(g.volume(h), (h / 3) * (a1 + a2 + Math.sqrt(a1 * a2)))).toBeLessThan(1e-12);
  });

  test('gives a rectangular pond the prismoidal volume h/6·(A₁ + 4A_m + A₂)', () => {
    // Prismoidal formula (earthworks practice), exact for a rectangular pond with planar sides.
    const g = vesselGeometry({
      shape: 'sloped_pond',
      bottom_length_m: 20,
      bottom_width_m: 8,
      side_slope_h_per_v: 3,
      depth_m: 2.5,
    });
    const a = (x: number): number => (20 + 6 * x) * (8 + 6 * x);
    const h = 2.2;
    expect(rel(g.volume(h), (h / 6) * (a(0) + 4 * a(h / 2) + a(h)))).toBeLessThan(1e-12);
    expect(g.area(h)).toBeCloseTo(a(h), 9);
  });

  test('integrates a depth–area table exactly by trapezoids (hand calculation)', () => {
    // Rows (0, 2) (0.5, 3) (1.2, 6) (2, 6.5): volume to 1.2 m = 0.5·(2+3)/2 + 0.7·(3+6)/2 = 4.4;
    // to 0.85 m: 1.25 + 0.35·(3 + 4.5)/2 = 2.5625 (area 4.5 at 0.85 m by linear interpolation).
    const g = vesselGeometry({
      shape: 'stage_table',
      points: [
        { depth_m: 0, area_m2: 2 },
        { depth_m: 0.5, area_m2: 3 },
        { depth_m: 1.2, area_m2: 6 },
        { depth_m: 2, area_m2: 6.5 },
      ],
    });
    expect(g.volume(1.2)).toBeCloseTo(4.4, 12);
    expect(g.volume(0.85)).toBeCloseTo(2.5625, 12);
    expect(g.area(0.85)).toBeCloseTo(4.5, 12);
    expect(g.maxDepth).toBe(2);
  });

  test('looks up a 1000-row table the same as a linear scan, in any order', () => {
    const depths = Array.from(
      { length: 1000 },
      (_, i) => i * 0.01 + (i > 0 ? 0.001 * Math.sin(i) : 0),
    );
    const points = depths.map((d, i) => ({ depth_m: d, area_m2: 50 + 10 * Math.cos(i / 7) }));
    const g = vesselGeometry({ shape: 'stage_table', points });
    const scan = (h: number): number => {
      let j = 0;
      while (j < points.length - 2 && points[j + 1].depth_m <= h) j++;
      const [p, q] = [points[j], points[j + 1]];
      return p.area_m2 + ((q.area_m2 - p.area_m2) * (h - p.depth_m)) / (q.depth_m - p.depth_m);
    };
    fc.assert(
      fc.property(fc.double({ min: 0, max: depths[999], noNaN: true }), (h) => {
        expect(g.area(h)).toBeCloseTo(scan(h), 9);
      }),
      { numRuns: 300 },
    );
  });

  test.each<[VesselInput, string]>([
    [{ shape: 'box', length_m: 0, width_m: 1, depth_m: 1 }, 'vessel.length_m'],
    [{ shape: 'sphere', diameter_m: Number.NaN }, 'vessel.diameter_m'],
    [{ shape: 'cone_bottom', diameter_m: 1, cone_height_m: 2, depth_m: 1 }, 'vessel.depth_m'],
    [
      {
        shape: 'sloped_pond',
        bottom_length_m: 1,
        bottom_width_m: 1,
        side_slope_h_per_v: -1,
        depth_m: 1,
      },
      'vessel.side_slope_h_per_v',
    ],
    [{ shape: 'stage_table', points: [{ depth_m: 0, area_m2: 1 }] }, 'vessel.points'],
    [
      {
        shape: 'stage_table',
        points: [
          { depth_m: 0.1, area_m2: 1 },
          { depth_m: 1, area_m2: 1 },
        ],
      },
      'vessel.points.0.depth_m',
    ],
    [
      {
        shape: 'stage_table',
        points: [
          { depth_m: 0, area_m2: 1 },
          { depth_m: 0, area_m2: 1 },
        ],
      },
      'vessel.points.1.depth_m',
    ],
    [
      {
        shape: 'stage_table',
        points: [
          { depth_m: 0, area_m2: 1 },
          { depth_m: 1, area_m2: 0 },
        ],
      },
      'vessel.points.1.area_m2',
    ],
  ])('rejects a bad vessel with an error naming its field (%j)', (v, path) => {
    expect(() => vesselGeometry(v)).toThrow(EngineInputError);
    try {
      vesselGeometry(v);
    } catch (e) {
      expect((e as EngineInputError).path).toBe(path);
    }
  });
});
