/**
 * A vessel given as a depth–area table (stage–area curve), area linear between rows.
 *
 * Volume is the exact integral of the piecewise-linear area (trapezoid rule per segment, plus
 * the quadratic term inside a segment). Lookups use a cached segment index, falling back to a
 * binary search, because the drain integrator walks the table in order and tables run to 1000 rows.
 */
import { EngineInputError } from './types';

export interface StagePoint {
  depth_m: number;
  area_m2: number;
}

export interface StageTable {
  maxDepth: number;
  /** Segment index j with depths[j] ≤ h ≤ depths[j+1] (h clamped to the table). */
  segment(h: number): number;
  area(h: number): number;
  volume(h: number): number;
  /** Row depths, m (ascending, first 0). */
  depths: Float64Array;
}

/** Checks the table's rules: 2–1000 rows, depth strictly increasing from 0, finite area > 0. */
function validateStagePoints(points: StagePoint[]): void {
  if (!Array.isArray(points) || points.length < 2 || points.length > 1000) {
    throw new EngineInputError('vessel.points', 'a depth–area table needs 2 to 1000 rows');
  }
  for (let i = 0; i < points.length; i++) {
    const p = points[i];
    const problem = rowProblem(p, i === 0 ? undefined : points[i - 1]);
    if (problem) throw new EngineInputError(`vessel.points.${i}.${problem[0]}`, problem[1]);
  }
}

/** What is wrong with one row, as [field, message], or null (no strings built for good rows). */
function rowProblem(p: StagePoint, prev: StagePoint | undefined): [string, string] | null {
  if (!p || typeof p.depth_m !== 'number' || !Number.isFinite(p.depth_m)) {
    return ['depth_m', 'must be a number'];
  }
  if (!(typeof p.area_m2 === 'number' && Number.isFinite(p.area_m2) && p.area_m2 > 0)) {
    return ['area_m2', 'area must be greater than 0'];
  }
  if (!prev && p.depth_m !== 0) return ['depth_m', 'the first row must be at depth 0'];
  if (prev && !(p.depth_m > prev.depth_m)) {
    return ['depth_m', 'depths must increase strictly row by row'];
  }
  return null;
}

/**
 * Builds the lookup for a stage table.
 *
 * A(h) = A_j + (A_{j+1} − A_j)(h − d_j)/(d_{j+1} − d_j) for d_j ≤ h ≤ d_{j+1};
 * V(h) = V_j + A_j·s + ½·m·s², s = h − d_j, m the segment's slope (exact for linear area).
 * Units: depth m, area m², volume m³. Valid for 0 ≤ h ≤ last depth (h is clamped).
 * Source: elementary integration of a piecewise-linear function.
 */
export function stageTable(points: StagePoint[]): StageTable {
  validateStagePoints(points);
  const n = points.length;
  const depths = new Float64Array(n);
  const areas = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    depths[j] = points[j].depth_m;
    areas[j] = points[j].area_m2;
  }
  const slopes = new Float64Array(n - 1);
  const volumes = new Float64Array(n);
  for (let j = 0; j < n - 1; j++) {
    const dh = depths[j + 1] - depths[j];
    slopes[j] = (areas[j + 1] - areas[j]) / dh;
    volumes[j + 1] = volumes[j] + 0.5 * (areas[j] + areas[j + 1]) * dh;
  }
  const maxDepth = depths[n - 1];
  let cached = 0;
  const segment = (h: number): number => {
    if (h >= depths[cached] && h <= depths[cached + 1]) return cached;
    let lo = 0;
    let hi = n - 2;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (depths[mid] <= h) lo = mid;
      else hi = mid - 1;
    }
    cached = lo;
    return lo;
  };
  const clamp = (h: number): number => Math.min(Math.max(h, 0), maxDepth);
  return {
    maxDepth,
    depths,
    segment: (h) => segment(clamp(h)),
    area(h) {
      const x = clamp(h);
      const j = segment(x);
      return areas[j] + slopes[j] * (x - depths[j]);
    },
    volume(h) {
      const x = clamp(h);
      const j = segment(x);
      const s = x - depths[j];
      return volumes[j] + areas[j] * s + 0.5 * slopes[j] * s * s;
    },
  };
}
