/**
 * The routes of API v1: path → the operation for each method. OPTIONS answers the CORS
 * preflight and any other method 405 with an Allow header, as the spec requires. Read by the
 * Astro endpoints in src/pages/api/v1 and by the production server's short path alike.
 */
import type { ApiOperation } from './answer';
import { preflight, withCors } from './cors';
import { methodNotAllowed, notFound } from './errors';
import {
  catalogOperation,
  drainOperation,
  lineOperation,
  openApiOperation,
  siphonOperation,
  waterOperation,
} from './v1-operations';

/** A route's operations by method, with OPTIONS (preflight) and ALL (405) added. */
export type V1Route = Record<string, ApiOperation> & { OPTIONS: ApiOperation; ALL: ApiOperation };

function route(methods: Record<string, ApiOperation>): V1Route {
  const allowed = Object.keys(methods);
  return {
    ...methods,
    OPTIONS: () => preflight(allowed),
    ALL: () => withCors(methodNotAllowed(allowed)),
  };
}

const post = (op: ApiOperation): V1Route => route({ POST: op });
const get = (op: ApiOperation): V1Route => route({ GET: op, HEAD: op });

const ROUTES: Record<string, V1Route> = {
  '/api/v1/siphon': post(siphonOperation),
  '/api/v1/line': post(lineOperation),
  '/api/v1/drain': post(drainOperation),
  '/api/v1/water': get(waterOperation),
  '/api/v1/catalog': get(catalogOperation),
  '/api/v1/openapi.json': get(openApiOperation),
};

/** The route at `path` (one of the six v1 paths). */
export function v1Route(path: keyof typeof ROUTES): V1Route {
  return ROUTES[path];
}

/** The operation answering `method` on `path`, or undefined when the path is not an API route. */
export function v1Operation(path: string, method: string): ApiOperation | undefined {
  const found = Object.hasOwn(ROUTES, path) ? ROUTES[path] : undefined;
  return found && (found[method] ?? found.ALL);
}

/** Any method on a path under /api/v1/ that is none of the routes: the JSON 404, with CORS. */
export const v1NotFound: ApiOperation = () => withCors(notFound());
