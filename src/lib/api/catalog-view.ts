/**
 * GET /api/v1/catalog: the engine catalogue in the fields API v1 lists, built once.
 */
import { fittings, materials, sizes } from '../hydraulics/catalog';

export interface CatalogAnswer {
  materials: { id: string; name: string; roughness_m: number; source: string }[];
  fittings: { id: string; name: string; k: number; source: string }[];
  sizes: { id: string; name: string; inner_diameter_m: number; source: string }[];
}

let cached: CatalogAnswer | undefined;

export function catalogAnswer(): CatalogAnswer {
  cached ??= {
    materials: materials.map(({ id, name, roughness_m, source }) => ({
      id,
      name,
      roughness_m,
      source,
    })),
    fittings: fittings.map(({ id, name, k, source }) => ({ id, name, k, source })),
    sizes: sizes.map(({ id, name, inner_diameter_m, source }) => ({
      id,
      name,
      inner_diameter_m,
      source,
    })),
  };
  return cached;
}
