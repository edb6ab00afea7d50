import { randomBytes } from 'node:crypto';
import path from 'node:path';
import Stripe from 'stripe';
import { eq } from 'drizzle-orm';
import { organisations, sessions } from '../../db/schema';
import { openDatabase } from '../../src/lib/db/client';
import type { Db } from '../../src/lib/db/client';

export const OWNER_ID = 'usr_demo_owner';
export const ORG_ID = 'org_demo_heronsgate';
/** Auth.js's database-session cookie name (plain http). */
export const SESSION_COOKIE = 'authjs.session-token';

/** The app's own database file under its DATA_DIR. */
export function appDb(dataDir: string): Db {
  return openDatabase(path.join(dataDir, 'drainwright.sqlite'));
}

/**
 * The seeded firm's plan is granted (no subscription), and a granted plan cannot be bought on top;
 * tests that buy the plan as its owner first take the grant back.
 */
export function withdrawGrant(db: Db, organisationId: string): void {
  db.update(organisations).set({ plan: 'free' }).where(eq(organisations.id, organisationId)).run();
}

/**
 * A signed-in session for a seeded user, written straight into the sessions table as Auth.js
 * would after an e-mail link, so billing tests need not go through the inbox.
 */
export function sessionFor(db: Db, userId: string): string {
  const token = randomBytes(24).toString('hex');
  db.insert(sessions)
    .values({ sessionToken: token, userId, expires: new Date(Date.now() + 86_400_000) })
    .run();
  return token;
}

/** fetch against the app as a signed-in browser would (cookie and same-site Origin). */
export function asUser(base: string, token: string) {
  return (pathname: string, init: { method?: string; json?: unknown } = {}): Promise<Response> =>
    fetch(`${base}${pathname}`, {
      method: init.method ?? (init.json ? 'POST' : 'GET'),
      headers: {
        cookie: `${SESSION_COOKIE}=${token}`,
        origin: base,
        ...(init.json ? { 'content-type': 'application/json' } : {}),
      },
      body: init.json ? JSON.stringify(init.json) : undefined,
      redirect: 'manual',
    });
}

/** A plain HTML form post as a signed-in browser sends it (no script). */
export function formAs(base: string, token: string) {
  return (pathname: string, fields: Record<string, string>): Promise<Response> =>
    fetch(`${base}${pathname}`, {
      method: 'POST',
      headers: {
        cookie: `${SESSION_COOKIE}=${token}`,
        origin: base,
        'content-type': 'application/x-www-form-urlencoded',
      },
      body: new URLSearchParams(fields),
      redirect: 'manual',
    });
}

/** The real SDK pointed at a fake on this port. */
export function sdkFor(port: number): Stripe {
  return new Stripe('sk_test_drainwright_fake', {
    host: '127.0.0.1',
    port,
    protocol: 'http',
    maxNetworkRetries: 0,
  });
}

export interface Delivery {
  eventId: string;
  type: string;
  status: string;
  copies: number;
  attempts: number;
  arrival?: number;
}

/** Wait until the fake has no delivery pending (retries included). */
export async function deliveriesSettled(fakeUrl: string, timeoutMs = 20_000): Promise<Delivery[]> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const body = (await (await fetch(`${fakeUrl}/_fake/deliveries`)).json()) as {
      pending: number;
      deliveries: Delivery[];
    };
    if (body.pending === 0) return body.deliveries;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('webhook deliveries did not settle');
}

/** Submit the fake's hosted checkout form with a test card. */
export function payWith(checkoutUrl: string, number: string): Promise<Response> {
  return fetch(checkoutUrl, {
    method: 'POST',
    body: new URLSearchParams({
      number,
      expiry: '12 / 34',
      cvc: '123',
      email: 'rosa@heronsgate.example',
      name: 'Rosa Delgado',
    }),
    redirect: 'manual',
  });
}
