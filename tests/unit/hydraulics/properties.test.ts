import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { G } from '../../../src/lib/hydraulics/constants';
import { colebrookWhite } from '../../../src/lib/hydraulics/friction';
import { headAtFlow } from '../../../src/lib/hydraulics/inverse';
import { lineFlowAtHead, resolveLine, solveLine } from '../../../src/lib/hydraulics/line';
import { solveSiphon } from '../../../src/lib/hydraulics/siphon';
import { waterProperties } from '../../../src/lib/hydraulics/water';

// Property checks: the energy equation's own structure (head balance, monotonicity), not values.
const lineArb = fc
  .record({
    inner_diameter_m: fc.double({ min: 0.005, max: 1, noNaN: true }),
    length_m: fc.double({ min: 0, max: 5000, noNaN: true }),
    roughness_m: fc.double({ min: 0, max: 0.002, noNaN: true }),
    minor_loss_k: fc.double({ min: 0, max: 20, noNaN: true }),
    entrance_k: fc.double({ min: 0, max: 1, noNaN: true }),
  })
  .filter((l) => l.roughness_m < l.inner_diameter_m / 10);
const headArb = fc.double({ min: 1e-4, max: 200, noNaN: true });
const tempArb = fc.double({ min: 0.01, max: 99, noNaN: true });

describe('gravity line properties', () => {
  test('losses add up to the head to 1e-12 relative, in every regime', () => {
    fc.assert(
      fc.property(lineArb, headArb, tempArb, (line, h, t) => {
        const r = solveLine({
          line,
          fluid: { water_temperature_c: t },
          source_level_m: h,
          outlet_elevation_m: 0,
        });
        const l = r.losses_m;
        expect(Math.abs(l.entrance + l.fittings + l.friction + l.exit - h) / h).toBeLessThan(1e-12);
      }),
      { numRuns: 2000 },
    );
  });

  test('flow rises with head and falls with length', () => {
    const fluid = waterProperties(15);
    fc.assert(
      fc.property(
        lineArb,
        headArb,
        fc.double({ min: 1.001, max: 3, noNaN: true }),
        (line, h, k) => {
          const a = resolveLine(line);
          const q = lineFlowAtHead(a, h, fluid).flowM3S;
          expect(lineFlowAtHead(a, h * k, fluid).flowM3S).toBeGreaterThan(q);
          const longer = resolveLine({ ...line, length_m: line.length_m * k + 1 });
          expect(lineFlowAtHead(longer, h, fluid).flowM3S).toBeLessThan(q);
        },
      ),
      { numRuns: 1000 },
    );
  });

  test('the inverse (head for a flow) returns the head it came from to 1e-10 relative', () => {
    const fluid = waterProperties(20);
    fc.assert(
      fc.property(lineArb, headArb, (line, h) => {
        const a = resolveLine(line);
        const q = lineFlowAtHead(a, h, fluid).flowM3S;
        expect(Math.abs(headAtFlow(a, q, fluid).headM - h) / h).toBeLessThan(1e-10);
      }),
      { numRuns: 1000 },
    );
  });

  test('the reported friction factor satisfies Colebrook–White when turbulent (1e-12)', () => {
    fc.assert(
      fc.property(lineArb, headArb, (line, h) => {
        const r = solveLine({ line, source_level_m: h, outlet_elevation_m: 0 });
        if (r.regime !== 'turbulent') return;
        const f = colebrookWhite(r.reynolds, line.roughness_m / line.inner_diameter_m);
        expect(Math.abs(r.friction_factor - f) / f).toBeLessThan(1e-12);
      }),
      { numRuns: 1000 },
    );
  });
});

describe('siphon properties', () => {
  test('crest pressure falls one ρg per metre the crest rises, at an unchanged flow', () => {
    fc.assert(
      fc.property(lineArb, headArb, fc.double({ min: 0.1, max: 5, noNaN: true }), (line, h, dz) => {
        const req = {
          line,
          source_level_m: h,
          outlet_elevation_m: 0,
          crest_elevation_m: h + 1,
          length_to_crest_m: line.length_m / 3,
        };
        const a = solveSiphon(req);
        const b = solveSiphon({ ...req, crest_elevation_m: h + 1 + dz });
        expect(b.flow_m3_s).toBe(a.flow_m3_s);
        const expected = waterProperties(15).density_kg_m3 * G * dz;
        expect(
          Math.abs(a.crest_pressure_abs_pa - b.crest_pressure_abs_pa - expected) / expected,
        ).toBeLessThan(1e-9);
      }),
      { numRuns: 500 },
    );
  });
});
