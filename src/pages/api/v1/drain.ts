/** POST /api/v1/drain — drain-down of a vessel: time and level curve (API v1). */
import { v1Route } from '../../../lib/api/v1-routes';
import { astroRoute } from '../../../lib/api/web-request';

const route = v1Route('/api/v1/drain');

export const POST = astroRoute(route.POST);
export const OPTIONS = astroRoute(route.OPTIONS);
export const ALL = astroRoute(route.ALL);
