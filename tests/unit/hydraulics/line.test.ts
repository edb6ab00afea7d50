import { describe, expect, test } from 'vitest';
import { G } from '../../../src/lib/hydraulics/constants';
import { findFitting, findMaterial } from '../../../src/lib/hydraulics/catalog';
import {
  drivingHead,
  lineFlowAtHead,
  resolveLine,
  solveLine,
} from '../../../src/lib/hydraulics/line';
import type { LineRequest } from '../../../src/lib/hydraulics/types';
import { EngineInputError } from '../../../src/lib/hydraulics/types';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
const sum = (l: { entrance: number; fittings: number; friction: number; exit: number }): number =>
  l.entrance + l.fittings + l.friction + l.exit;

/**
 * Reference solutions computed with python3-scipy 1.10.1 brentq (xtol 1e-15) on the energy
 * equation (K + f·L/D)·V²/2g = H, f = python3-fluids 1.0.22 fluids.friction.Colebrook, water at
 * 15 °C from python3-iapws 1.5.2 (IF97 region 1 density, IAPWS 2008 viscosity).
 * Columns: D, L, ε, entrance K, ΣK, H → V, Re, f.
 */
const SCIPY_CASES: [number, number, number, number, number, number, number, number, number][] = [
  [0.05, 30, 1.5e-6, 0.5, 0, 5, 2.870629670582814, 126060.4172090883, 0.01733421818967111],
  [0.1, 200, 4.5e-5, 0.5, 2, 3, 1.161253642982157, 101990.24988840424, 0.020066634278436454],
  [0.025, 15, 1.5e-6, 0.5, 0.5, 1.2, 1.1888640286804468, 26103.801719207364, 0.024420072938246638],
  [0.3, 1000, 1.5e-4, 0.5, 1, 8, 1.5918220854971799, 419418.2724649572, 0.01782688364911944],
];

function req(d: number, l: number, eps: number, ke: number, k: number, h: number): LineRequest {
  return {
    line: { inner_diameter_m: d, length_m: l, roughness_m: eps, entrance_k: ke, minor_loss_k: k },
    source_level_m: 10 + h,
    outlet_elevation_m: 10,
  };
}

describe('solveLine', () => {
  test.each(SCIPY_CASES)(
    'matches the scipy/fluids reference for D=%d m, L=%d m (V, Re, f to 1e-9 relative)',
    (d, l, eps, ke, k, h, v, re, f) => {
      const r = solveLine(req(d, l, eps, ke, k, h));
      expect(r.status).toBe('runs');
      expect(rel(r.velocity_m_s, v)).toBeLessThan(1e-9);
      expect(rel(r.reynolds, re)).toBeLessThan(1e-9);
      expect(rel(r.friction_factor, f)).toBeLessThan(1e-9);
      expect(rel(r.flow_m3_s, (v * Math.PI * d * d) / 4)).toBeLessThan(1e-9);
      expect(r.regime).toBe('turbulent');
      expect(rel(sum(r.losses_m), h)).toBeLessThan(1e-12);
    },
  );

  // python3-scipy brentq with the stated transition rule written independently in Python
  // (0.032 + (fluids Colebrook(4000, ε/D) − 0.032)·(Re − 2000)/2000), water at 15 °C.
  test.each([
    [0.05, 0.06682905366673501, 'laminar'],
    [0.2, 0.2427557400982921, 'transitional'],
    [0.5, 0.3616498676993853, 'transitional'],
    [1.0, 0.49626212706011885, 'turbulent'],
  ])('matches the scipy reference across regimes for a 10 mm tube at H=%d m', (h, v, regime) => {
    const r = solveLine(req(0.01, 20, 1.5e-6, 0.5, 0, h));
    expect(rel(r.velocity_m_s, v)).toBeLessThan(1e-9);
    expect(r.regime).toBe(regime);
  });

  test('obeys Hagen–Poiseuille for a long laminar line (closed form, 1e-5 relative)', () => {
    // Viscous liquid: velocity heads are < 1e-6 of H, so Q → π·D⁴·ρ·g·H / (128·μ·L).
    const fluid = { density_kg_m3: 900, viscosity_pa_s: 0.5, vapor_pressure_pa: 100 };
    const d = 0.02;
    const l = 100;
    const h = 2;
    const r = solveLine({ ...req(d, l, 0, 0.5, 0, h), fluid });
    const qHP = (Math.PI * d ** 4 * 900 * G * h) / (128 * 0.5 * l);
    expect(r.regime).toBe('laminar');
    expect(rel(r.flow_m3_s, qHP)).toBeLessThan(1e-5);
    // and exactly when the velocity heads are taken off H: V = ρ·g·h_f·D²/(32·μ·L)
    const hf = r.losses_m.friction;
    expect(rel(r.velocity_m_s, (900 * G * hf * d * d) / (32 * 0.5 * l))).toBeLessThan(1e-12);
  });

  test('flows like Torricelli through a zero-length line: V = √(2gH/(1 + K_entrance))', () => {
    const r = solveLine(req(0.05, 0, 0, 0.5, 0, 2));
    expect(rel(r.velocity_m_s, Math.sqrt((2 * G * 2) / 1.5))).toBeLessThan(1e-14);
  });

  test('multiplies the flow by the number of parallel lines', () => {
    const one = solveLine(req(0.05, 30, 1.5e-6, 0.5, 0, 5));
    const r = req(0.05, 30, 1.5e-6, 0.5, 0, 5);
    r.line.parallel_lines = 7;
    const seven = solveLine(r);
    expect(seven.velocity_m_s).toBe(one.velocity_m_s);
    expect(rel(seven.flow_m3_s, 7 * one.flow_m3_s)).toBeLessThan(1e-14);
  });

  test('measures head to a tailwater only when it stands above the outlet', () => {
    expect(drivingHead(10, 2, 5)).toBe(5);
    expect(drivingHead(10, 2, 1)).toBe(8);
    expect(drivingHead(10, 2)).toBe(8);
  });

  test('reports no_flow with zero flow when the head is zero or negative', () => {
    const r = solveLine({ ...req(0.05, 30, 1e-6, 0.5, 0, 1), tailwater_level_m: 12 });
    expect(r.status).toBe('no_flow');
    expect(r.head_m).toBe(-1);
    expect(r.flow_m3_s).toBe(0);
    expect(r.velocity_m_s).toBe(0);
    expect(sum(r.losses_m)).toBe(0);
    expect(r.warnings.map((w) => w.code)).toEqual(['no_head']);
  });

  test('warns of scour above 3 m/s (common practice)', () => {
    const r = solveLine(req(0.1, 5, 1e-6, 0.5, 0, 10));
    expect(r.velocity_m_s).toBeGreaterThan(3);
    expect(r.warnings.map((w) => w.code)).toContain('high_outlet_velocity');
  });
});

describe('resolveLine', () => {
  test('takes roughness from a catalogue material and K from catalogue fittings', () => {
    const elbow = findFitting('elbow-90-standard');
    const pvc = findMaterial('pvc');
    expect(elbow && pvc).toBeTruthy();
    const r = resolveLine({
      inner_diameter_m: 0.05,
      length_m: 10,
      material: 'pvc',
      minor_loss_k: 0.3,
      fittings: [{ id: 'elbow-90-standard', count: 2 }],
    });
    expect(r.roughnessM).toBe(pvc?.roughness_m);
    expect(r.fittingsK).toBeCloseTo(0.3 + 2 * (elbow?.k ?? NaN), 14);
    expect(r.entranceK).toBe(0.5);
    expect(r.parallel).toBe(1);
  });

  test.each([
    [{ inner_diameter_m: 0, length_m: 1, roughness_m: 0 }, 'line.inner_diameter_m'],
    [{ inner_diameter_m: 6, length_m: 1, roughness_m: 0 }, 'line.inner_diameter_m'],
    [{ inner_diameter_m: 0.1, length_m: -1, roughness_m: 0 }, 'line.length_m'],
    [{ inner_diameter_m: 0.1, length_m: 1, roughness_m: 0.1 }, 'line.roughness_m'],
    [{ inner_diameter_m: 0.1, length_m: 1 }, 'line'],
    [{ inner_diameter_m: 0.1, length_m: 1, roughness_m: 0, material: 'pvc' }, 'line'],
    [{ inner_diameter_m: 0.1, length_m: 1, material: 'unobtainium' }, 'line.material'],
    [{ inner_diameter_m: 0.1, length_m: 1, roughness_m: 0, minor_loss_k: -1 }, 'line.minor_loss_k'],
    [
      { inner_diameter_m: 0.1, length_m: 1, roughness_m: 0, entrance_k: Number.NaN },
      'line.entrance_k',
    ],
    [
      { inner_diameter_m: 0.1, length_m: 1, roughness_m: 0, parallel_lines: 51 },
      'line.parallel_lines',
    ],
    [
      { inner_diameter_m: 0.1, length_m: 1, roughness_m: 0, parallel_lines: 1.5 },
      'line.parallel_lines',
    ],
    [
      { inner_diameter_m: 0.1, length_m: 1, roughness_m: 0, fittings: [{ id: 'nope', count: 1 }] },
      'line.fittings.0.id',
    ],
    [
      {
        inner_diameter_m: 0.1,
        length_m: 1,
        roughness_m: 0,
        fittings: [{ id: 'elbow-90-standard', count: 0 }],
      },
      'line.fittings.0.count',
    ],
    [
      {
        inner_diameter_m: 0.1,
        length_m: 1,
        roughness_m: 0,
        fittings: [{ id: 'entrance-sharp', count: 1 }],
      },
      'line.fittings.0.id',
    ],
  ])('rejects %j at %s', (line, path) => {
    try {
      resolveLine(line as never);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(EngineInputError);
      expect((e as EngineInputError).path).toBe(path);
    }
  });
});

describe('lineFlowAtHead', () => {
  test('fills and returns the object it is given', () => {
    const line = resolveLine({ inner_diameter_m: 0.05, length_m: 30, roughness_m: 1.5e-6 });
    const fluid = {
      density_kg_m3: 999.101114187188,
      viscosity_pa_s: 0.0011375693361148573,
      vapor_pressure_pa: 1705.7,
    };
    const out = {
      velocityMS: 0,
      flowM3S: 0,
      reynolds: 0,
      frictionFactor: 0,
      regime: 'laminar' as const,
    };
    const r = lineFlowAtHead(line, 5, fluid, out);
    expect(r).toBe(out);
    // same scipy/fluids reference as the first SCIPY_CASES row
    expect(rel(r.velocityMS, 2.870629670582814)).toBeLessThan(1e-9);
  });
});
