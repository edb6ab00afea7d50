import { describe, expect, test } from 'vitest';
import {
  headForFlow,
  linesForFlow,
  smallestSizeForFlow,
} from '../../../src/lib/hydraulics/inverse';
import { EngineInputError } from '../../../src/lib/hydraulics/types';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

// python3-scipy 1.10.1 brentq on (K + f·L/D)·V²/2g = H with python3-fluids 1.0.22 Colebrook,
// water at 15 °C from python3-iapws 1.5.2: 50 mm, 30 m, ε 1.5e-6 m, K_e 0.5, H 5 m → Q below;
// 300 mm, 1000 m, ε 1.5e-4 m, K_e 0.5, ΣK 1, H 8 m → Q_BIG.
const Q_50MM = 0.005636468177674912;
const Q_BIG = 0.11251927281644827;
const LINE_50 = { inner_diameter_m: 0.05, length_m: 30, roughness_m: 1.5e-6 };

describe('headForFlow', () => {
  test('needs 5 m for the scipy/fluids reference flow of a 50 mm line (1e-9 relative)', () => {
    const r = headForFlow({ line: LINE_50, flow_m3_s: Q_50MM });
    expect(rel(r.head_m, 5)).toBeLessThan(1e-9);
    expect(r.regime).toBe('turbulent');
  });

  test('needs 8 m for the reference flow of a 300 mm line with fittings (1e-9 relative)', () => {
    const line = { inner_diameter_m: 0.3, length_m: 1000, roughness_m: 1.5e-4, minor_loss_k: 1 };
    expect(rel(headForFlow({ line, flow_m3_s: Q_BIG }).head_m, 8)).toBeLessThan(1e-9);
  });

  test('splits the flow over parallel lines: 3 lines carry 3× the reference at the same head', () => {
    const r = headForFlow({ line: { ...LINE_50, parallel_lines: 3 }, flow_m3_s: 3 * Q_50MM });
    expect(rel(r.head_m, 5)).toBeLessThan(1e-9);
  });

  test('rejects a flow that is not positive', () => {
    expect(() => headForFlow({ line: LINE_50, flow_m3_s: 0 })).toThrow(EngineInputError);
  });
});

describe('linesForFlow', () => {
  const base = { line: LINE_50, source_level_m: 5, outlet_elevation_m: 0 };

  test('asks for 3 lines for 2.5× the reference single-line flow', () => {
    const r = linesForFlow({ ...base, flow_m3_s: 2.5 * Q_50MM });
    expect(r.parallel_lines).toBe(3);
    expect(rel(r.flow_per_line_m3_s, Q_50MM)).toBeLessThan(1e-9);
    expect(rel(r.flow_m3_s, 3 * Q_50MM)).toBeLessThan(1e-9);
  });

  test('does not round an exact multiple up to one line more', () => {
    expect(linesForFlow({ ...base, flow_m3_s: 4 * Q_50MM * (1 - 1e-10) }).parallel_lines).toBe(4);
  });

  test('gives null when more than 50 lines would be needed, or when there is no head', () => {
    expect(linesForFlow({ ...base, flow_m3_s: 51 * Q_50MM }).parallel_lines).toBeNull();
    expect(
      linesForFlow({ ...base, outlet_elevation_m: 6, flow_m3_s: 1e-3 }).parallel_lines,
    ).toBeNull();
  });
});

describe('smallestSizeForFlow', () => {
  const base = {
    line: { length_m: 30, roughness_m: 1.5e-6 },
    source_level_m: 5,
    outlet_elevation_m: 0,
    families: ['suction-hose' as const],
  };

  test('picks 2 in (50.8 mm) suction hose for the flow a 50 mm bore just delivers', () => {
    // The reference flow is that of a 50 mm bore; 1 1/2 in (38.1 mm) carries far less.
    const r = smallestSizeForFlow({ ...base, flow_m3_s: Q_50MM });
    expect(r.size?.inner_diameter_m).toBeCloseTo(0.0508, 6);
    expect(r.result?.flow_m3_s).toBeGreaterThanOrEqual(Q_50MM);
  });

  test('gives null when no size in the families is big enough', () => {
    expect(smallestSizeForFlow({ ...base, flow_m3_s: 10 })).toEqual({ size: null, result: null });
  });
});
