/** GET /api/v1/catalog — materials, fittings and sizes with their sources (API v1). */
import type { APIRoute } from 'astro';
import { catalogAnswer } from '../../../lib/api/catalog-view';
import { guarded } from '../../../lib/api/guard';
import { methodNotAllowedRoute, preflightRoute } from '../../../lib/api/method-routes';

export const GET: APIRoute = guarded(() =>
  Response.json(catalogAnswer(), { headers: { 'Cache-Control': 'public, max-age=300' } }),
);

export const HEAD = GET;
export const OPTIONS = preflightRoute(['GET', 'HEAD']);
export const ALL = methodNotAllowedRoute(['GET', 'HEAD']);
