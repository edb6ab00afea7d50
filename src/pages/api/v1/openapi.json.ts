/** GET /api/v1/openapi.json — the OpenAPI 3.1 document, generated from the request schemas. */
import type { APIRoute } from 'astro';
import { guarded } from '../../../lib/api/guard';
import { methodNotAllowedRoute, preflightRoute } from '../../../lib/api/method-routes';
import { openApiDocument } from '../../../lib/api/openapi';

export const GET: APIRoute = guarded((context) =>
  Response.json(openApiDocument(context.url.origin), {
    headers: { 'Cache-Control': 'public, max-age=300' },
  }),
);

export const HEAD = GET;
export const OPTIONS = preflightRoute(['GET', 'HEAD']);
export const ALL = methodNotAllowedRoute(['GET', 'HEAD']);
