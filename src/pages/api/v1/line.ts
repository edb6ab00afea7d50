/** POST /api/v1/line — gravity line: steady flow and losses (API v1). */
import { v1Route } from '../../../lib/api/v1-routes';
import { astroRoute } from '../../../lib/api/web-request';

const route = v1Route('/api/v1/line');

export const POST = astroRoute(route.POST);
export const OPTIONS = astroRoute(route.OPTIONS);
export const ALL = astroRoute(route.ALL);
