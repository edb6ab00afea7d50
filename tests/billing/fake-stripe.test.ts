import fs from 'node:fs';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startFakes } from '../../fakes/runner';
import type { RunningFakes } from '../../fakes/runner';
import { deliveriesSettled, payWith, sdkFor } from './helpers';

// Ports from the billing range 16400–16499.
const FAKE_PORT = 16441;
const HOOK_PORT = 16442;
const SECRET = 'whsec_fake_test_only';
const entry = fileURLToPath(new URL('../../fakes/stripe/server.ts', import.meta.url));

let dataDir: string;
let fake: RunningFakes | undefined;
let hook: http.Server;
let failuresLeft = 2;
const received: { id: string; type: string }[] = [];
const stripe = sdkFor(FAKE_PORT);

/** A receiver that verifies each delivery with the SDK and fails the first two on purpose. */
function receiver(): http.Server {
  return http.createServer((req, res) => {
    let body = '';
    req.on('data', (d) => (body += d));
    req.on('end', () => {
      try {
        const event = stripe.webhooks.constructEvent(
          body,
          String(req.headers['stripe-signature']),
          SECRET,
        );
        if (failuresLeft-- > 0) return void res.writeHead(500).end();
        received.push({ id: event.id, type: event.type });
        res.writeHead(200).end('{}');
      } catch {
        res.writeHead(400).end();
      }
    });
  });
}

const start = (): Promise<RunningFakes> =>
  startFakes(
    [
      {
        name: 'stripe',
        entry,
        port: FAKE_PORT,
        env: {
          FAKE_STRIPE_DATA_DIR: dataDir,
          FAKE_STRIPE_WEBHOOK_URL: `http://127.0.0.1:${HOOK_PORT}/hook`,
          FAKE_STRIPE_WEBHOOK_SECRET: SECRET,
          FAKE_STRIPE_CHAOS: '1',
          FAKE_STRIPE_RETRY_MS: '50',
        },
      },
    ],
    true,
  );

beforeAll(async () => {
  dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'dw-fake-stripe-'));
  hook = receiver().listen(HOOK_PORT, '127.0.0.1');
  fake = await start();
}, 60_000);

afterAll(async () => {
  await fake?.stop();
  hook?.close();
});

describe('payments fake', () => {
  test('does answer the SDK with Stripe-style errors', async () => {
    const noKey = await fetch(`http://127.0.0.1:${FAKE_PORT}/v1/customers`);
    expect(noKey.status).toBe(401);
    const err = await stripe.subscriptions.retrieve('sub_missing').catch((e: unknown) => e);
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 404, code: 'resource_missing' });
    const bad = await stripe.checkout.sessions
      .create({ mode: 'payment', success_url: 'http://x' })
      .catch((e: unknown) => e);
    expect(bad).toMatchObject({ statusCode: 400, type: 'StripeInvalidRequestError' });
  });

  test('does deliver signed events, retried after failures, duplicated and reordered with chaos', async () => {
    const product = await stripe.products.create({ name: 'Test seat' });
    const price = await stripe.prices.create({
      product: product.id,
      unit_amount: 500,
      currency: 'usd',
      recurring: { interval: 'month' },
    });
    const session = await stripe.checkout.sessions.create({
      mode: 'subscription',
      customer_email: 'a@example.test',
      line_items: [{ price: price.id, quantity: 2 }],
      subscription_data: { trial_period_days: 14 },
      success_url: 'http://127.0.0.1/ok',
    });
    expect((await payWith(session.url!, '4242424242424242')).status).toBe(303);
    const subId = (await stripe.checkout.sessions.retrieve(session.id)).subscription as string;
    await stripe.subscriptions.update(subId, { cancel_at_period_end: true });
    await stripe.subscriptions.update(subId, { cancel_at_period_end: false });
    const log = await deliveriesSettled(`http://127.0.0.1:${FAKE_PORT}`);
    expect(log.every((d) => d.status === 'delivered')).toBe(true);
    expect(log.some((d) => d.attempts > 1)).toBe(true); // the receiver's two failures were retried
    const unique = new Set(received.map((r) => r.id));
    expect(unique.size).toBe(log.length);
    const arrivals = log.map((d) => d.arrival!);
    expect(arrivals).not.toEqual([...arrivals].sort((a, b) => a - b)); // not in creation order
  });

  test('does keep its state in its data folder across a restart', async () => {
    const customer = await stripe.customers.create({ email: 'kept@example.test' });
    await fake!.stop();
    fake = await start();
    expect((await stripe.customers.retrieve(customer.id)) as Stripe.Customer).toMatchObject({
      email: 'kept@example.test',
    });
  });
});
