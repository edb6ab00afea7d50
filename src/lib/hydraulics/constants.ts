/** Standard acceleration of gravity, m/s² (exact, CGPM 1901; also the API v1 value). */
export const G = 9.80665;

/** Standard sea-level atmospheric pressure, Pa (exact, US Standard Atmosphere 1976). */
export const P_SEA_LEVEL = 101_325;

/** Zero of the Celsius scale in kelvin (exact). */
export const KELVIN_OFFSET = 273.15;

/**
 * Version of the engine's numbers. Bump the minor on any change that moves a result, so saved and
 * flagged calculations can say which engine produced them.
 */
export const ENGINE_VERSION = '1.0.0';
