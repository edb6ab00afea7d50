/** GET /api/v1/catalog — materials, fittings and sizes with their sources (API v1). */
import { v1Route } from '../../../lib/api/v1-routes';
import { astroRoute } from '../../../lib/api/web-request';

const route = v1Route('/api/v1/catalog');

export const GET = astroRoute(route.GET);
export const HEAD = GET;
export const OPTIONS = astroRoute(route.OPTIONS);
export const ALL = astroRoute(route.ALL);
