import { describe, expect, test } from 'vitest';
import { solveLine } from '../../../src/lib/hydraulics/line';
import type { LineRequest, LossBreakdown, Regime } from '../../../src/lib/hydraulics/types';
import { loadFixture, logMax, relDev } from './reference-fixture';

// Reference: flows solved independently in Python — scipy.optimize.brentq on the API v1 energy
// equation H = (1 + Ke + ΣK + f·L/D)·V²/2g with fluids.friction.Colebrook (turbulent) or 64/Re
// (laminar), water from iapws IAPWS95 — via tests/fixtures/gravity-lines.json. Only clearly
// laminar or turbulent cases: the transition rule is the engine's own.
// Tolerances: flow 0.5 %; velocity, Reynolds number and friction factor 0.5 %; regime exact.
interface Row {
  name: string;
  request: LineRequest;
  expected: {
    head_m: number;
    flow_m3_s: number;
    velocity_m_s: number;
    reynolds: number;
    friction_factor: number;
    regime: Regime;
    losses_m: LossBreakdown;
  };
}
const fx = loadFixture<Row>('gravity-lines.json');
const TOL = 5e-3;
const flowDevs: number[] = [];

describe(`solveLine against scipy ${fx.libraries.scipy} + fluids ${fx.libraries.fluids}`, () => {
  test.each(fx.cases.map((c) => [c.name, c] as const))('does %s', (_name, c) => {
    const r = solveLine(c.request);
    const e = c.expected;
    expect(r.status).toBe('runs');
    expect(r.regime).toBe(e.regime);
    expect(r.head_m).toBeCloseTo(e.head_m, 9);
    flowDevs.push(relDev(r.flow_m3_s, e.flow_m3_s));
    expect(relDev(r.flow_m3_s, e.flow_m3_s)).toBeLessThan(TOL);
    expect(relDev(r.velocity_m_s, e.velocity_m_s)).toBeLessThan(TOL);
    expect(relDev(r.reynolds, e.reynolds)).toBeLessThan(TOL);
    expect(relDev(r.friction_factor, e.friction_factor)).toBeLessThan(TOL);
    // Each loss within 0.5 % of the reference's share of the head (1 % of a tiny share is noise).
    for (const k of ['entrance', 'fittings', 'friction', 'exit'] as const) {
      expect(Math.abs(r.losses_m[k] - e.losses_m[k])).toBeLessThan(TOL * e.head_m);
    }
  });

  test('reports the largest flow deviation', () => {
    logMax('line flow vs scipy/fluids', flowDevs);
    expect(flowDevs.length).toBe(fx.cases.length);
  });
});
