/**
 * Drain time t(h) = ∫_h^{h0} A(η)/ΣQ(η) dη for a quasi-steady drain-down (dV/dt = −ΣQ, dV = A dh).
 *
 * Between outlet cutoffs the set of working outlets is fixed. In each such band the level is
 * written h = c + u², c the band's lower cutoff, so dh = 2u du and the 1/√(h − c) singularity of
 * an orifice or turbulent line (Q ∝ √(h − c)) becomes the smooth g(u) = 2u/ΣQ(c + u²). g is
 * expensive (a line solve per value) and smooth, so it is interpolated once per band by
 * piecewise Chebyshev series; A is cheap but may have kinks (cone knee, table rows), so the
 * product A(c + u²)·g(u) is integrated by adaptive Gauss–Kronrod between the kinks.
 */
import { chebFit, piecewise } from './chebyshev';
import type { OutletModel } from './drain-outlets';
import { gk7, integrateRel } from './quadrature';
import type { VesselGeometry } from './vessels';

/** Relative tolerance of the flow interpolant and of each quadrature piece. */
const REL_TOL = 1e-10;

interface Band {
  lo: number;
  hi: number;
  /** Lower cutoff the substitution is taken about, m. */
  c: number;
  /** Integrand in u: A(c + u²)·g(u). */
  f: (u: number) => number;
}

function makeBand(
  geom: VesselGeometry,
  outlets: OutletModel[],
  lo: number,
  hi: number,
  eps: number,
): Band {
  let c = -Infinity;
  const active: OutletModel[] = [];
  for (const o of outlets) {
    if (o.cutoff <= lo + eps) {
      active.push(o);
      c = Math.min(lo, Math.max(c, o.cutoff));
    }
  }
  const q = (h: number): number => {
    let s = 0;
    for (const o of active) s += o.flow(h);
    return s;
  };
  const g = (u: number): number => {
    const flow = q(c + u * u);
    return flow > 0 ? (2 * u) / flow : 0; // 0 only where u² underflows against c
  };
  // Below this width in u, h = c + u² no longer resolves the level in double precision.
  const minWidth = 1e-7 * Math.sqrt(Math.max(1, Math.abs(c) + Math.abs(hi)));
  const ghat = piecewise(chebFit(g, Math.sqrt(lo - c), Math.sqrt(hi - c), REL_TOL, minWidth));
  return { lo, hi, c, f: (u) => geom.area(c + u * u) * ghat(u) };
}

/** Descending, de-duplicated union of depth lists. */
function breakpoints(lists: number[][]): number[] {
  let n = 0;
  for (const l of lists) n += l.length;
  const all = new Float64Array(n);
  let k = 0;
  for (const l of lists) for (let i = 0; i < l.length; i++) all[k++] = l[i];
  all.sort();
  const out: number[] = [];
  for (let i = n - 1; i >= 0; i--) if (i === n - 1 || all[i] !== all[i + 1]) out.push(all[i]);
  return out;
}

/**
 * Times, s, at which the level passes each depth of `rows` (descending from the initial depth
 * rows[0] to the stop rows[rows.length − 1]). Every outlet with cutoff ≤ the stop depth must
 * give flow > 0 above the stop.
 */
export function drainTimes(geom: VesselGeometry, outlets: OutletModel[], rows: number[]): number[] {
  const h0 = rows[0];
  const hs = rows[rows.length - 1];
  // Cutoffs closer than this to an end make no band of their own (a sliver of no volume).
  const eps = 1e-12 * Math.max(1, Math.abs(h0));
  const cuts = outlets.map((o) => o.cutoff).filter((c) => c > hs + eps && c < h0 - eps);
  const bounds = breakpoints([[h0, hs], cuts]);
  const bands: Band[] = [];
  for (let i = 0; i + 1 < bounds.length; i++)
    bands.push(makeBand(geom, outlets, bounds[i + 1], bounds[i], eps));
  const points = breakpoints([bounds, rows, geom.kinks(hs, h0)]);
  const times = new Array<number>(rows.length).fill(0);
  let t = 0;
  let r = 1;
  let b = 0;
  for (let i = 0; i + 1 < points.length; i++) {
    const lo = points[i + 1];
    while (bands[b].lo > lo) b++;
    const band = bands[b];
    const u0 = Math.sqrt(lo - band.c);
    const u1 = Math.sqrt(points[i] - band.c);
    if (u1 > u0) t += integrateRel(band.f, u0, u1, REL_TOL, 0, gk7);
    while (r < rows.length && rows[r] >= lo) times[r++] = t;
  }
  return times;
}
