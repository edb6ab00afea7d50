/**
 * The client's address, for every per-client limit (API v1, flags, sign-in e-mails). By default
 * it is the socket's remote address: X-Forwarded-For is written by whoever sends the request, so
 * believing it lets any client pick a fresh address per request. Only when the operator says
 * proxies stand in front (TRUST_PROXY_HOPS=N) is the header read, and then the Nth entry from
 * the right: the last N entries were appended by those proxies, anything left of them by the
 * client (common practice for trusted proxy hops).
 */
import type http from 'node:http';
import { intFromEnv } from '../config';

/** Proxies trusted in front of the server when TRUST_PROXY_HOPS is unset: none. */
export const DEFAULT_TRUST_PROXY_HOPS = 0;

/** TRUST_PROXY_HOPS, read at every call (a test or a restart may change it); never negative. */
export function trustProxyHops(): number {
  const hops = intFromEnv('TRUST_PROXY_HOPS', DEFAULT_TRUST_PROXY_HOPS);
  return hops > 0 ? hops : 0;
}

/**
 * The client address from the X-Forwarded-For header(s) and the socket's address.
 * @param hops trusted proxies in front; 0 ignores the header. With fewer entries than hops the
 *   leftmost entry is the best there is.
 */
export function clientAddressFrom(
  forwardedFor: string | readonly string[] | undefined,
  socketAddress: string | undefined,
  hops: number,
): string {
  const socket = socketAddress || 'unknown';
  if (hops <= 0 || forwardedFor === undefined) return socket;
  const joined = typeof forwardedFor === 'string' ? forwardedFor : forwardedFor.join(',');
  const entries = joined
    .split(',')
    .map((entry) => entry.trim())
    .filter(Boolean);
  if (entries.length === 0) return socket;
  return entries[Math.max(0, entries.length - hops)];
}

/** The client address of a node request, under the configured TRUST_PROXY_HOPS. */
export function nodeClientAddress(req: http.IncomingMessage): string {
  return clientAddressFrom(
    req.headers['x-forwarded-for'],
    req.socket.remoteAddress,
    trustProxyHops(),
  );
}

/**
 * Before Astro sees the request: replace X-Forwarded-For by the one address we trust. Astro's
 * node adapter reports the first X-Forwarded-For entry as `clientAddress` (else the socket), so
 * pages and endpoints then see the same address as the API's short path.
 */
export function pinClientAddress(req: http.IncomingMessage): void {
  req.headers['x-forwarded-for'] = nodeClientAddress(req);
}

/**
 * The client address in a page or endpoint: Astro's `clientAddress`, which the production server
 * pinned ({@link pinClientAddress}) and the dev server takes from the socket. Astro throws when
 * an adapter gives none; that becomes 'unknown', one shared bucket.
 */
export function routeClientAddress(context: { readonly clientAddress: string }): string {
  try {
    return context.clientAddress || 'unknown';
  } catch {
    return 'unknown';
  }
}
