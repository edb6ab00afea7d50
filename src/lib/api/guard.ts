/**
 * The envelope every API v1 handler runs in: CORS on every answer, the rate limit, and no
 * unexpected error ever leaving as a 500 or a stack trace. Engine failures are logged with the
 * request id and answered 422 `cannot_compute`, a code valid input must never produce: the tests
 * assert that, so engine bugs still show.
 */
import type { APIContext, APIRoute } from 'astro';
import { EngineInputError } from '../hydraulics/types';
import { logger } from '../server/logger';
import { logPath } from '../server/redact';
import { withCors } from './cors';
import { cannotCompute, invalidInput } from './errors';
import { allFinite } from './finite-result';
import { issueAt } from './issues';
import { checkRateLimit } from './rate-limit';

/** The address the limit counts against (Astro: first X-Forwarded-For entry, else the socket). */
export function clientKey(context: APIContext): string {
  try {
    return context.clientAddress || 'unknown';
  } catch {
    return 'unknown';
  }
}

function logUnexpected(context: APIContext, error: unknown): void {
  logger.error(
    {
      reqId: context.locals?.requestId,
      err: error,
      method: context.request.method,
      path: logPath(context.url.pathname),
    },
    'api handler failed',
  );
}

/** Wrap a handler: rate limit first, CORS always, and a JSON 422 instead of any thrown error. */
export function guarded(handler: APIRoute, options: { limited?: boolean } = {}): APIRoute {
  return async (context) => {
    try {
      if (options.limited !== false) {
        const refused = await checkRateLimit(clientKey(context));
        if (refused) return withCors(refused);
      }
      const response = await handler(context);
      if (!response.headers.has('Cache-Control')) response.headers.set('Cache-Control', 'no-store');
      return withCors(response);
    } catch (error) {
      logUnexpected(context, error);
      return withCors(cannotCompute(context.locals?.requestId));
    }
  };
}

/**
 * Run an engine call and answer it: 200 with the result, 400 naming the field the engine
 * rejected, or 422 when the engine throws anything else or returns a non-finite number.
 */
export function answer(context: APIContext, compute: () => unknown): Response {
  let result: unknown;
  try {
    result = compute();
  } catch (error) {
    if (error instanceof EngineInputError)
      return invalidInput([issueAt(error.path, error.message)]);
    logUnexpected(context, error);
    return cannotCompute(context.locals?.requestId);
  }
  if (!allFinite(result)) {
    logUnexpected(context, new Error('engine result has a non-finite number'));
    return cannotCompute(context.locals?.requestId);
  }
  return Response.json(result, { status: 200, headers: { 'Cache-Control': 'no-store' } });
}
