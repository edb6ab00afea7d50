import { describe, expect, test } from 'vitest';
import { G } from '../../../src/lib/hydraulics/constants';
import {
  defaultCrestLimit,
  siphonBreakSourceLevel,
  solveSiphon,
} from '../../../src/lib/hydraulics/siphon';
import type { SiphonRequest } from '../../../src/lib/hydraulics/types';
import { EngineInputError } from '../../../src/lib/hydraulics/types';

const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);

// python3-iapws 1.5.2, water at 15 °C: 1/_Region1(288.15, 0.101325)['v'], _PSat_T(288.15)·1e6
const RHO15 = 999.101114187188;
const PV15 = 1705.7448743923737;

/** 50 mm smooth hose, 30 m long, 10 m of it up to a crest 6 m above the source. */
const BASE: SiphonRequest = {
  line: { inner_diameter_m: 0.05, length_m: 30, roughness_m: 1.5e-6 },
  source_level_m: 10,
  outlet_elevation_m: 5,
  crest_elevation_m: 16,
  length_to_crest_m: 10,
};

describe('solveSiphon', () => {
  // Reference computed with python3-scipy 1.10.1 brentq on the energy equation, friction by
  // python3-fluids 1.0.22 Colebrook, water by python3-iapws 1.5.2; crest pressure by the API v1
  // formula written out in Python; limit by the stated rule pv + 0.2·(p_atm − pv).
  test('matches the scipy/fluids reference: crest pressure, lift, limit (1e-9 relative)', () => {
    const r = solveSiphon(BASE);
    expect(rel(r.velocity_m_s, 2.870629670582814)).toBeLessThan(1e-9);
    expect(rel(r.crest_pressure_abs_pa, 22091.71173699535)).toBeLessThan(1e-9);
    expect(rel(r.max_crest_height_m, 8.08066036878949)).toBeLessThan(1e-9);
    expect(rel(r.crest_limit_pa, 21629.5958995139)).toBeLessThan(1e-12);
    expect(r.status).toBe('runs');
    expect(r.atmospheric_pressure_pa).toBe(101325);
    expect(rel(r.vapor_pressure_pa, PV15)).toBeLessThan(1e-12);
  });

  test('matches the scipy/fluids reference at 2000 m altitude with 60 °C water (1e-9 relative)', () => {
    // Same Python method; p_atm from python3-fluids ATMOSPHERE_1976(2000).P = 79501.42464166698.
    const r = solveSiphon({
      fluid: { water_temperature_c: 60 },
      site: { altitude_m: 2000 },
      line: { inner_diameter_m: 0.032, length_m: 20, roughness_m: 7e-6, minor_loss_k: 0.9 },
      source_level_m: 3,
      outlet_elevation_m: 0,
      crest_elevation_m: 7,
      length_to_crest_m: 6,
    });
    expect(rel(r.velocity_m_s, 2.071024722269712)).toBeLessThan(1e-9);
    expect(rel(r.crest_pressure_abs_pa, 30610.932002033274)).toBeLessThan(1e-9);
    expect(rel(r.atmospheric_pressure_pa, 79501.42464166698)).toBeLessThan(1e-9);
  });

  test('fills every parallel line when priming: n·πD²/4·L (closed form)', () => {
    const r = solveSiphon({ ...BASE, line: { ...BASE.line, parallel_lines: 3 } });
    expect(rel(r.priming_volume_m3, 3 * Math.PI * 0.025 ** 2 * 30)).toBeLessThan(1e-14);
  });

  test('grades the crest: runs, marginal (warned), breaks (warned)', () => {
    const at = (crest: number): ReturnType<typeof solveSiphon> =>
      solveSiphon({ ...BASE, crest_elevation_m: crest });
    expect(at(15).status).toBe('runs');
    const marginal = at(17.5);
    expect(marginal.status).toBe('marginal');
    expect(marginal.crest_pressure_abs_pa).toBeLessThan(marginal.crest_limit_pa);
    expect(marginal.warnings.map((w) => w.code)).toContain('siphon_near_limit');
    const breaks = at(19);
    expect(breaks.status).toBe('breaks');
    expect(breaks.crest_pressure_abs_pa).toBeLessThan(PV15);
    expect(breaks.warnings.map((w) => w.code)).toContain('siphon_breaks');
  });

  test('uses a given min_crest_pressure_pa as the limit', () => {
    const r = solveSiphon({ ...BASE, min_crest_pressure_pa: 30_000 });
    expect(r.crest_limit_pa).toBe(30_000);
    expect(r.status).toBe('marginal');
  });

  test('reports no_flow with the static crest pressure when the outlet is above the source', () => {
    const r = solveSiphon({ ...BASE, outlet_elevation_m: 11 });
    expect(r.status).toBe('no_flow');
    expect(r.flow_m3_s).toBe(0);
    // hydrostatics: p_atm − ρ·g·(z_crest − z_source)
    expect(rel(r.crest_pressure_abs_pa, 101325 - RHO15 * G * 6)).toBeLessThan(1e-12);
  });

  test('gives a theoretical lift of about 10.3 m for cold water at sea level (common practice, ±2 %)', () => {
    const r = solveSiphon({ ...BASE, fluid: { water_temperature_c: 10 }, outlet_elevation_m: 11 });
    expect(rel(r.max_crest_height_m, 10.3)).toBeLessThan(0.02);
  });

  test.each([
    [{ length_to_crest_m: 31 }, 'length_to_crest_m'],
    [{ minor_loss_k_to_crest: 0.1 }, 'minor_loss_k_to_crest'],
    [{ min_crest_pressure_pa: -1 }, 'min_crest_pressure_pa'],
    [{ crest_elevation_m: Number.POSITIVE_INFINITY }, 'crest_elevation_m'],
  ])('rejects %j at %s', (patch, path) => {
    try {
      solveSiphon({ ...BASE, ...patch });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(EngineInputError);
      expect((e as EngineInputError).path).toBe(path);
    }
  });
});

describe('defaultCrestLimit', () => {
  test('leaves crews about 7.5–8.5 m of static lift for cold water at sea level (common practice)', () => {
    for (const [rho, pv] of [
      [RHO15, PV15],
      // python3-iapws 1.5.2 at 5 °C: 1/_Region1(278.15, 0.101325)['v'], _PSat_T(278.15)·1e6
      [999.9669228110769, 872.5748611295218],
    ]) {
      const lift = (101325 - defaultCrestLimit(101325, pv)) / (rho * G);
      expect(lift).toBeGreaterThan(7.5);
      expect(lift).toBeLessThan(8.5);
    }
  });
});

describe('siphonBreakSourceLevel', () => {
  test('matches the scipy/fluids reference break level (1e-8 m)', () => {
    // python3-scipy brentq on crest pressure − limit over the source level, same reference method
    expect(Math.abs((siphonBreakSourceLevel(BASE) ?? NaN) - 9.917950688834742)).toBeLessThan(1e-8);
  });

  test('returns null when the crest never reaches its limit before the head runs out', () => {
    expect(siphonBreakSourceLevel({ ...BASE, crest_elevation_m: 11 })).toBeNull();
  });

  test('returns the current level when the siphon is already at or past its limit', () => {
    expect(siphonBreakSourceLevel({ ...BASE, crest_elevation_m: 19 })).toBe(10);
  });
});
