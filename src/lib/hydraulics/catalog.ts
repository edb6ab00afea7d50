/**
 * The catalogue: materials (roughness), fittings (K) and hose/pipe sizes (inside diameter), each
 * value with its source. Split by concern into three files; this module is the one to import.
 */

export type { Material } from './catalog-materials';
export { materials, findMaterial } from './catalog-materials';
export type { Fitting, FittingKind } from './catalog-fittings';
export { fittings, findFitting, CRANE_FT_2IN } from './catalog-fittings';
export type { PipeSize, SizeFamily } from './catalog-sizes';
export { sizes, findSize } from './catalog-sizes';
