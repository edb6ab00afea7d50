/**
 * The velocity that satisfies the energy equation of a line, by regime:
 *   2g·H = (K + λ·f(Re))·V²,  K = 1 + K_entrance + ΣK,  λ = L/D,  Re = V·D/ν.
 * The head loss grows strictly with V in every regime (laminar ∝ V and V², the transition rule
 * rises with Re, Colebrook falls no faster than Re^-0.25), so the root is unique and each regime
 * can be tried in turn. Allocation-free: it fills the state object it is given.
 */
import type { LineState, ResolvedLine } from './line-resolve';
import { G } from './constants';
import {
  colebrookSlope,
  colebrookX,
  F_LAMINAR_AT_2000,
  RE_LAMINAR_MAX,
  RE_TURBULENT_MIN,
  swameeJain,
} from './friction';

const REL_TOL = 1e-14;
const MAX_ITER = 60;

/** Fill s.velocityMS, reynolds, frictionFactor and regime for head H > 0, kinematic viscosity ν. */
export function solveVelocity(line: ResolvedLine, headM: number, nu: number, s: LineState): void {
  const d = line.diameterM;
  const k = line.kMinorTotal;
  const lam = line.lengthOverD;
  const g2h = 2 * G * headM;
  // Laminar closed form: K·V² + (64·ν·λ/D)·V − 2gH = 0 (Hagen–Poiseuille friction).
  const b = (64 * nu * lam) / d;
  const vLam = (2 * g2h) / (b + Math.sqrt(b * b + 4 * k * g2h));
  if ((vLam * d) / nu <= RE_LAMINAR_MAX || lam === 0) {
    finish(s, vLam, d, nu, line);
    return;
  }
  const v4000 = (RE_TURBULENT_MIN * nu) / d;
  if ((k + lam * line.f4000) * v4000 * v4000 > g2h) {
    s.velocityMS = transitional(line, g2h, nu, v4000);
    s.reynolds = (s.velocityMS * d) / nu;
    const m = (line.f4000 - F_LAMINAR_AT_2000) / 2000;
    s.frictionFactor = F_LAMINAR_AT_2000 + m * (s.reynolds - RE_LAMINAR_MAX);
    s.regime = 'transitional';
    return;
  }
  turbulent(line, g2h, nu, v4000, s);
}

/** Laminar result, or the frictionless (L = 0) case, where f is only reported. */
function finish(s: LineState, v: number, d: number, nu: number, line: ResolvedLine): void {
  const re = (v * d) / nu;
  s.velocityMS = v;
  s.reynolds = re;
  if (re <= RE_LAMINAR_MAX) {
    s.frictionFactor = 64 / re;
    s.regime = 'laminar';
  } else if (re < RE_TURBULENT_MIN) {
    s.frictionFactor = F_LAMINAR_AT_2000 + ((line.f4000 - F_LAMINAR_AT_2000) * (re - 2000)) / 2000;
    s.regime = 'transitional';
  } else {
    s.frictionFactor =
      1 /
      colebrookX(
        re,
        line.relativeRoughness,
        1 / Math.sqrt(swameeJain(re, line.relativeRoughness)),
      ) **
        2;
    s.regime = 'turbulent';
  }
}

/**
 * Transition: P(V) = (K + λ·(0.032 + m·(Re − 2000)))·V² − 2gH is increasing and convex on
 * [V2000, V4000], so Newton from the right end converges monotonically.
 */
function transitional(line: ResolvedLine, g2h: number, nu: number, v4000: number): number {
  const d = line.diameterM;
  const lam = line.lengthOverD;
  const m = (line.f4000 - F_LAMINAR_AT_2000) / 2000;
  let v = v4000;
  for (let i = 0; i < MAX_ITER; i++) {
    const f = F_LAMINAR_AT_2000 + m * ((v * d) / nu - RE_LAMINAR_MAX);
    const p = (line.kMinorTotal + lam * f) * v * v - g2h;
    const dp = 2 * v * (line.kMinorTotal + lam * f) + ((lam * m * d) / nu) * v * v;
    const vn = v - p / dp;
    const done = Math.abs(vn - v) <= REL_TOL * vn;
    v = vn;
    if (done) break;
  }
  return v;
}

/** Turbulent: safeguarded Newton on P(V) = (K + λ·f_CW(Re))·V² − 2gH over [V4000, V_hi]. */
function turbulent(line: ResolvedLine, g2h: number, nu: number, v4000: number, s: LineState): void {
  const d = line.diameterM;
  const rr = line.relativeRoughness;
  const lam = line.lengthOverD;
  const k = line.kMinorTotal;
  // f falls with Re, so f at the frictionless velocity under-estimates f: V0 is above the root.
  const vMax = Math.sqrt(g2h / k);
  let x = colebrookX((vMax * d) / nu, rr, 1 / Math.sqrt(swameeJain((vMax * d) / nu, rr)));
  let hi = Math.sqrt(g2h / (k + lam / (x * x)));
  let lo = v4000;
  let v = hi;
  for (let i = 0; i < MAX_ITER; i++) {
    const re = (v * d) / nu;
    x = colebrookX(re, rr, x);
    const f = 1 / (x * x);
    const p = (k + lam * f) * v * v - g2h;
    if (p === 0) break;
    if (p > 0) hi = v;
    else lo = v;
    const dp = 2 * v * (k + lam * f) + lam * colebrookSlope(re, rr, x) * (d / nu) * v * v;
    let vn = v - p / dp;
    if (!(vn >= lo && vn <= hi)) vn = 0.5 * (lo + hi);
    const done = Math.abs(vn - v) <= REL_TOL * vn;
    v = vn;
    if (done) break;
  }
  s.velocityMS = v;
  s.reynolds = (v * d) / nu;
  x = colebrookX(s.reynolds, rr, x);
  s.frictionFactor = 1 / (x * x);
  s.regime = 'turbulent';
}
