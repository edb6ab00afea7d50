/**
 * Starting values for a US crew are written in the units they read (50 ft, 1 in, 1 500 US gal)
 * and stored in SI like every input, through the same conversions as the fields (units.ts), so
 * each one shows as the round number it was written as.
 */
import { fromDisplay } from '../hydraulics/units';

/** Feet → m (lengths, elevations, depths). */
export const ft = (v: number): number => fromDisplay('length', v, 'us');
/** Inches → m (bores, holes). */
export const inch = (v: number): number => fromDisplay('diameter', v, 'us');
/** US gallons → m³. */
export const usGal = (v: number): number => fromDisplay('volume', v, 'us');
/** Square feet → m². */
export const ft2 = (v: number): number => fromDisplay('area', v, 'us');
/** °F → °C. */
export const degF = (v: number): number => fromDisplay('temperature', v, 'us');
/** psi (absolute) → Pa. */
export const psia = (v: number): number => fromDisplay('pressure', v, 'us');
