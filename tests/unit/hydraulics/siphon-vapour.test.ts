/**
 * A siphon's verdict when the caller's crest limit is below the vapour pressure (API v1 spec:
 * `breaks` whenever crest pressure < p_v, whatever the limit; `marginal` for p_v ≤ crest < limit;
 * `runs` for crest ≥ limit), and a drain through such a siphon stopping at max(limit, p_v).
 *
 * Hand-computed cases: a line of zero length with no entrance loss has no friction, so the energy
 * equation H = (1 + K)·V²/(2g) gives V²/(2g) = H/(1 + K) exactly, and the spec's crest formula
 * p_crest = p_atm − ρg(z_crest − z_source) − ρV²/2·(1 + K_e + K_to_crest + f·L_to_crest/D)
 * reduces to p_atm − ρg(z_crest − z_source) − ρg·H·(1 + K_to_crest)/(1 + K).
 */
import { describe, expect, test } from 'vitest';
import { G } from '../../../src/lib/hydraulics/constants';
import { solveDrain } from '../../../src/lib/hydraulics/drain';
import { siphonBreakSourceLevel, solveSiphon } from '../../../src/lib/hydraulics/siphon';
import type { DrainRequest, SiphonRequest } from '../../../src/lib/hydraulics/types';

const RHO = 1000;
const PV = 2000;
const PATM = 100_000;
const fluid = { density_kg_m3: RHO, viscosity_pa_s: 1e-3, vapor_pressure_pa: PV };
const site = { atmospheric_pressure_pa: PATM };
/** No friction (L = 0), no entrance loss, no fittings: ρV²/2 = ρgH. */
const bare = { inner_diameter_m: 0.05, length_m: 0, roughness_m: 0, entrance_k: 0 };

function siphon(crest: number, limit: number): SiphonRequest {
  return {
    fluid,
    site,
    line: bare,
    source_level_m: 0,
    outlet_elevation_m: -1,
    crest_elevation_m: crest,
    length_to_crest_m: 0,
    min_crest_pressure_pa: limit,
  };
}

/** By hand: p = p_atm − ρg(z_crest − 0) − ρg·1 m. */
const handCrestPa = (crest: number): number => PATM - RHO * G * (crest + 1);

describe('solveSiphon with a limit below the vapour pressure', () => {
  test('does answer breaks when crest pressure is between the limit and p_v (crest 9.05 m: 1443.2 Pa)', () => {
    for (const limit of [1000, 0]) {
      const r = solveSiphon(siphon(9.05, limit));
      // 100 000 − 9806.65 × 10.05 = 1443.1675 Pa; tolerance 1e-6 Pa (rounding only)
      expect(Math.abs(r.crest_pressure_abs_pa - handCrestPa(9.05))).toBeLessThan(1e-6);
      expect(r.crest_pressure_abs_pa).toBeGreaterThan(limit);
      expect(r.crest_pressure_abs_pa).toBeLessThan(PV);
      expect(r.status).toBe('breaks');
      expect(r.crest_limit_pa).toBe(limit);
      expect(r.warnings.map((w) => w.code)).toContain('siphon_breaks');
    }
  });

  test('does answer runs when crest pressure is above both (crest 8.5 m: 6836.8 Pa)', () => {
    const r = solveSiphon(siphon(8.5, 1000));
    expect(Math.abs(r.crest_pressure_abs_pa - handCrestPa(8.5))).toBeLessThan(1e-6);
    expect(r.status).toBe('runs');
  });

  test('does keep marginal for p_v ≤ crest < limit (crest 8.85 m: 3404.5 Pa, limit 5000 Pa)', () => {
    const r = solveSiphon(siphon(8.85, 5000));
    expect(Math.abs(r.crest_pressure_abs_pa - handCrestPa(8.85))).toBeLessThan(1e-6);
    expect(r.status).toBe('marginal');
  });
});

describe('drain through a siphon whose limit is below the vapour pressure', () => {
  // Box 2 × 2 × 2 m, bottom at 0, full; line with K = 1 and none of it before the crest, so by
  // hand p_crest = p_atm − ρg(z_c − z_s) − ρg(z_s − z_out)/2, which falls with the surface z_s.
  // It reaches p_target at z_s = 2·z_c − z_out − 2·(p_atm − p_target)/(ρg).
  const crest = 8;
  const out = -5;
  const stopAt = (target: number): number => 2 * crest - out - (2 * (PATM - target)) / (RHO * G);

  function drain(limit: number): DrainRequest {
    return {
      fluid,
      site,
      vessel: { shape: 'box', length_m: 2, width_m: 2, depth_m: 2 },
      initial_depth_m: 2,
      outlet: {
        type: 'siphon',
        line: { ...bare, minor_loss_k: 1 },
        intake_elevation_m: 0,
        crest_elevation_m: crest,
        length_to_crest_m: 0,
        outlet_elevation_m: out,
        min_crest_pressure_pa: limit,
      },
    };
  }

  test('does stop where crest pressure reaches p_v, not the lower limit (1.01357 m)', () => {
    for (const limit of [0, 1000]) {
      const r = solveDrain(drain(limit));
      expect(r.stop_reason).toBe('siphon_breaks');
      // 21 − 2 × 98 000 / 9806.65 = 1.013567 m; tolerance 1e-6 m (the root is found to 1e-9)
      expect(Math.abs(r.stop_depth_m - stopAt(PV))).toBeLessThan(1e-6);
    }
  });

  test('does still stop at a limit above p_v (5000 Pa: 1.62536 m)', () => {
    const r = solveDrain(drain(5000));
    expect(r.stop_reason).toBe('siphon_breaks');
    expect(Math.abs(r.stop_depth_m - stopAt(5000))).toBeLessThan(1e-6);
  });

  test('does give the page the same break level as the drain (siphonBreakSourceLevel)', () => {
    const req: SiphonRequest = {
      fluid,
      site,
      line: { ...bare, minor_loss_k: 1 },
      source_level_m: 2,
      outlet_elevation_m: out,
      crest_elevation_m: crest,
      length_to_crest_m: 0,
      min_crest_pressure_pa: 0,
    };
    expect(Math.abs((siphonBreakSourceLevel(req) ?? NaN) - stopAt(PV))).toBeLessThan(1e-6);
  });
});
