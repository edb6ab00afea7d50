/**
 * Darcy friction factor: laminar 64/Re, Colebrook–White (1939) for turbulent flow, and
 * Drainwright's stated rule for the laminar–turbulent transition.
 */
import type { Regime } from './types';

/** Upper Reynolds number of the laminar law (API v1). */
export const RE_LAMINAR_MAX = 2000;
/** Lower Reynolds number of Colebrook–White (API v1). */
export const RE_TURBULENT_MIN = 4000;
/** 64/Re at Re = 2000. */
export const F_LAMINAR_AT_2000 = 64 / RE_LAMINAR_MAX;

const TWO_OVER_LN10 = 2 / Math.LN10;

/**
 * Swamee–Jain (1976) explicit approximation of Colebrook–White, used only to seed Newton:
 * f = 0.25 / [log10(ε/(3.7D) + 5.74/Re^0.9)]². Within about 1 % for 5e3 ≤ Re ≤ 1e8,
 * 1e-6 ≤ ε/D ≤ 1e-2 (Swamee & Jain, J. Hydraul. Div. ASCE 102(5), 1976).
 * @param reynolds Reynolds number, dimensionless, > 0.
 * @param relativeRoughness ε/D, dimensionless, ≥ 0.
 */
export function swameeJain(reynolds: number, relativeRoughness: number): number {
  const l = Math.log10(relativeRoughness / 3.7 + 5.74 / reynolds ** 0.9);
  return 0.25 / (l * l);
}

/**
 * Newton on x = 1/√f for Colebrook–White, from the seed x0. Returns x.
 * G(x) = x + 2·log10(ε/(3.7D) + 2.51·x/Re) is increasing and concave in x, so Newton converges
 * monotonically (quadratically) after its first step.
 */
export function colebrookX(reynolds: number, relativeRoughness: number, x0: number): number {
  const a = relativeRoughness / 3.7;
  const b = 2.51 / reynolds;
  let x = x0 > 0 ? x0 : 8;
  for (let k = 0; k < 30; k++) {
    const s = a + b * x;
    const dx = (x + TWO_OVER_LN10 * Math.log(s)) / (1 + (TWO_OVER_LN10 * b) / s);
    let xn = x - dx;
    if (!(xn > 0)) xn = x / 2; // stay where the logarithm is defined
    const done = Math.abs(xn - x) <= 1e-15 * xn;
    x = xn;
    if (done) break;
  }
  return x;
}

/**
 * Colebrook–White equation solved to machine precision:
 * 1/√f = −2·log10( ε/(3.7·D) + 2.51/(Re·√f) ).
 * Seeded by Swamee–Jain, then Newton on 1/√f.
 *
 * @param reynolds Reynolds number Re = ρVD/μ, dimensionless; the equation is meant for
 *   Re ≥ 4000 (turbulent); Drainwright warns above 1e8 (beyond the Moody chart).
 * @param relativeRoughness ε/D, dimensionless, ≥ 0; warned above 0.05.
 * @returns Darcy friction factor f, dimensionless.
 * Source: C. F. Colebrook, J. Inst. Civil Eng. 11 (1939) 133–156.
 */
export function colebrookWhite(reynolds: number, relativeRoughness: number): number {
  const x = colebrookX(
    reynolds,
    relativeRoughness,
    1 / Math.sqrt(swameeJain(reynolds, relativeRoughness)),
  );
  return 1 / (x * x);
}

/**
 * Slope df/dRe of Colebrook–White at (Re, f = 1/x²), by implicit differentiation of
 * G(x, Re) = x + 2·log10(ε/(3.7D) + 2.51·x/Re) = 0. Used by the line solver's Newton step.
 */
export function colebrookSlope(reynolds: number, relativeRoughness: number, x: number): number {
  const b = 2.51 / reynolds;
  const s = relativeRoughness / 3.7 + b * x;
  const gx = 1 + (TWO_OVER_LN10 * b) / s;
  const gre = (-TWO_OVER_LN10 * b * x) / (reynolds * s);
  return (2 / (x * x * x)) * (gre / gx);
}

/**
 * Friction factor in the transition, Drainwright's rule: linear in Re between the laminar value
 * 64/2000 = 0.032 at Re = 2000 and the Colebrook–White value at Re = 4000, so f is continuous
 * across both ends:
 * f = 0.032 + (f_CW(4000, ε/D) − 0.032)·(Re − 2000)/2000.
 * @param reynolds Reynolds number, 2000 ≤ Re ≤ 4000.
 * @param f4000 Colebrook–White friction factor at Re = 4000 for this ε/D.
 */
export function transitionalFriction(reynolds: number, f4000: number): number {
  return F_LAMINAR_AT_2000 + ((f4000 - F_LAMINAR_AT_2000) * (reynolds - RE_LAMINAR_MAX)) / 2000;
}

/** Regime name for a Reynolds number: laminar ≤ 2000 < transitional < 4000 ≤ turbulent. */
export function regimeOf(reynolds: number): Regime {
  if (reynolds <= RE_LAMINAR_MAX) return 'laminar';
  return reynolds < RE_TURBULENT_MIN ? 'transitional' : 'turbulent';
}

/**
 * Darcy friction factor for full-pipe flow of a Newtonian liquid:
 * laminar f = 64/Re (Hagen–Poiseuille) for Re ≤ 2000; Colebrook–White for Re ≥ 4000; between,
 * {@link transitionalFriction}.
 * @param reynolds Reynolds number, dimensionless, > 0 (Re ≤ 0 gives f = Infinity, laminar).
 * @param relativeRoughness ε/D, dimensionless, ≥ 0.
 */
export function frictionFactor(
  reynolds: number,
  relativeRoughness: number,
): { f: number; regime: Regime } {
  const regime = regimeOf(reynolds);
  if (regime === 'laminar') return { f: reynolds > 0 ? 64 / reynolds : Infinity, regime };
  if (regime === 'turbulent') return { f: colebrookWhite(reynolds, relativeRoughness), regime };
  const f4000 = colebrookWhite(RE_TURBULENT_MIN, relativeRoughness);
  return { f: transitionalFriction(reynolds, f4000), regime };
}
