/**
 * Absolute pressure along a siphon, for the pressure chart. The line is taken to rise evenly from
 * the intake (at the source surface) to the crest over `length_to_crest_m`, then fall evenly to
 * the outlet; friction grows with distance and the fittings' K is spread over each leg in
 * proportion to its length. By the energy equation from the source surface at rest:
 *   p(s) = p_atm − ρg(z(s) − z_source) − ρV²/2·(1 + K_e + K(s) + f·s/D)
 * which equals the engine's crest pressure at the crest and p_atm − ρg(z_out − z_source) −
 * ρV²/2·(1 + K_e + ΣK + f·L/D) at the outlet (atmospheric for a free outlet).
 */
import type { SiphonRequest, SiphonResult } from '../hydraulics';
import { G, resolveFluid, resolveLine } from '../hydraulics';

export interface ProfilePoint {
  /** Distance along the line from the intake, m. */
  s_m: number;
  /** Elevation of the line there, m. */
  z_m: number;
  /** Absolute pressure, Pa. */
  p_pa: number;
}

/** Pressure at `n` + 1 points on each leg (intake → crest → outlet). */
export function siphonProfile(req: SiphonRequest, r: SiphonResult, n = 20): ProfilePoint[] {
  const fluid = resolveFluid(req.fluid);
  const line = resolveLine(req.line);
  const rho = fluid.density_kg_m3;
  const hv = (rho * r.velocity_m_s ** 2) / 2;
  const lc = req.length_to_crest_m;
  const kc = req.minor_loss_k_to_crest ?? 0;
  const kAfter = Math.max(0, line.fittingsK - kc);
  const zs = req.source_level_m;
  const pts: ProfilePoint[] = [];
  const at = (s: number, z: number, k: number): ProfilePoint => ({
    s_m: s,
    z_m: z,
    p_pa:
      r.atmospheric_pressure_pa -
      rho * G * (z - zs) -
      hv * (1 + line.entranceK + k + (r.friction_factor * s) / line.diameterM),
  });
  for (let i = 0; i <= n; i++) {
    const t = i / n;
    pts.push(at(lc * t, zs + (req.crest_elevation_m - zs) * t, kc * t));
  }
  const rest = line.lengthM - lc;
  for (let i = 1; i <= n && rest > 0; i++) {
    const t = i / n;
    const z = req.crest_elevation_m + (req.outlet_elevation_m - req.crest_elevation_m) * t;
    pts.push(at(lc + rest * t, z, kc + kAfter * t));
  }
  return pts;
}
