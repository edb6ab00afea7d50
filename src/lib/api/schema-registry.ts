/**
 * The API's own zod registry: request and response schemas register their component id and
 * field descriptions here, and the OpenAPI document is generated from it. A private registry
 * (not zod's global one) so that schemas elsewhere in the app never leak into the public document.
 */
import { z } from 'zod';

export interface ApiMeta {
  /** Component name in the OpenAPI document. */
  id?: string;
  description?: string;
}

export const apiRegistry = z.registry<ApiMeta>();

/** Attach a description (shown in the OpenAPI document) to a schema. */
export function described<T extends z.ZodType>(schema: T, description: string): T {
  apiRegistry.add(schema, { description });
  return schema;
}

/** Register a schema as a named component of the OpenAPI document. */
export function component<T extends z.ZodType>(schema: T, id: string, description: string): T {
  apiRegistry.add(schema, { id, description });
  return schema;
}
