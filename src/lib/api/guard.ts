/**
 * The envelope every API v1 handler runs in: CORS on every answer, the rate limit, and no
 * unexpected error ever leaving as a 500 or a stack trace. Engine failures are logged with the
 * request id and answered 400 `invalid_input` with the issue "these inputs give no finite
 * result", which in-range input must never produce: the tests assert that, so engine bugs still
 * show.
 */
import { EngineInputError } from '../hydraulics/types';
import { logger } from '../server/logger';
import { logPath } from '../server/redact';
import type { ApiAnswer, ApiOperation, ApiRequest } from './answer';
import { jsonAnswer } from './answer';
import { withCors } from './cors';
import { invalidInput, noFiniteResult } from './errors';
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

function failure(request: ApiRequest, error: unknown): ApiAnswer {
  logUnexpected(request, error);
  return withCors(noFiniteResult(request.requestId));
}

/** An answer with the no-store default and CORS. */
function finish(answer: ApiAnswer): ApiAnswer {
  answer.headers['Cache-Control'] ??= 'no-store';
  return withCors(answer);
}

/** A handler's answer, finished; any thrown error becomes the no-finite-result 400. */
function settle(request: ApiRequest, handler: ApiOperation): ApiAnswer | Promise<ApiAnswer> {
  try {
    const answer = handler(request);
    if (!(answer instanceof Promise)) return finish(answer);
    return answer.then(finish, (error: unknown) => failure(request, error));
  } catch (error) {
    return failure(request, error);
  }
}

/**
 * Wrap a handler: rate limit first, CORS always, and a JSON 400 instead of any thrown error.
 * Synchronous whenever the handler and the limit are, so the short path adds no promise.
 */
export function guarded(handler: ApiOperation): ApiOperation {
  return (request) => {
    let limit: ReturnType<typeof checkRateLimit>;
    try {
      limit = checkRateLimit(request.clientAddress);
    } catch (error) {
      return failure(request, error);
    }
    if (limit === null) return settle(request, handler);
    return limit.then(
      (refused) => (refused ? withCors(refused) : settle(request, handler)),
      (error: unknown) => failure(request, error),
    );
  };
}

/**
 * Run an engine call and answer it: 200 with the result, 400 naming the field the engine
 * rejected, or the no-finite-result 400 when the engine throws anything else or returns a
 * non-finite number.
 */
export function answer(request: ApiRequest, compute: () => unknown): ApiAnswer {
  let result: unknown;
  try {
    result = compute();
  } catch (error) {
    if (error instanceof EngineInputError)
      return invalidInput([issueAt(error.path, error.message)]);
    logUnexpected(request, error);
    return noFiniteResult(request.requestId);
  }
  if (!allFinite(result)) {
    logUnexpected(request, new Error('engine result has a non-finite number'));
    return noFiniteResult(request.requestId);
  }
  return jsonAnswer(200, result, { 'Cache-Control': 'no-store' });
}
