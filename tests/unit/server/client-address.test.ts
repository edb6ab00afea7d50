/**
 * The client address every per-client limit counts against (src/lib/server/client-address.ts).
 * The rule checked is common practice for trusted proxies: ignore X-Forwarded-For unless
 * proxies are configured, then take the entry that many places from the right.
 */
import type http from 'node:http';
import { afterEach, describe, expect, test, vi } from 'vitest';
import {
  clientAddressFrom,
  nodeClientAddress,
  pinClientAddress,
  routeClientAddress,
  trustProxyHops,
} from '../../../src/lib/server/client-address';

afterEach(() => {
  vi.unstubAllEnvs();
});

function nodeRequest(
  forwardedFor: string | undefined,
  socket = '198.51.100.9',
): http.IncomingMessage {
  const headers: http.IncomingHttpHeaders = {};
  if (forwardedFor !== undefined) headers['x-forwarded-for'] = forwardedFor;
  return { headers, socket: { remoteAddress: socket } } as unknown as http.IncomingMessage;
}

describe('clientAddressFrom', () => {
  test('does ignore X-Forwarded-For when no proxy is trusted', () => {
    expect(clientAddressFrom('203.0.113.5', '198.51.100.9', 0)).toBe('198.51.100.9');
    expect(clientAddressFrom(undefined, '198.51.100.9', 0)).toBe('198.51.100.9');
  });

  test('does take the Nth entry from the right with N trusted proxies', () => {
    // Client forged "6.6.6.6"; proxy 2 appended the client's real address, proxy 1 proxy 2's.
    const header = '6.6.6.6, 203.0.113.5, 10.0.0.2';
    expect(clientAddressFrom(header, '10.0.0.1', 1)).toBe('10.0.0.2');
    expect(clientAddressFrom(header, '10.0.0.1', 2)).toBe('203.0.113.5');
  });

  test('does join repeated headers and skip empty entries', () => {
    expect(clientAddressFrom(['6.6.6.6', '203.0.113.5'], '10.0.0.1', 1)).toBe('203.0.113.5');
    expect(clientAddressFrom(' , ', '10.0.0.1', 1)).toBe('10.0.0.1');
  });

  test('does take the leftmost entry when there are fewer entries than hops', () => {
    expect(clientAddressFrom('203.0.113.5', '10.0.0.1', 3)).toBe('203.0.113.5');
  });

  test('does answer unknown when there is no address at all', () => {
    expect(clientAddressFrom(undefined, undefined, 0)).toBe('unknown');
  });
});

describe('TRUST_PROXY_HOPS', () => {
  test('does default to 0 and refuse negative or malformed values', () => {
    expect(trustProxyHops()).toBe(0);
    vi.stubEnv('TRUST_PROXY_HOPS', '-2');
    expect(trustProxyHops()).toBe(0);
    vi.stubEnv('TRUST_PROXY_HOPS', 'two');
    expect(trustProxyHops()).toBe(0);
    vi.stubEnv('TRUST_PROXY_HOPS', '2');
    expect(trustProxyHops()).toBe(2);
  });

  test('does decide the address of a node request, read at every call', () => {
    const req = nodeRequest('6.6.6.6, 203.0.113.5');
    expect(nodeClientAddress(req)).toBe('198.51.100.9');
    vi.stubEnv('TRUST_PROXY_HOPS', '1');
    expect(nodeClientAddress(req)).toBe('203.0.113.5');
  });
});

describe('pinClientAddress', () => {
  test('does leave Astro a single trusted X-Forwarded-For entry', () => {
    const forged = nodeRequest('6.6.6.6');
    pinClientAddress(forged);
    expect(forged.headers['x-forwarded-for']).toBe('198.51.100.9');
    vi.stubEnv('TRUST_PROXY_HOPS', '1');
    const proxied = nodeRequest('6.6.6.6, 203.0.113.5', '10.0.0.1');
    pinClientAddress(proxied);
    expect(proxied.headers['x-forwarded-for']).toBe('203.0.113.5');
  });
});

describe('routeClientAddress', () => {
  test('does answer unknown when the adapter gives no address', () => {
    const none = {
      get clientAddress(): string {
        throw new Error('no address');
      },
    };
    expect(routeClientAddress(none)).toBe('unknown');
    expect(routeClientAddress({ clientAddress: '192.0.2.4' })).toBe('192.0.2.4');
  });
});
