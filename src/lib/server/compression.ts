/**
 * Response compression for the production server (src/lib/commands/serve.ts): brotli or gzip,
 * whichever the client prefers, through the `compression` package on plain node:http.
 *
 * Compressed: text types (HTML, CSS, CSV shown inline), JavaScript, JSON, SVG, the web manifest,
 * at 1 KB and over. Left alone: types that are already compressed (PDF, PNG, woff2, …; the
 * package's type list says which), HEAD requests, `Cache-Control: no-transform`, partial
 * content (a byte range of the uncompressed file), server-sent events (the compressor would hold
 * the events back) and downloads (`Content-Disposition: attachment`), so a streamed PDF or CSV
 * export keeps its Content-Length and progress for the clients that rely on it.
 */
import type http from 'node:http';
import { constants } from 'node:zlib';
import compression from 'compression';

/** Below this many bytes the headers and the compressor's framing cost more than they save. */
const THRESHOLD_BYTES = 1024;

function wanted(req: http.IncomingMessage, res: http.ServerResponse): boolean {
  if (res.getHeader('Content-Range') !== undefined) return false;
  if (/^\s*attachment/i.test(String(res.getHeader('Content-Disposition') ?? ''))) return false;
  if (/^text\/event-stream/i.test(String(res.getHeader('Content-Type') ?? ''))) return false;
  return compression.filter(req as never, res as never);
}

const middleware = compression({
  threshold: THRESHOLD_BYTES,
  filter: wanted,
  // Quality 5 (of 11) and gzip level 6: most of the saving for little CPU on a 2-core host.
  brotli: { params: { [constants.BROTLI_PARAM_QUALITY]: 5 } },
  level: 6,
});

/**
 * Compress the response `res` when the request and the response allow it, then call `next`,
 * which writes the response as usual (call it before anything is written to `res`).
 */
export function compress(
  req: http.IncomingMessage,
  res: http.ServerResponse,
  next: () => void,
): void {
  // The package's types are Express's; on plain node:http it uses only these two objects.
  middleware(req as never, res as never, () => next());
}
