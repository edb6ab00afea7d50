/**
 * Vessel geometry: plan area A(h) and stored volume V(h) against liquid depth h above the
 * vessel's lowest point. SI throughout: h in m, A in m², V in m³. Functions clamp h to
 * 0 ≤ h ≤ maxDepth. Sources: elementary solid geometry (prism, cylinder, circular segment,
 * spherical cap, cone and frustum, prismoid), as tabulated in any engineering handbook.
 */
import { stageTable } from './stage-table';
import { EngineInputError } from './types';
import type { VesselInput } from './types';

export interface VesselGeometry {
  /** Depth of the full vessel, m. */
  maxDepth: number;
  /** Free-surface area at depth h, m². */
  area(h: number): number;
  /** Liquid volume at depth h, m³. */
  volume(h: number): number;
  /** Depths in (lo, hi) where A(h) is not smooth (cone knee, table rows), ascending. */
  kinks(lo: number, hi: number): number[];
}

/** A number that must be finite and > 0, or an EngineInputError naming the field. */
function positive(value: number, field: string): number {
  if (!(Number.isFinite(value) && value > 0)) {
    throw new EngineInputError(`vessel.${field}`, `${field} must be a number greater than 0`);
  }
  return value;
}

const noKinks = (): number[] => [];

/**
 * Prism of constant plan area a over depth d (box L·W, vertical cylinder πD²/4).
 * A = a, V = a·h.
 */
function prism(a: number, d: number): VesselGeometry {
  const c = (h: number): number => Math.min(Math.max(h, 0), d);
  return { maxDepth: d, area: () => a, volume: (h) => a * c(h), kinks: noKinks };
}

/**
 * Area of a circular segment of height x (0 ≤ x ≤ R) in a circle of radius R, m²:
 * S = (R²/2)(θ − sin θ), θ = 4·asin(√(x/2R)) (= 2·acos((R − x)/R), written so that it keeps its
 * precision for small x), θ − sin θ by its Taylor series below θ = 0.1 to avoid cancellation.
 * Source: circular segment, standard handbook geometry.
 */
function segmentArea(r: number, x: number): number {
  const theta = 4 * Math.asin(Math.sqrt(Math.min(1, x / (2 * r))));
  const t2 = theta * theta;
  const tms =
    theta < 0.1
      ? ((theta * t2) / 6) * (1 - (t2 / 20) * (1 - (t2 / 42) * (1 - t2 / 72)))
      : theta - Math.sin(theta);
  return 0.5 * r * r * tms;
}

/**
 * Horizontal cylinder with flat ends, diameter D = 2R, length L.
 * A = 2L·√(h(D − h)) (chord width × length); V = L·S(h) for h ≤ R and L·(πR² − S(D − h)) above,
 * S the circular segment ({@link segmentArea}). Valid 0 ≤ h ≤ D.
 * Source: circular segment, standard handbook geometry.
 */
function horizontalCylinder(d: number, l: number): VesselGeometry {
  const r = d / 2;
  const c = (h: number): number => Math.min(Math.max(h, 0), d);
  return {
    maxDepth: d,
    area: (h) => 2 * l * Math.sqrt(c(h) * (d - c(h))),
    volume(h) {
      const x = c(h);
      return l * (x <= r ? segmentArea(r, x) : Math.PI * r * r - segmentArea(r, d - x));
    },
    kinks: noKinks,
  };
}

/**
 * Sphere of diameter D = 2R. A = π·h·(D − h); V = π·h²·(3R − h)/3 (spherical cap).
 * Valid 0 ≤ h ≤ D. Source: spherical cap, standard handbook geometry.
 */
function sphere(d: number): VesselGeometry {
  const r = d / 2;
  const c = (h: number): number => Math.min(Math.max(h, 0), d);
  return {
    maxDepth: d,
    area: (h) => Math.PI * c(h) * (d - c(h)),
    volume: (h) => (Math.PI * c(h) ** 2 * (3 * r - c(h))) / 3,
    kinks: noKinks,
  };
}

/**
 * Vertical cylinder (diameter D) on a cone with its apex down (cone height Hc), total depth H.
 * h ≤ Hc: A = π(Rh/Hc)², V = πR²h³/(3Hc²) (cone); h > Hc: A = πR², V = πR²Hc/3 + πR²(h − Hc).
 * Valid 0 ≤ h ≤ H, H ≥ Hc. Source: volume of a cone, standard handbook geometry.
 */
function coneBottom(d: number, hc: number, depth: number): VesselGeometry {
  const a = (Math.PI * d * d) / 4;
  const c = (h: number): number => Math.min(Math.max(h, 0), depth);
  return {
    maxDepth: depth,
    area: (h) => (c(h) < hc ? a * (c(h) / hc) ** 2 : a),
    volume: (h) => (c(h) < hc ? (a * c(h) ** 3) / (3 * hc * hc) : (a * hc) / 3 + a * (c(h) - hc)),
    kinks: (lo, hi) => (hc > lo && hc < hi ? [hc] : []),
  };
}

/**
 * Pond with a rectangular bottom Lb × Wb and side slopes s (horizontal per vertical).
 * A = (Lb + 2sh)(Wb + 2sh); V = Lb·Wb·h + s(Lb + Wb)h² + (4/3)s²h³ (prismoidal formula, exact
 * for this solid). Valid 0 ≤ h ≤ depth, s ≥ 0. Source: prismoid volume, earthworks practice.
 */
function slopedPond(lb: number, wb: number, s: number, depth: number): VesselGeometry {
  const c = (h: number): number => Math.min(Math.max(h, 0), depth);
  return {
    maxDepth: depth,
    area: (h) => (lb + 2 * s * c(h)) * (wb + 2 * s * c(h)),
    volume(h) {
      const x = c(h);
      return lb * wb * x + s * (lb + wb) * x * x + (4 / 3) * s * s * x * x * x;
    },
    kinks: noKinks,
  };
}

function stage(points: { depth_m: number; area_m2: number }[]): VesselGeometry {
  const t = stageTable(points);
  return {
    maxDepth: t.maxDepth,
    area: t.area,
    volume: t.volume,
    kinks(lo, hi) {
      const out: number[] = [];
      for (let j = t.segment(lo) + 1; j < t.depths.length && t.depths[j] < hi; j++) {
        if (t.depths[j] > lo) out.push(t.depths[j]);
      }
      return out;
    },
  };
}

/** Geometry of any API v1 vessel; throws EngineInputError('vessel.…') on bad dimensions. */
export function vesselGeometry(v: VesselInput): VesselGeometry {
  switch (v.shape) {
    case 'box':
      return prism(
        positive(v.length_m, 'length_m') * positive(v.width_m, 'width_m'),
        positive(v.depth_m, 'depth_m'),
      );
    case 'vertical_cylinder':
      return prism(
        (Math.PI * positive(v.diameter_m, 'diameter_m') ** 2) / 4,
        positive(v.depth_m, 'depth_m'),
      );
    case 'horizontal_cylinder':
      return horizontalCylinder(
        positive(v.diameter_m, 'diameter_m'),
        positive(v.length_m, 'length_m'),
      );
    case 'sphere':
      return sphere(positive(v.diameter_m, 'diameter_m'));
    case 'cone_bottom': {
      const hc = positive(v.cone_height_m, 'cone_height_m');
      if (!(positive(v.depth_m, 'depth_m') >= hc)) {
        throw new EngineInputError('vessel.depth_m', 'depth_m must be at least the cone height');
      }
      return coneBottom(positive(v.diameter_m, 'diameter_m'), hc, v.depth_m);
    }
    case 'sloped_pond': {
      const s = v.side_slope_h_per_v;
      if (!(Number.isFinite(s) && s >= 0)) {
        throw new EngineInputError('vessel.side_slope_h_per_v', 'side slope must be 0 or more');
      }
      const lb = positive(v.bottom_length_m, 'bottom_length_m');
      return slopedPond(
        lb,
        positive(v.bottom_width_m, 'bottom_width_m'),
        s,
        positive(v.depth_m, 'depth_m'),
      );
    }
    case 'stage_table':
      return stage(v.points);
    default:
      throw new EngineInputError('vessel.shape', 'unknown vessel shape');
  }
}
