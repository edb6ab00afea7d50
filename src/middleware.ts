import { defineMiddleware } from 'astro:middleware';
import { guard } from './lib/auth/guard';
import { refuseCrossSiteForm } from './lib/api/origin-check';
import { requestIdFor } from './lib/server/request-id';

/**
 * Runs once per request. Tags each request with an id (echoed as X-Request-Id so a user's report
 * can be matched to the logs), then enforces the route table (src/lib/auth/routes.ts): who is
 * asking is looked up only where the table needs it. Prerendered pages are built once and skip
 * all of this.
 */
export const onRequest = defineMiddleware(async (context, next) => {
  if (context.isPrerendered) return next();
  // The production server has already set this header (src/lib/server/access-log.ts).
  context.locals.requestId = requestIdFor(context.request.headers.get('x-request-id'));
  context.locals.user = null;
  context.locals.organisation = null;
  context.locals.role = null;
  // Astro's cross-site form check, done here so that /api/v1/ is left out (see origin-check.ts).
  const response =
    refuseCrossSiteForm(context.request, context.url) ?? guard(context) ?? (await next());
  try {
    response.headers.set('X-Request-Id', context.locals.requestId);
    return response;
  } catch {
    // Response.redirect() (used by Auth.js) has immutable headers: answer with a copy.
    const copy = new Response(response.body, response);
    copy.headers.set('X-Request-Id', context.locals.requestId);
    return copy;
  }
});
