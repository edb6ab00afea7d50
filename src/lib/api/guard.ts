/**
 * The envelope every API v1 handler runs in: CORS on every answer, the rate limit, and no
 * unexpected error ever leaving as a 500 or a stack trace. Engine failures are logged with the
 * request id and answered 422 `cannot_compute`, a code valid input must never produce: the tests
 * assert that, so engine bugs still show.
 */
import { EngineInputError } from '../hydraulics/types';
import { logger } from '../server/logger';
import { logPath } from '../server/redact';
import type { ApiAnswer, ApiOperation, ApiRequest } from './answer';
import { jsonAnswer } from './answer';
import { withCors } from './cors';
import { cannotCompute, invalidInput } from './errors';
import { allFinite } from './finite-result';
import { issueAt } from './issues';
import { checkRateLimit } from './rate-limit';

function logUnexpected(request: ApiRequest, error: unknown): void {
  logger.error(
    {
      reqId: request.requestId,
      err: error,
      method: request.method,
      path: logPath(request.url.pathname),
    },
    'api handler failed',
  );
}

/** Wrap a handler: rate limit first, CORS always, and a JSON 422 instead of any thrown error. */
export function guarded(handler: ApiOperation, options: { limited?: boolean } = {}): ApiOperation {
  return async (request) => {
    try {
      if (options.limited !== false) {
        const refused = await checkRateLimit(request.clientAddress);
        if (refused) return withCors(refused);
      }
      const answer = await handler(request);
      answer.headers['Cache-Control'] ??= 'no-store';
      return withCors(answer);
    } catch (error) {
      logUnexpected(request, error);
      return withCors(cannotCompute(request.requestId));
    }
  };
}

/**
 * Run an engine call and answer it: 200 with the result, 400 naming the field the engine
 * rejected, or 422 when the engine throws anything else or returns a non-finite number.
 */
export function answer(request: ApiRequest, compute: () => unknown): ApiAnswer {
  let result: unknown;
  try {
    result = compute();
  } catch (error) {
    if (error instanceof EngineInputError)
      return invalidInput([issueAt(error.path, error.message)]);
    logUnexpected(request, error);
    return cannotCompute(request.requestId);
  }
  if (!allFinite(result)) {
    logUnexpected(request, new Error('engine result has a non-finite number'));
    return cannotCompute(request.requestId);
  }
  return jsonAnswer(200, result, { 'Cache-Control': 'no-store' });
}
