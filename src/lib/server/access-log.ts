import type http from 'node:http';
import { logger } from './logger';
import { logPath } from './redact';
import { requestIdFor } from './request-id';

/**
 * Give a request its id (the caller's sane X-Request-Id or a new UUID), pass it on to Astro in
 * the request headers (the middleware puts it in locals), return it on the response, and write
 * one access-log line when the response is done: method, path (no query), status, duration in
 * ms and whether the client went away first. 5xx log at error, 4xx at warn, the rest at info.
 */
export function trackRequest(req: http.IncomingMessage, res: http.ServerResponse): string {
  const started = performance.now();
  const given = req.headers['x-request-id'];
  const id = requestIdFor(Array.isArray(given) ? given[0] : given);
  req.headers['x-request-id'] = id;
  res.setHeader('X-Request-Id', id);
  res.once('close', () => {
    const status = res.statusCode;
    const line = {
      reqId: id,
      method: req.method,
      path: logPath(req.url),
      status,
      ms: Math.round((performance.now() - started) * 10) / 10,
      ...(res.writableFinished ? {} : { aborted: true }),
    };
    if (status >= 500) logger.error(line, 'request');
    else if (status >= 400) logger.warn(line, 'request');
    else logger.info(line, 'request');
  });
  return id;
}
