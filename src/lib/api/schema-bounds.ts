/**
 * Bounds of API v1 numbers beyond the spec's own ranges. Each is wider than any site, pond or
 * liquid a crew meets, and narrow enough that every answer the engine gives inside them is a
 * finite number, so a request either computes or gets a 400 naming the field. The reason for
 * each bound is beside it.
 */

/**
 * |elevation or level| ≤ 20 000 m above the caller's datum: the whole relief of the Earth spans
 * under 20 km (Everest about 8 849 m, the deepest ocean trench about −10 935 m; from memory), so
 * any datum a crew picks on site leaves every level inside this.
 */
export const LEVEL_MAX_ABS_M = 20_000;

/**
 * Density 100–20 000 kg/m³: liquids at site conditions lie between about 600 (light
 * hydrocarbons) and 13 546 (mercury at 20 °C; from memory).
 */
export const DENSITY_MIN_KG_M3 = 100;
export const DENSITY_MAX_KG_M3 = 20_000;

/**
 * Dynamic viscosity 1e-5–1000 Pa·s: the thinnest liquids are near 2e-4 (acetone; water 1e-3) and
 * anything above 1000 (stiffer than cold bitumen emulsions and heavy greases; from memory) does not
 * drain through a hose in days.
 */
export const VISCOSITY_MIN_PA_S = 1e-5;
export const VISCOSITY_MAX_PA_S = 1000;

/**
 * Vapour pressure and crest limits ≤ 110 000 Pa: the highest site pressure the API accepts. A
 * liquid whose vapour pressure is above it boils at any accepted site, and a crest at or above its
 * source never holds more than the atmosphere.
 */
export const PRESSURE_MAX_PA = 110_000;

/**
 * Inside diameter ≥ 0.1 mm: finer than any hose, pipe or capillary used to move water; the spec's
 * upper bound (5 m) stays.
 */
export const BORE_MIN_M = 1e-4;

/**
 * Loss coefficients (fittings, entrance, to the crest) ≤ 10 000: a valve nearly shut has K in
 * the hundreds to low thousands (common practice).
 */
export const K_MAX = 10_000;

/** Fittings of one kind in one line, and identical orifices: at most 10 000. */
export const COUNT_MAX = 10_000;

/**
 * Vessel dimensions and depths 1 mm–10 km: a pond or basin drained through a hose is far smaller
 * than 10 km, and a vessel under a millimetre holds nothing to drain.
 */
export const SIZE_MIN_M = 1e-3;
export const SIZE_MAX_M = 10_000;

/** Stage-table area ≤ 1e8 m²: the 10 km × 10 km of {@link SIZE_MAX_M}. */
export const AREA_MAX_M2 = 1e8;

/** Side slope ≤ 100 horizontal per vertical: flatter banks than that are a beach, not a pond. */
export const SIDE_SLOPE_MAX = 100;

/**
 * Discharge coefficient ≥ 0.1: real openings lie between about 0.5 (re-entrant tube) and 1
 * (rounded nozzle); 0.1 leaves room for a partly blocked one (common practice).
 */
export const CD_MIN = 0.1;
