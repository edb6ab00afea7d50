import type http from 'node:http';
import { writeLine } from './logger';
import { logPath } from './redact';
import { requestIdFor } from './request-id';

/** The request's id: the caller's sane X-Request-Id or a new UUID. */
export function requestIdOf(req: http.IncomingMessage): string {
  const given = req.headers['x-request-id'];
  return requestIdFor(Array.isArray(given) ? given[0] : given);
}

/**
 * Write one access-log line when the response is done: method, path (no query), status,
 * duration in ms and whether the client went away first. 5xx log at error, 4xx at warn, the
 * rest at info. `path` is given when the caller already knows the route (API v1), so the
 * target is not scrubbed again; it must need no JSON escaping.
 */
export function logWhenDone(
  req: http.IncomingMessage,
  res: http.ServerResponse,
  id: string,
  path?: string,
): void {
  const started = performance.now();
  res.once('close', () => {
    const status = res.statusCode;
    const ms = Math.round((performance.now() - started) * 10) / 10;
    // The fields of pino's line for { reqId, method, path, status, ms, aborted? }, built by
    // hand. Ids are [\w-] tokens (request-id.ts) and methods HTTP tokens: neither needs escaping.
    const fields =
      `"reqId":"${id}","method":"${req.method ?? ''}",` +
      `"path":${path === undefined ? JSON.stringify(logPath(req.url)) : `"${path}"`},` +
      `"status":${status},"ms":${ms}` +
      (res.writableFinished ? '' : ',"aborted":true');
    writeLine(status >= 500 ? 'error' : status >= 400 ? 'warn' : 'info', fields, 'request');
  });
}

/**
 * Give a page request its id, pass it on to Astro in the request headers (the middleware puts
 * it in locals), return it on the response, and log the request when done.
 */
export function trackRequest(req: http.IncomingMessage, res: http.ServerResponse): string {
  const id = requestIdOf(req);
  req.headers['x-request-id'] = id;
  res.setHeader('X-Request-Id', id);
  logWhenDone(req, res, id);
  return id;
}
