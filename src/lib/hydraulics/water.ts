/**
 * Properties of liquid water at atmospheric pressure, 0.01–99 °C.
 *
 * - Vapour pressure: IAPWS-IF97 saturation-pressure equation (region 4, Eq. 30 of the revised
 *   release, 2007).
 * - Density: IAPWS-IF97 region 1 basic equation (Eq. 7) at p = 101.325 kPa.
 * - Viscosity: IAPWS Formulation 2008 for the viscosity of ordinary water substance, industrial
 *   use (critical enhancement μ2 = 1, which the release allows far from the critical point), with
 *   the density from IF97 region 1.
 */
import type { FluidProps } from './types';
import { KELVIN_OFFSET, P_SEA_LEVEL } from './constants';

/** Valid temperature range of {@link waterProperties}, °C. */
export const WATER_T_MIN_C = 0.01;
export const WATER_T_MAX_C = 99;

const N4 = [
  0.11670521452767e4, -0.72421316703206e6, -0.17073846940092e2, 0.1202082470247e5,
  -0.32325550322333e7, 0.1491510861353e2, -0.48232657361591e4, 0.40511340542057e6,
  -0.23855557567849, 0.65017534844798e3,
] as const;

/**
 * Saturation pressure of water, IAPWS-IF97 region 4 (Eq. 30):
 * ϑ = T + n9/(T − n10); A = ϑ² + n1ϑ + n2; B = n3ϑ² + n4ϑ + n5; C = n6ϑ² + n7ϑ + n8;
 * p_s = (2C / (−B + √(B² − 4AC)))⁴ MPa.
 *
 * @param temperatureK temperature, K; valid 273.15–647.096 K (the release's range).
 * @returns saturation (vapour) pressure, Pa.
 * Source: IAPWS R7-97(2012), Revised Release on the IAPWS Industrial Formulation 1997.
 */
export function saturationPressureIF97(temperatureK: number): number {
  const t = temperatureK;
  const th = t + N4[8] / (t - N4[9]);
  const a = th * th + N4[0] * th + N4[1];
  const b = N4[2] * th * th + N4[3] * th + N4[4];
  const c = N4[5] * th * th + N4[6] * th + N4[7];
  const x = (2 * c) / (-b + Math.sqrt(b * b - 4 * a * c));
  return x * x * x * x * 1e6;
}

// IF97 region 1 coefficients (Table 2 of the release): exponents I, J and n.
const I1 = [
  0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29,
  30, 31, 32,
] as const;
const J1 = [
  -2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6,
  -29, -31, -38, -39, -40, -41,
] as const;
const N1 = [
  0.14632971213167, -0.84548187169114, -0.3756360367204e1, 0.33855169168385e1, -0.95791963387872,
  0.15772038513228, -0.16616417199501e-1, 0.81214629983568e-3, 0.28319080123804e-3,
  -0.60706301565874e-3, -0.18990068218419e-1, -0.32529748770505e-1, -0.21841717175414e-1,
  -0.5283835796993e-4, -0.47184321073267e-3, -0.30001780793026e-3, 0.47661393906987e-4,
  -0.44141845330846e-5, -0.72694996297594e-15, -0.31679644845054e-4, -0.28270797985312e-5,
  -0.85205128120103e-9, -0.22425281908e-5, -0.65171222895601e-6, -0.14341729937924e-12,
  -0.40516996860117e-6, -0.12734301741641e-8, -0.17424871230634e-9, -0.68762131295531e-18,
  0.14478307828521e-19, 0.26335781662795e-22, -0.11947622640071e-22, 0.18228094581404e-23,
  -0.93537087292458e-25,
] as const;
/** Specific gas constant of water in IF97, J/(kg·K). */
const R_IF97 = 461.526;

/**
 * Density of liquid water from IF97 region 1: v = (R·T/p)·π·γ_π with π = p/16.53 MPa,
 * τ = 1386 K/T and γ_π = Σ −nᵢ·Iᵢ·(7.1 − π)^(Iᵢ−1)·(τ − 1.222)^Jᵢ; ρ = 1/v.
 *
 * @param temperatureK temperature, K; valid 273.15 K up to the saturation temperature at p.
 * @param pressurePa absolute pressure, Pa; valid p_s(T) ≤ p ≤ 100 MPa.
 * @returns density, kg/m³.
 * Source: IAPWS R7-97(2012), Eq. 7 and Table 3.
 */
export function densityIF97Region1(temperatureK: number, pressurePa: number): number {
  const pi = pressurePa / 16.53e6;
  const tau = 1386 / temperatureK;
  fillPowers(A_POW, 7.1 - pi, 0);
  fillPowers(B_POW, tau - 1.222, B_OFFSET);
  let gp = 0;
  for (let i = 0; i < N1.length; i++) {
    const ii = I1[i];
    if (ii === 0) continue;
    gp -= N1[i] * ii * A_POW[ii - 1] * B_POW[J1[i] + B_OFFSET];
  }
  return 1 / ((R_IF97 * temperatureK * pi * gp) / pressurePa);
}

// Integer powers by repeated multiplication (much faster than Math.pow, error a few ulp).
const A_POW = new Float64Array(32); // a^0 … a^31
const B_OFFSET = 41;
const B_POW = new Float64Array(B_OFFSET + 18); // b^-41 … b^17

/** out[k] = x^(k − offset) for every slot of out. */
function fillPowers(out: Float64Array, x: number, offset: number): void {
  out[offset] = 1;
  for (let k = offset + 1; k < out.length; k++) out[k] = out[k - 1] * x;
  const inv = 1 / x;
  for (let k = offset - 1; k >= 0; k--) out[k] = out[k + 1] * inv;
}

/**
 * Density of water at 101.325 kPa by IF97 region 1 ({@link densityIF97Region1}).
 * @param temperatureC temperature, °C; valid 0.01–99 °C.
 * @returns density, kg/m³.
 */
export function waterDensity(temperatureC: number): number {
  return densityIF97Region1(temperatureC + KELVIN_OFFSET, P_SEA_LEVEL);
}

const X_POW = new Float64Array(6);
const Y_POW = new Float64Array(7);
const H0 = [1.67752, 2.20462, 0.6366564, -0.241605] as const;
const HI = [0, 1, 2, 3, 0, 1, 2, 3, 5, 0, 1, 2, 3, 4, 0, 1, 0, 3, 4, 3, 5] as const;
const HJ = [0, 0, 0, 0, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 4, 4, 5, 6, 6] as const;
const HN = [
  0.520094, 0.850895e-1, -0.108374e1, -0.289555, 0.222531, 0.999115, 0.188797e1, 0.126613e1,
  0.120573, -0.281378, -0.906851, -0.772479, -0.489837, -0.25704, 0.161913, 0.257399, -0.325372e-1,
  0.698452e-1, 0.872102e-2, -0.435673e-2, -0.593264e-3,
] as const;

/**
 * Viscosity by the IAPWS 2008 formulation without critical enhancement:
 * μ/μ* = μ0(T̄)·μ1(T̄, ρ̄), μ0 = 100·√T̄ / Σᵢ Hᵢ/T̄ⁱ,
 * μ1 = exp(ρ̄ · Σᵢ Σⱼ Hᵢⱼ (1/T̄ − 1)ⁱ (ρ̄ − 1)ʲ), T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³, μ* = 1 µPa·s.
 *
 * @param temperatureK temperature, K; valid 253.15–1173.15 K for liquid and vapour (the
 *   release's range); used here for 273.16–372.15 K.
 * @param densityKgM3 density, kg/m³.
 * @returns dynamic viscosity, Pa·s.
 * Source: IAPWS R12-08, Eqs. 10–12, Tables 1–2.
 */
export function viscosityIAPWS2008(temperatureK: number, densityKgM3: number): number {
  const tr = temperatureK / 647.096;
  const dr = densityKgM3 / 322;
  const mu0 = (100 * Math.sqrt(tr)) / (H0[0] + H0[1] / tr + H0[2] / tr ** 2 + H0[3] / tr ** 3);
  fillPowers(X_POW, 1 / tr - 1, 0);
  fillPowers(Y_POW, dr - 1, 0);
  let s = 0;
  for (let k = 0; k < HN.length; k++) s += HN[k] * X_POW[HI[k]] * Y_POW[HJ[k]];
  return mu0 * Math.exp(dr * s) * 1e-6;
}

/**
 * Dynamic viscosity of water at 101.325 kPa: IAPWS 2008 ({@link viscosityIAPWS2008}) with the
 * IF97 region 1 density.
 * @param temperatureC temperature, °C; valid 0.01–99 °C.
 * @returns dynamic viscosity, Pa·s.
 */
export function waterViscosity(temperatureC: number): number {
  return viscosityIAPWS2008(temperatureC + KELVIN_OFFSET, waterDensity(temperatureC));
}

/**
 * Density, viscosity (at 101.325 kPa) and vapour pressure of water.
 * @param temperatureC temperature, °C; valid 0.01–99 °C (throws RangeError outside).
 */
export function waterProperties(temperatureC: number): FluidProps {
  if (!(temperatureC >= WATER_T_MIN_C && temperatureC <= WATER_T_MAX_C)) {
    throw new RangeError(`water temperature must be ${WATER_T_MIN_C}–${WATER_T_MAX_C} °C`);
  }
  const density = waterDensity(temperatureC);
  return {
    density_kg_m3: density,
    viscosity_pa_s: viscosityIAPWS2008(temperatureC + KELVIN_OFFSET, density),
    vapor_pressure_pa: saturationPressureIF97(temperatureC + KELVIN_OFFSET),
  };
}
