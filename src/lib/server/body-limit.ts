/**
 * One request-body cap for the whole server, before any route buffers a byte: many endpoints
 * read their body whole (request.json(), formData()), so without this a client could make the
 * server hold hundreds of megabytes. Routes with a tighter cap of their own keep it (API v1 64 KiB,
 * jobs 256 KiB, logo 2 MB); this is the ceiling above them.
 */
import type http from 'node:http';

/** Ceiling for every route but the logo upload, bytes (a flag's snapshot is the largest, < 1 MB). */
export const MAX_REQUEST_BYTES = 1024 * 1024;
/** The logo upload: a 2 MB file plus room for the multipart wrapping (src/lib/brand/upload.ts). */
export const MAX_UPLOAD_REQUEST_BYTES = 2 * 1024 * 1024 + 64 * 1024;
/** A refused body up to this size is read and dropped, so the client sees the 413. */
const DRAIN_MAX_BYTES = 16 * 1024 * 1024;

/** The cap for a path; API v1 streams its body through its own 64 KiB cap and error shape. */
export function bodyLimitFor(pathname: string): number {
  if (pathname.startsWith('/api/v1/')) return Infinity;
  return pathname === '/api/brand/logo' ? MAX_UPLOAD_REQUEST_BYTES : MAX_REQUEST_BYTES;
}

/**
 * Enforce the cap: a declared Content-Length over it gets 413 at once (true = answered); a chunked
 * body is handed to Astro through a counting iterable (the Node adapter reads `req.body` when set)
 * that fails the read past the cap, so the route answers its own "unreadable body" 400.
 */
export function refuseOversizedBody(req: http.IncomingMessage, res: http.ServerResponse): boolean {
  if (req.method === 'GET' || req.method === 'HEAD') return false;
  const limit = bodyLimitFor(new URL(req.url ?? '/', 'http://localhost').pathname);
  if (limit === Infinity) return false;
  const declared = Number(req.headers['content-length']);
  if (Number.isFinite(declared) && declared > limit) {
    // Read and drop a moderate body so the client gets to read the 413 (closing while it still
    // uploads would reset the connection); hang up on anything bigger.
    const close = declared > DRAIN_MAX_BYTES;
    if (!close) req.resume();
    res.writeHead(413, {
      'Content-Type': 'application/json; charset=utf-8',
      ...(close ? { Connection: 'close' } : {}),
    });
    res.end(
      JSON.stringify({
        error: 'payload_too_large',
        message: `The request body is over ${limit / 1024} KiB.`,
      }),
    );
    return true;
  }
  if (req.headers['transfer-encoding']) (req as { body?: unknown }).body = capped(req, limit);
  return false;
}

async function* capped(req: http.IncomingMessage, limit: number): AsyncGenerator<Buffer> {
  let total = 0;
  for await (const chunk of req as AsyncIterable<Buffer>) {
    total += chunk.length;
    if (total > limit) throw new Error(`request body over ${limit} bytes`);
    yield chunk;
  }
}

/** How long the rest of a refused body may take to arrive before the server hangs up, ms. */
const DRAIN_MS = 5_000;

/**
 * For a page-server answer written before its request body was read (Astro's early 4xx): close
 * the connection and drain what arrived, so the client's next request on a keep-alive socket
 * cannot queue behind the rest of that body. (The body may be held by the capped iterable above,
 * which tears the socket down when abandoned, so the connection is not kept.) Call just before
 * the status line is written.
 */
export function closeIfBodyUnread(req: http.IncomingMessage, res: http.ServerResponse): void {
  if (req.complete) return;
  res.setHeader('Connection', 'close');
  res.once('finish', () => req.resume());
}

/**
 * For an API v1 answer written before its request body was read (413, 415, early 4xx; the short
 * path owns the request, nothing else reads it): once the answer is out, read and drop the rest
 * of the body, so the client gets to read the answer (closing while it still uploads resets the
 * connection and loses it) and its next request on the keep-alive socket does not queue behind
 * the unread bytes. A body too big or too slow to drain gets a hang-up. Call just before the
 * status line is written.
 */
export function drainUnreadBody(req: http.IncomingMessage, res: http.ServerResponse): void {
  if (req.complete) return;
  if (Number(req.headers['content-length']) > DRAIN_MAX_BYTES) return closeIfBodyUnread(req, res);
  // taken now: once the answer is out the request may let go of its socket
  const socket = req.socket;
  res.once('finish', () => {
    let bytes = 0;
    const hangUp = (): void => void socket?.destroy();
    const timer = setTimeout(hangUp, DRAIN_MS).unref();
    req.on('data', (chunk: Buffer) => {
      bytes += chunk.length;
      if (bytes > DRAIN_MAX_BYTES) hangUp();
    });
    req.once('close', () => clearTimeout(timer)).once('end', () => clearTimeout(timer));
    req.resume();
  });
}
