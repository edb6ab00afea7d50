/**
 * Any other path under /api/v1/: a JSON 404 in the API's error shape instead of the site's HTML
 * page. Astro ranks the six named routes above this catch-all.
 */
import { v1NotFound } from '../../../lib/api/v1-routes';
import { astroRoute } from '../../../lib/api/web-request';

export const ALL = astroRoute(v1NotFound);
