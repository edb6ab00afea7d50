/** GET /api/v1/openapi.json — the OpenAPI 3.1 document, generated from the request schemas. */
import { v1Route } from '../../../lib/api/v1-routes';
import { astroRoute } from '../../../lib/api/web-request';

const route = v1Route('/api/v1/openapi.json');

export const GET = astroRoute(route.GET);
export const HEAD = GET;
export const OPTIONS = astroRoute(route.OPTIONS);
export const ALL = astroRoute(route.ALL);
