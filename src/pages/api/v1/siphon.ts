/** POST /api/v1/siphon — siphon: flow, crest pressure and verdict (API v1). */
import { v1Route } from '../../../lib/api/v1-routes';
import { astroRoute } from '../../../lib/api/web-request';

const route = v1Route('/api/v1/siphon');

export const POST = astroRoute(route.POST);
export const OPTIONS = astroRoute(route.OPTIONS);
export const ALL = astroRoute(route.ALL);
