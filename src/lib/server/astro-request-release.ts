import type http from 'node:http';

/**
 * Astro ties each request it builds to a `close` listener on the socket and removes it when it
 * writes the response. Its static handler also builds one (to look up a prerendered page's
 * headers) and then serves the file itself, so on a keep-alive socket those listeners pile up
 * until Node warns of a leak. Astro keeps the remover under this registered symbol.
 */
const CLEANUP = Symbol.for('astro.nodeRequestAbortControllerCleanup');

/** Remove Astro's socket listener for this request, if it left one, once the response is done. */
export function releaseAstroRequest(req: http.IncomingMessage, res: http.ServerResponse): void {
  res.once('close', () => {
    const cleanup = (req as unknown as Record<symbol, unknown>)[CLEANUP];
    if (typeof cleanup === 'function') cleanup();
  });
}
