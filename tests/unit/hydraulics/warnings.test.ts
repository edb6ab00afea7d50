import { describe, expect, test } from 'vitest';
import * as engine from '../../../src/lib/hydraulics/index';
import { flowWarnings, makeWarning, WARNING_MESSAGES } from '../../../src/lib/hydraulics/warnings';

const codes = (w: { code: string }[]): string[] => w.map((x) => x.code);

describe('makeWarning', () => {
  test('builds a code and its plain message, with optional detail appended', () => {
    expect(makeWarning('siphon_breaks')).toEqual({
      code: 'siphon_breaks',
      message: WARNING_MESSAGES.siphon_breaks,
    });
    expect(makeWarning('no_head', '(outlet 2)').message.endsWith(' (outlet 2)')).toBe(true);
  });

  test('has a non-empty message for every code', () => {
    for (const m of Object.values(WARNING_MESSAGES)) expect(m.length).toBeGreaterThan(20);
  });
});

describe('flowWarnings', () => {
  test('flags laminar and transitional flow', () => {
    expect(codes(flowWarnings('laminar', 500, 0, 0.1))).toEqual(['laminar_flow']);
    expect(codes(flowWarnings('transitional', 3000, 0, 0.1))).toEqual(['transitional_flow']);
    expect(flowWarnings('turbulent', 1e5, 1e-4, 2)).toEqual([]);
  });

  test('flags scour above 3 m/s (common practice) and not at 3 m/s', () => {
    expect(codes(flowWarnings('turbulent', 1e5, 0, 3.01))).toEqual(['high_outlet_velocity']);
    expect(flowWarnings('turbulent', 1e5, 0, 3)).toEqual([]);
  });

  test('flags results past the Moody chart: Re > 1e8, ε/D > 0.05', () => {
    expect(codes(flowWarnings('turbulent', 2e8, 0.06, 1))).toEqual([
      'reynolds_out_of_range',
      'roughness_out_of_range',
    ]);
  });
});

describe('engine index', () => {
  test('re-exports the solvers and the catalogue', () => {
    for (const name of [
      'solveLine',
      'solveSiphon',
      'solveDrain',
      'headForFlow',
      'sizes',
      'findFitting',
    ]) {
      expect(name in engine).toBe(true);
    }
  });
});
