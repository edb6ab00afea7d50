/**
 * Atmospheric pressure from altitude, US Standard Atmosphere 1976 (NOAA/NASA/USAF, 1976).
 */
import { G, P_SEA_LEVEL } from './constants';

/** Effective Earth radius used by the 1976 standard for geopotential altitude, m. */
const R0 = 6_356_766;
/** Universal gas constant as defined in the 1976 standard, N·m/(kmol·K). */
const R_STAR = 8_314.32;
/** Mean molar mass of sea-level air, kg/kmol. */
const M0 = 28.9644;

/** Base geopotential altitude (m'), temperature (K) and lapse rate (K/m') of the lowest layers. */
const LAYERS = [
  { h: 0, t: 288.15, l: -0.0065, p: P_SEA_LEVEL },
  { h: 11_000, t: 216.65, l: 0, p: 0 },
  { h: 20_000, t: 216.65, l: 0.001, p: 0 },
];
// Base pressures of the upper layers follow from the lower ones (the standard's own construction).
for (let i = 1; i < LAYERS.length; i++) LAYERS[i].p = layerPressure(LAYERS[i - 1], LAYERS[i].h);

function layerPressure(b: { h: number; t: number; l: number; p: number }, h: number): number {
  const k = (G * M0) / R_STAR;
  if (b.l === 0) return b.p * Math.exp((-k * (h - b.h)) / b.t);
  return b.p * (b.t / (b.t + b.l * (h - b.h))) ** (k / b.l);
}

/**
 * Geopotential altitude from geometric altitude: H = r0·z / (r0 + z), r0 = 6 356 766 m.
 * @param geometricAltitudeM geometric altitude above mean sea level, m.
 * @returns geopotential altitude, m' (geopotential metres). Source: US Standard Atmosphere 1976.
 */
export function geopotentialAltitude(geometricAltitudeM: number): number {
  return (R0 * geometricAltitudeM) / (R0 + geometricAltitudeM);
}

/**
 * Atmospheric pressure of the US Standard Atmosphere 1976.
 *
 * The input is GEOMETRIC altitude (what a map or GPS gives); it is converted to geopotential
 * altitude H first, then in a layer with lapse rate L ≠ 0: p = p_b·(T_b / (T_b + L·(H − H_b)))^(g0·M0/(R*·L)),
 * and for L = 0: p = p_b·exp(−g0·M0·(H − H_b)/(R*·T_b)).
 *
 * @param geometricAltitudeM geometric altitude, m; valid −500…6000 m for Drainwright (the
 *   formula itself holds to 32 km geopotential).
 * @returns absolute pressure, Pa.
 * Source: US Standard Atmosphere 1976, Eqs. 18, 33a and 33b.
 */
export function standardAtmospherePressure(geometricAltitudeM: number): number {
  const h = geopotentialAltitude(geometricAltitudeM);
  let b = LAYERS[0];
  for (const layer of LAYERS) if (h >= layer.h) b = layer;
  return layerPressure(b, h);
}
