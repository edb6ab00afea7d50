/**
 * The public calculation API on a short path. /api/v1/* needs none of the page machinery (no
 * session, no database, no rendering), and the framework's request pipeline with its
 * web-standard Request/Response streams cost about fifteen times the calculation per call. The
 * production server hands these paths to the same operations the Astro endpoints run
 * (src/lib/api/v1-routes.ts), reading the node request and writing the answer directly.
 */
import type http from 'node:http';
import type { ApiAnswer, ApiRequest, BodyBytes } from '../api/answer';
import { BODY_DEADLINE_MS, MAX_BODY_BYTES, concatChunks, refusedByHeaders } from '../api/body';
import { v1Operation } from '../api/v1-routes';
import { logWhenDone, requestIdOf } from './access-log';
import { drainUnreadBody } from './body-limit';
import { nodeClientAddress } from './client-address';
import { deadline } from './deadlines';
import type { Write } from './turn-batch';
import { inTurnBatch } from './turn-batch';

/**
 * The body with a byte cap and a deadline, to `done`. Past the cap it stops listening without
 * destroying the socket, so the 413 still reaches the client (the server then closes the
 * connection).
 */
function readNodeBody(
  req: http.IncomingMessage,
  limit: number,
  deadlineMs: number,
  done: (read: BodyBytes) => void,
): void {
  const chunks: Uint8Array[] = [];
  let total = 0;
  const finish = (result: BodyBytes): void => {
    cancel();
    req.off('data', onData).off('end', onEnd).off('error', onError).off('aborted', onError);
    if (!result.ok) req.pause();
    done(result);
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
}

/**
 * The whole body when the request has arrived in full and is within `limit`, taken from the
 * request's buffer without listeners or stream events; otherwise undefined.
 */
function bufferedBody(req: http.IncomingMessage, limit: number): BodyBytes | undefined {
  if (!req.complete || req.readableLength > limit || req.readableFlowing) return undefined;
  const chunk = req.read() as Buffer | null;
  return { ok: true, bytes: chunk ?? new Uint8Array(0) };
}

/** A request header by its lower-case name, repeated ones joined as the Fetch API does. */
function headerOf(req: http.IncomingMessage): ApiRequest['header'] {
  return (name) => {
    const value = req.headers[name];
    return value === undefined ? null : Array.isArray(value) ? value.join(', ') : value;
  };
}

/** The request as operations see it; `read` is the body when the server has read it already. */
function fromNode(
  req: http.IncomingMessage,
  target: string,
  requestId: string,
  header: ApiRequest['header'],
  read?: BodyBytes,
): ApiRequest {
  let url: URL | undefined;
  let address: string | undefined;
  return {
    method: req.method ?? 'GET',
    // Only the path and query are read; the Host header is not trusted (as Astro does by
    // default). Parsed on first use: the calculations never read it.
    get url(): URL {
      return (url ??= new URL(target, 'http://localhost'));
    },
    header,
    readBody: (limit, deadlineMs) =>
      read ?? new Promise((resolve) => readNodeBody(req, limit, deadlineMs, resolve)),
    // Read only by the rate limit (it reads TRUST_PROXY_HOPS from the environment).
    get clientAddress(): string {
      return (address ??= nodeClientAddress(req));
    },
    requestId,
  };
}

/**
 * The answer ready to write. The headers go to writeHead as one flat list with nothing set
 * before it, which Node writes as given instead of storing each one first (a tenth of the
 * call's time). An operation's headers (content type, caching, CORS) never repeat a security
 * header.
 */
function prepared(
  req: http.IncomingMessage,
  res: http.ServerResponse,
  answer: ApiAnswer,
  head: string[],
): Write {
  const body = answer.body === undefined ? undefined : JSON.stringify(answer.body);
  for (const name in answer.headers) head.push(name, answer.headers[name]);
  if (body !== undefined) head.push('Content-Length', String(Buffer.byteLength(body)));
  return () => {
    try {
      drainUnreadBody(req, res);
      res.writeHead(answer.status, head);
      res.end(body);
    } catch {
      res.destroy(); // the socket went away mid-answer
    }
  };
}

/** The route's path: the target without its query and without one trailing slash. */
function routePath(target: string): string {
  const query = target.indexOf('?');
  const path = query === -1 ? target : target.slice(0, query);
  return path.length > 1 && path.endsWith('/') ? path.slice(0, -1) : path;
}

/**
 * Answer the request if it is an API v1 route and return true; otherwise return false and leave
 * it to Astro, which routes unusual spellings of known ones (dot segments, escapes) itself and
 * answers the rest with the API's JSON 404 (src/pages/api/v1/[...rest].ts). `baseHeaders` are the security headers every
 * response carries, as a flat name, value, … list.
 */
export function serveApiV1(
  req: http.IncomingMessage,
  res: http.ServerResponse,
  baseHeaders: readonly string[],
): boolean {
  const target = req.url ?? '/';
  if (!target.startsWith('/api/v1/')) return false;
  const path = routePath(target);
  const operation = v1Operation(path, req.method ?? 'GET');
  if (!operation) return false;
  const id = requestIdOf(req);
  logWhenDone(req, res, id, path);
  const head = [...baseHeaders, 'X-Request-Id', id];
  const destroy = (): void => void res.destroy();
  const reply = (answer: ApiAnswer): void => {
    try {
      prepared(req, res, answer, head)();
    } catch {
      destroy();
    }
  };
  // Operations are guarded and do not throw or reject; they answer synchronously once the body
  // is in, and run in the turn's batch (turn-batch.ts). A JSON body an operation will read is
  // read first: taken whole from the request's buffer when it came with the headers (the usual
  // case), else with a callback; a promise per request cost a tenth of the call.
  const header = headerOf(req);
  const answerWith = (read?: BodyBytes): Write | undefined => {
    try {
      const answer = operation(fromNode(req, target, id, header, read));
      if (!(answer instanceof Promise)) return prepared(req, res, answer, head);
      answer.then(reply, destroy);
      return undefined;
    } catch {
      return destroy;
    }
  };
  if (req.method !== 'POST' || refusedByHeaders(header)) inTurnBatch(() => answerWith());
  else {
    inTurnBatch(() => {
      const read = bufferedBody(req, MAX_BODY_BYTES);
      if (read) return answerWith(read);
      readNodeBody(req, MAX_BODY_BYTES, BODY_DEADLINE_MS, (rest) =>
        inTurnBatch(() => answerWith(rest)),
      );
      return undefined;
    });
  }
  return true;
}
