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
import { logWhenDone, requestIdOf } from './access-log';
import { drainUnreadBody } from './body-limit';
import { deadline } from './deadlines';

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
      cancel();
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
    const cancel = deadline(deadlineMs, () => finish({ ok: false, reason: 'late' }));
    req.on('data', onData).on('end', onEnd).on('error', onError).on('aborted', onError);
  });
}

function fromNode(req: http.IncomingMessage, url: URL, requestId: string): ApiRequest {
  return {
    method: req.method ?? 'GET',
    url,
    header: (name) => {
      const value = req.headers[name];
      return value === undefined ? null : Array.isArray(value) ? value.join(', ') : value;
    },
    readBody: (limit, deadlineMs) => readNodeBody(req, limit, deadlineMs),
    clientAddress: first(req.headers['x-forwarded-for']) ?? req.socket.remoteAddress ?? 'unknown',
    requestId,
  };
}

/**
 * Write the answer. The headers go to writeHead as one flat list with nothing set before it,
 * which Node writes as given instead of storing each one first (a tenth of the call's time).
 * An operation's headers (content type, caching, CORS) never repeat a security header.
 */
function send(
  req: http.IncomingMessage,
  res: http.ServerResponse,
  answer: ApiAnswer,
  head: string[],
): void {
  const body = answer.body === undefined ? undefined : JSON.stringify(answer.body);
  for (const name in answer.headers) head.push(name, answer.headers[name]);
  if (body !== undefined) head.push('Content-Length', String(Buffer.byteLength(body)));
  drainUnreadBody(req, res);
  res.writeHead(answer.status, head);
  res.end(body);
}

/**
 * Answer the request if it is an API v1 route and return true; otherwise return false and leave
 * it to Astro (which answers unknown /api/v1 paths with its 404). `baseHeaders` are the security
 * headers every response carries, as a flat name, value, … list.
 */
export function serveApiV1(
  req: http.IncomingMessage,
  res: http.ServerResponse,
  baseHeaders: readonly string[],
): boolean {
  const target = req.url ?? '/';
  if (!target.startsWith('/api/v1/')) return false;
  // Only the path and query are read; the Host header is not trusted (as Astro does by default).
  const url = new URL(target, 'http://localhost');
  const operation = v1Operation(url.pathname.replace(/(.)\/$/, '$1'), req.method ?? 'GET');
  if (!operation) return false;
  const id = requestIdOf(req);
  logWhenDone(req, res, id);
  const head = [...baseHeaders, 'X-Request-Id', id];
  const reply = (answer: ApiAnswer): void => {
    try {
      send(req, res, answer, head);
    } catch {
      res.destroy(); // the socket went away mid-answer
    }
  };
  // Operations are guarded and do not throw or reject. Most answer synchronously once the body is in.
  const answer = operation(fromNode(req, url, id));
  if (answer instanceof Promise) answer.then(reply, () => res.destroy());
  else reply(answer);
  return true;
}
