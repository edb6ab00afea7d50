/**
 * A line's input turned into numbers: API v1 defaults and ranges applied, catalogue materials and
 * fittings looked up.
 */
import type { LineInput, Regime } from './types';
import { EngineInputError } from './types';
import { findFitting, findMaterial } from './catalog';
import { colebrookWhite, RE_TURBULENT_MIN } from './friction';

/** A line with every default applied and every catalogue id looked up (SI). */
export interface ResolvedLine {
  diameterM: number;
  lengthM: number;
  roughnessM: number;
  relativeRoughness: number;
  /** ΣK of fittings along the line (minor_loss_k plus catalogue fittings), entrance and exit excluded. */
  fittingsK: number;
  entranceK: number;
  parallel: number;
  /** Bore area of one line, m². */
  areaM2: number;
  /** 1 + entrance K + ΣK: every loss that scales with V²/2g apart from friction. */
  kMinorTotal: number;
  /** L/D. */
  lengthOverD: number;
  /** Colebrook–White f at Re = 4000 for this ε/D (end of the transition rule). */
  f4000: number;
}

/** Steady flow state of one resolved line at one head. */
export interface LineState {
  /** Mean velocity in one line, m/s. */
  velocityMS: number;
  /** Flow of all parallel lines together, m³/s. */
  flowM3S: number;
  reynolds: number;
  frictionFactor: number;
  regime: Regime;
}

/** Longest line API v1 accepts, m. */
export const MAX_LINE_LENGTH_M = 100_000;

const num = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

export function field(v: unknown, path: string, ok: (x: number) => boolean, rule: string): number {
  if (!num(v) || !ok(v)) throw new EngineInputError(path, `must be ${rule}`);
  return v;
}

function roughnessOf(line: LineInput, d: number, path: string): number {
  const hasR = line.roughness_m !== undefined;
  if (hasR === (line.material !== undefined)) {
    throw new EngineInputError(path, 'give exactly one of roughness_m or material');
  }
  if (hasR)
    return field(
      line.roughness_m,
      `${path}.roughness_m`,
      (x) => x >= 0 && x < d,
      '≥ 0 and less than the inner diameter',
    );
  const m = typeof line.material === 'string' ? findMaterial(line.material) : undefined;
  if (!m) throw new EngineInputError(`${path}.material`, 'is not a material in the catalogue');
  return m.roughness_m;
}

function fittingsKOf(line: LineInput, path: string): number {
  let k =
    line.minor_loss_k === undefined
      ? 0
      : field(line.minor_loss_k, `${path}.minor_loss_k`, (x) => x >= 0, '≥ 0');
  if (line.fittings === undefined) return k;
  if (!Array.isArray(line.fittings))
    throw new EngineInputError(`${path}.fittings`, 'must be a list');
  line.fittings.forEach((item, i) => {
    const p = `${path}.fittings.${i}`;
    const fit = item && typeof item.id === 'string' ? findFitting(item.id) : undefined;
    if (!fit) throw new EngineInputError(`${p}.id`, 'is not a fitting in the catalogue');
    if (fit.kind !== 'fitting') {
      throw new EngineInputError(
        `${p}.id`,
        `is an ${fit.kind}; entrances go in entrance_k and the exit is already counted`,
      );
    }
    k +=
      fit.k *
      field(item.count, `${p}.count`, (x) => Number.isInteger(x) && x >= 1, 'an integer ≥ 1');
  });
  return k;
}

/**
 * Apply API v1 defaults and ranges to a line and look up its catalogue ids.
 * @param path dotted path of the line in the request, for error messages.
 * @throws EngineInputError naming the offending field.
 */
export function resolveLine(line: LineInput, path = 'line'): ResolvedLine {
  if (!line || typeof line !== 'object') throw new EngineInputError(path, 'is required');
  const d = field(
    line.inner_diameter_m,
    `${path}.inner_diameter_m`,
    (x) => x > 0 && x <= 5,
    '> 0 and ≤ 5 m',
  );
  const l = field(
    line.length_m,
    `${path}.length_m`,
    (x) => x >= 0 && x <= MAX_LINE_LENGTH_M,
    'between 0 and 100 000 m',
  );
  const eps = roughnessOf(line, d, path);
  const fittingsK = fittingsKOf(line, path);
  const entranceK =
    line.entrance_k === undefined
      ? 0.5
      : field(line.entrance_k, `${path}.entrance_k`, (x) => x >= 0, '≥ 0');
  const parallel =
    line.parallel_lines === undefined
      ? 1
      : field(
          line.parallel_lines,
          `${path}.parallel_lines`,
          (x) => Number.isInteger(x) && x >= 1 && x <= 50,
          'an integer from 1 to 50',
        );
  const rr = eps / d;
  return {
    diameterM: d,
    lengthM: l,
    roughnessM: eps,
    relativeRoughness: rr,
    fittingsK,
    entranceK,
    parallel,
    areaM2: (Math.PI * d * d) / 4,
    kMinorTotal: 1 + entranceK + fittingsK,
    lengthOverD: l / d,
    f4000: colebrookWhite(RE_TURBULENT_MIN, rr),
  };
}
