/**
 * The method plumbing of every API v1 route: OPTIONS answers the CORS preflight, and ALL (which
 * Astro calls for any method the route does not export) answers 405 with an Allow header.
 */
import type { APIRoute } from 'astro';
import { preflight, withCors } from './cors';
import { methodNotAllowed } from './errors';

/** `export const OPTIONS = preflightRoute(['POST'])`. */
export function preflightRoute(methods: readonly string[]): APIRoute {
  return () => preflight(methods);
}

/** `export const ALL = methodNotAllowedRoute(['POST'])`. */
export function methodNotAllowedRoute(methods: readonly string[]): APIRoute {
  return () => withCors(methodNotAllowed(methods));
}
