/**
 * CORS for the public API: any origin may call it from a browser. No credentials are involved
 * (the API sets and reads no cookies), so the wildcard origin is the right answer.
 */
import type { ApiAnswer } from './answer';

const SHARED: Record<string, string> = {
  'Access-Control-Allow-Origin': '*',
  'Access-Control-Expose-Headers': 'Retry-After, X-Request-Id',
};

/** Add the CORS headers to an answer. */
export function withCors(answer: ApiAnswer): ApiAnswer {
  Object.assign(answer.headers, SHARED);
  return answer;
}

/** Answer to a preflight OPTIONS request for a route allowing these methods. */
export function preflight(methods: readonly string[]): ApiAnswer {
  const allowed = [...methods, 'OPTIONS'].join(', ');
  return {
    status: 204,
    headers: {
      ...SHARED,
      Allow: allowed,
      'Access-Control-Allow-Methods': allowed,
      'Access-Control-Allow-Headers': 'Content-Type, X-Request-Id',
      'Access-Control-Max-Age': '86400',
    },
  };
}
