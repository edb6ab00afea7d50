/**
 * The operations of API v1 (../shared/api-v1.md), over plain data: each parses with its zod
 * schema, returns early with the error answer, then calls the engine.
 */
import type { z } from 'zod';
import { getConfig } from '../config';
import { solveDrain, solveLine, solveSiphon } from '../hydraulics';
import type { ApiOperation } from './answer';
import { jsonAnswer } from './answer';
import { withJsonBody } from './body';
import { catalogAnswer } from './catalog-view';
import { errorAnswer, invalidInputBody } from './errors';
import { answer, guarded } from './guard';
import { issueAt } from './issues';
import { openApiDocument } from './openapi';
import { drainRequestSchema } from './schemas-drain';
import { lineRequestSchema, siphonRequestSchema, waterQuerySchema } from './schemas-requests';
import { queryObject, waterAnswer } from './water-view';

/** POST with a JSON body checked by `schema`, answered by `solve`. */
function jsonPost<S extends z.ZodType>(
  schema: S,
  solve: (input: z.output<S>) => unknown,
): ApiOperation {
  return guarded((request) =>
    withJsonBody(request, (value) => {
      const parsed = schema.safeParse(value);
      if (!parsed.success) return jsonAnswer(400, invalidInputBody(parsed.error, value));
      return answer(request, () => solve(parsed.data));
    }),
  );
}

/** POST /api/v1/siphon — siphon: flow, crest pressure and verdict. */
export const siphonOperation = jsonPost(siphonRequestSchema, solveSiphon);

/** POST /api/v1/line — gravity line: steady flow and losses. */
export const lineOperation = jsonPost(lineRequestSchema, solveLine);

/** POST /api/v1/drain — drain-down of a vessel: time and level curve. */
export const drainOperation = jsonPost(drainRequestSchema, solveDrain);

/** GET /api/v1/water?temperature_c=T&altitude_m=z — water properties and air pressure. */
export const waterOperation = guarded((request) => {
  const query = queryObject(request.url.searchParams);
  if (query.repeated) {
    return errorAnswer(400, 'invalid_input', [issueAt(query.repeated, 'is given more than once')]);
  }
  const parsed = waterQuerySchema.safeParse(query.value);
  if (!parsed.success) return jsonAnswer(400, invalidInputBody(parsed.error, query.value));
  return answer(request, () => waterAnswer(parsed.data.temperature_c, parsed.data.altitude_m));
});

const CACHEABLE = { 'Cache-Control': 'public, max-age=300' };

/** GET /api/v1/catalog — materials, fittings and sizes with their sources. */
export const catalogOperation = guarded(() => jsonAnswer(200, catalogAnswer(), CACHEABLE));

/**
 * GET /api/v1/openapi.json — the OpenAPI 3.1 document, generated from the request schemas. Its
 * server URL is the configured public origin, never the request's Host header.
 */
export const openApiOperation = guarded(() =>
  jsonAnswer(200, openApiDocument(new URL(getConfig().publicUrl).origin), CACHEABLE),
);
