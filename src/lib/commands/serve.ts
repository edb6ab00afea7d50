/**
 * The production server: Astro's built handler (static files, then pages and endpoints) inside
 * our own node:http server, so that every response carries the security headers and SIGTERM
 * finishes in-flight requests before the process exits.
 */
import http from 'node:http';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { getConfig } from '../config';
import { trackRequest } from '../server/access-log';
import { releaseAstroRequest } from '../server/astro-request-release';
import { serveApiV1 } from '../server/api-fast-path';
import { closeIfBodyUnread, refuseOversizedBody } from '../server/body-limit';
import { pinClientAddress } from '../server/client-address';
import { compress } from '../server/compression';
import { routeConsoleToLogger } from '../server/console-bridge';
import { logger } from '../server/logger';
import { runWithRequestId } from '../server/request-context';
import { API_CSP, securityHeaders } from '../server/security-headers';

type Handler = (req: http.IncomingMessage, res: http.ServerResponse) => void;

const GRACE_MS = 10_000;

/** Astro writes its own status line, so the unread-body check runs inside its writeHead. */
function closeOnUnreadBody(req: http.IncomingMessage, res: http.ServerResponse): void {
  const writeHead = res.writeHead.bind(res) as (...args: unknown[]) => http.ServerResponse;
  res.writeHead = ((...args: unknown[]) => {
    closeIfBodyUnread(req, res);
    return writeHead(...args);
  }) as typeof res.writeHead;
}

async function main(): Promise<void> {
  process.env.ASTRO_NODE_AUTOSTART = 'disabled';
  routeConsoleToLogger();
  const config = getConfig();
  const entry = pathToFileURL(path.resolve('dist/server/entry.mjs')).href;
  const { handler } = (await import(entry)) as { handler: Handler };
  const headers = Object.entries(securityHeaders(config.production));
  const apiHeaders = Object.entries(securityHeaders(config.production, API_CSP)).flat();

  const server = http.createServer((req, res) => {
    // API v1 gives each request its id and log line, caps its own body at 64 KiB, drains an
    // unread body itself, and its small JSON answers skip compression: it goes first, past the
    // page machinery.
    if (serveApiV1(req, res, apiHeaders)) return;
    // Pages and endpoints (flags, sign-in) see the same client address as API v1.
    pinClientAddress(req);
    const id = trackRequest(req, res);
    releaseAstroRequest(req, res);
    for (const [name, value] of headers) res.setHeader(name, value);
    if (refuseOversizedBody(req, res)) return;
    closeOnUnreadBody(req, res);
    compress(req, res, () => runWithRequestId(id, () => handler(req, res)));
  });
  server.keepAliveTimeout = 5_000;
  server.listen(config.port, config.host, () => {
    logger.info({ host: config.host, port: config.port }, 'server listening');
  });

  let closing = false;
  const close = (): void => {
    if (closing) return;
    closing = true;
    // Stop accepting, let in-flight requests finish, drop idle keep-alive sockets.
    server.close(() => process.exit(0));
    server.closeIdleConnections();
    setTimeout(() => {
      server.closeAllConnections();
      process.exit(0);
    }, GRACE_MS).unref();
  };
  process.on('SIGTERM', close);
  process.on('SIGINT', close);
}

main().catch((error: unknown) => {
  logger.fatal({ err: error }, 'server failed to start');
  logger.flush(() => process.exit(1));
});
