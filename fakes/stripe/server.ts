/**
 * A local stand-in for the hosted payments service: the part of its HTTP API the app calls
 * through the stripe SDK, hosted checkout and portal pages, and signed webhook delivery.
 *
 * Environment: PORT, HOST; FAKE_STRIPE_DATA_DIR (state file); FAKE_STRIPE_PUBLIC_URL (origin of
 * the hosted pages); FAKE_STRIPE_WEBHOOK_URL and FAKE_STRIPE_WEBHOOK_SECRET (delivery);
 * FAKE_STRIPE_CHAOS=1 (duplicate and reorder deliveries); FAKE_STRIPE_RETRY_MS (first retry delay).
 */
import http from 'node:http';
import type { ApiContext } from './api';
import { handleApi } from './api';
import { payCheckout } from './checkout';
import type { Reply } from './control';
import { control, portalAction } from './control';
import { parseForm } from './form';
import { page } from './html';
import { checkoutPage, invoicePage, portalPage } from './pages';
import { Store } from './store';
import { Deliveries } from './webhooks';
import { whenParentExits } from '../../src/lib/commands/parent-watch';

const port = Number(process.env.PORT || 4620);
const host = process.env.HOST || '127.0.0.1';
const store = new Store(process.env.FAKE_STRIPE_DATA_DIR || 'data/fake-stripe');
const hooks = new Deliveries(store, {
  url: process.env.FAKE_STRIPE_WEBHOOK_URL ?? '',
  secret: process.env.FAKE_STRIPE_WEBHOOK_SECRET || 'whsec_drainwright_local_fake',
  chaos: process.env.FAKE_STRIPE_CHAOS === '1',
  retryMs: Number(process.env.FAKE_STRIPE_RETRY_MS || 500),
  maxAttempts: 8,
});
const ctx: ApiContext = {
  store,
  hooks,
  publicUrl: process.env.FAKE_STRIPE_PUBLIC_URL || `http://${host}:${port}`,
};

const html = (status: number, body: string): Reply => ({
  status,
  type: 'text/html; charset=utf-8',
  body,
});

function readBody(req: http.IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    let body = '';
    req.setEncoding('utf8');
    req.on('data', (chunk: string) => {
      body += chunk;
      if (body.length > 1_000_000) req.destroy();
    });
    req.on('end', () => resolve(body));
    req.on('error', reject);
  });
}

function hostedPay(id: string, form: Record<string, string>): Reply {
  const session = store.state.checkoutSessions[id];
  if (!session) return html(404, page('Checkout', '<h1>No such checkout</h1>'));
  const fields = { number: '', expiry: '', cvc: '', email: '', name: '', ...form };
  const result = payCheckout(store, hooks, session, fields);
  if ('redirect' in result) return { status: 303, body: '', location: result.redirect };
  const { number, expiry, name, email } = fields;
  return html(402, checkoutPage(store, id, result.error, { number, expiry, name, email }));
}

async function route(req: http.IncomingMessage, url: URL): Promise<Reply> {
  const method = req.method ?? 'GET';
  const raw = await readBody(req);
  if (url.pathname === '/health')
    return { status: 200, type: 'application/json', body: '{"ok":true}' };
  if (url.pathname.startsWith('/v1/')) {
    const form = parseForm(method === 'GET' || method === 'DELETE' ? url.search.slice(1) : raw);
    const res = handleApi(ctx, method, url.pathname, form, req.headers.authorization);
    return { status: res.status, type: 'application/json', body: JSON.stringify(res.body) };
  }
  if (url.pathname.startsWith('/_fake/')) {
    const body = raw ? (JSON.parse(raw) as Record<string, unknown>) : {};
    return control(store, hooks, method, url.pathname, body);
  }
  const pay = /^\/pay\/(\w+)$/.exec(url.pathname);
  if (pay && method === 'GET') {
    return store.state.checkoutSessions[pay[1]]
      ? html(200, checkoutPage(store, pay[1]))
      : html(404, page('Checkout', '<h1>No such checkout</h1>'));
  }
  if (pay && method === 'POST')
    return hostedPay(pay[1], Object.fromEntries(new URLSearchParams(raw)));
  const portal = /^\/portal\/(\w+)(?:\/(seats|cancel|resume|card))?$/.exec(url.pathname);
  if (portal && method === 'GET' && !portal[2])
    return html(store.state.portalSessions[portal[1]] ? 200 : 404, portalPage(store, portal[1]));
  if (portal && method === 'POST' && portal[2])
    return portalAction(store, hooks, portal[1], portal[2], parseForm(raw));
  const invoice = /^\/invoice\/(\w+)$/.exec(url.pathname);
  if (invoice) return html(200, invoicePage(store, invoice[1]));
  return {
    status: 404,
    type: 'application/json',
    body: '{"error":{"type":"invalid_request_error","message":"Not found"}}',
  };
}

const server = http.createServer((req, res) => {
  const url = new URL(req.url ?? '/', `http://${host}:${port}`);
  route(req, url)
    .then((reply) => {
      const headers: Record<string, string> = { 'request-id': `req_fake_${Date.now()}` };
      if (reply.type) headers['content-type'] = reply.type;
      if (reply.location) headers.location = reply.location;
      res.writeHead(reply.status, headers).end(reply.body);
    })
    .catch((error: unknown) => {
      console.error('fake stripe:', error);
      const body = {
        error: { type: 'api_error', message: 'The fake could not handle this request.' },
      };
      res.writeHead(500, { 'content-type': 'application/json' }).end(JSON.stringify(body));
    });
});

server.listen(port, host);
const stop = (): void => {
  server.close(() => process.exit(0));
  setTimeout(() => process.exit(0), 2000).unref();
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
whenParentExits(stop);
