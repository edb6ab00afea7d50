import { defineMiddleware } from 'astro:middleware';
import { randomUUID } from 'node:crypto';

/**
 * Runs once per request. Tags each request with an id (echoed as X-Request-Id so a user's report
 * can be matched to the logs). Prerendered pages are built once and skip all of this.
 */
export const onRequest = defineMiddleware(async (context, next) => {
  if (context.isPrerendered) return next();
  const given = context.request.headers.get('x-request-id');
  context.locals.requestId = given && /^[\w-]{1,64}$/.test(given) ? given : randomUUID();
  const response = await next();
  response.headers.set('X-Request-Id', context.locals.requestId);
  return response;
});
