/**
 * Error answers of API v1. All share one shape, `{ error, issues: [{ path, message }] }`, and
 * none carries a stack trace or internal detail.
 */
import type { z } from 'zod';
import type { ApiAnswer } from './answer';
import { jsonAnswer } from './answer';
import type { ApiErrorCode, ApiIssue } from './schemas-responses';
import { issueAt, toApiIssues } from './issues';

/** A JSON error answer. */
export function errorAnswer(
  status: number,
  error: ApiErrorCode,
  issues: ApiIssue[],
  headers: Record<string, string> = {},
): ApiAnswer {
  return jsonAnswer(status, { error, issues }, { 'Cache-Control': 'no-store', ...headers });
}

/** 400: the request is not an input the API can compute with. */
export function invalidInput(issues: ApiIssue[]): ApiAnswer {
  return errorAnswer(400, 'invalid_input', issues);
}

/** Body of the 400 answer for a request that failed its zod schema. */
export function invalidInputBody(
  error: z.ZodError,
  data: unknown,
): { error: 'invalid_input'; issues: ApiIssue[] } {
  return { error: 'invalid_input', issues: toApiIssues(error.issues, data) };
}

/** 400 for a problem with the body as a whole (not JSON, too deep, empty). */
export function invalidBody(message: string): ApiAnswer {
  return invalidInput([issueAt('', message)]);
}

export function methodNotAllowed(allowed: readonly string[]): ApiAnswer {
  const allow = [...allowed, 'OPTIONS'].join(', ');
  return errorAnswer(
    405,
    'method_not_allowed',
    [issueAt('', `this address answers ${allow} only`)],
    { Allow: allow },
  );
}

/** 404 for a path under /api/v1/ that is no route (the spec names none; same shape as the rest). */
export function notFound(): ApiAnswer {
  return errorAnswer(404, 'not_found', [
    issueAt('', 'there is no API v1 route at this path; see GET /api/v1/openapi.json'),
  ]);
}

export function payloadTooLarge(limitBytes: number): ApiAnswer {
  return errorAnswer(413, 'payload_too_large', [
    issueAt('', `the body is larger than ${limitBytes / 1024} KiB`),
  ]);
}

export function unsupportedMediaType(): ApiAnswer {
  return errorAnswer(415, 'unsupported_media_type', [
    issueAt('', 'send the body as JSON with Content-Type: application/json (UTF-8)'),
  ]);
}

export function rateLimited(retryAfterS: number): ApiAnswer {
  return errorAnswer(
    429,
    'rate_limited',
    [issueAt('', `too many requests from this address; try again in ${retryAfterS} s`)],
    { 'Retry-After': String(retryAfterS) },
  );
}

/**
 * 400 for inputs that passed every check yet give no finite result (the spec allows no other
 * status for input). The schema's bounds are meant to make this unreachable: it is logged
 * server-side with the request id, and no detail leaves the server.
 */
export function noFiniteResult(requestId?: string): ApiAnswer {
  const ref = requestId ? ` (request ${requestId})` : '';
  return invalidInput([
    issueAt('', `these inputs give no finite result${ref}; check the figures or report it`),
  ]);
}
