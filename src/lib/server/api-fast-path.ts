/**
 * The public calculation API on a short path. /api/v1/* needs none of the page machinery (no
 * session, no database, no rendering), and the framework's request pipeline with its
 * web-standard Request/Response streams cost about fifteen times the calculation per call. The
 * production server hands these paths to the same operations the Astro endpoints run
 * (src/lib/api/v1-routes.ts), reading the node request and writing the answer directly.
 */
import type http from 'node:http';
import type { ApiAnswer, ApiRequest, BodyBytes } from '../api/answer';
import { concatChunks } from '../api/body';
import { v1Operation } from '../api/v1-routes';
import { drainUnreadBody } from './body-limit';
import { requestIdFor } from './request-id';

function first(header: string | string[] | undefined): string | undefined {
  const value = Array.isArray(header) ? header[0] : header;
  return value?.split(',')[0]?.trim() || undefined;
}

/**
 * The body with a byte cap and a deadline. Past the cap it stops listening without destroying
 * the socket, so the 413 still reaches the client (the server then closes the connection).
 */
export function readNodeBody(
  req: http.IncomingMessage,
  limit: number,
  deadlineMs: number,
): Promise<BodyBytes> {
  return new Promise((resolve) => {
    const chunks: Uint8Array[] = [];
    let total = 0;
    const finish = (result: BodyBytes): void => {
      clearTimeout(timer);
      req.off('data', onData).off('end', onEnd).off('error', onError).off('aborted', onError);
      if (!result.ok) req.pause();
      resolve(result);
    };
    const onData = (chunk: Buffer): void => {
      total += chunk.byteLength;
      if (total > limit) finish({ ok: false, reason: 'too_large' });
      else chunks.push(chunk);
    };
    const onEnd = (): void => finish({ ok: true, bytes: concatChunks(chunks, total) });
    const onError = (): void => finish({ ok: false, reason: 'unreadable' });
    const timer = setTimeout(() => finish({ ok: false, reason: 'late' }), deadlineMs);
    req.on('data', onData).on('end', onEnd).on('error', onError).on('aborted', onError);
  });
}

function fromNode(req: http.IncomingMessage, url: URL): ApiRequest {
  return {
    method: req.method ?? 'GET',
    url,
    header: (name) => {
      const value = req.headers[name];
      return value === undefined ? null : Array.isArray(value) ? value.join(', ') : value;
    },
    readBody: (limit, deadlineMs) => readNodeBody(req, limit, deadlineMs),
    clientAddress: first(req.headers['x-forwarded-for']) ?? req.socket.remoteAddress ?? 'unknown',
    requestId: requestIdFor(first(req.headers['x-request-id'])),
  };
}

/** Write the answer (X-Request-Id is already set, access-log.ts). */
function send(req: http.IncomingMessage, res: http.ServerResponse, answer: ApiAnswer): void {
  const body = answer.body === undefined ? undefined : JSON.stringify(answer.body);
  const headers: http.OutgoingHttpHeaders = answer.headers;
  if (body !== undefined) headers['Content-Length'] = Buffer.byteLength(body);
  drainUnreadBody(req, res);
  res.writeHead(answer.status, headers);
  res.end(body);
}

/**
 * Answer the request if it is an API v1 route and return true; otherwise return false and leave
 * it to Astro (which answers unknown /api/v1 paths with its 404).
 */
export function serveApiV1(req: http.IncomingMessage, res: http.ServerResponse): boolean {
  const target = req.url ?? '/';
  if (!target.startsWith('/api/v1/')) return false;
  // Only the path and query are read; the Host header is not trusted (as Astro does by default).
  const url = new URL(target, 'http://localhost');
  const operation = v1Operation(url.pathname.replace(/(.)\/$/, '$1'), req.method ?? 'GET');
  if (!operation) return false;
  const request = fromNode(req, url);
  Promise.resolve(operation(request)).then(
    (answer) => send(req, res, answer),
    // Operations are guarded and do not throw; this only covers a socket gone mid-answer.
    () => res.destroy(),
  );
  return true;
}
