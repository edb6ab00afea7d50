import { count, eq } from 'drizzle-orm';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { billingEvents, jobs, subscriptions } from '../../db/schema';
import { FAKE_STRIPE_WEBHOOK_SECRET } from '../../fakes/stripe/spec';
import type { Db } from '../../src/lib/db/client';
import { startApp } from '../helpers/server';
import type { StartedApp } from '../helpers/server';
import {
  ORG_ID,
  OWNER_ID,
  appDb,
  asUser,
  deliveriesSettled,
  payWith,
  sdkFor,
  sessionFor,
  withdrawGrant,
} from './helpers';

// Ports from the billing range 16400–16499.
const APP_PORT = 16401;
const FAKE_PORT = 16411;
const FAKE = `http://127.0.0.1:${FAKE_PORT}`;

let app: StartedApp;
let db: Db;
let call: ReturnType<typeof asUser>;
let stripe: Stripe;

interface Summary {
  entitlement: {
    level: string;
    canWrite: boolean;
    canExport: boolean;
    seatsPaid: number;
    status: string;
  };
  seatsInUse: number;
  subscription: { id: string; status: string; seats: number; cancelAtPeriodEnd: boolean } | null;
}
const summary = async (): Promise<Summary> =>
  (await (await call('/api/billing/summary')).json()) as Summary;

beforeAll(async () => {
  app = await startApp(APP_PORT, {
    FAKE_STRIPE_PORT: String(FAKE_PORT),
    FAKE_RESEND_PORT: '16412',
    FAKE_STRIPE_CHAOS: '1',
    STRIPE_SECRET_KEY: '',
    STRIPE_WEBHOOK_SECRET: '',
  });
  db = appDb(app.dataDir);
  withdrawGrant(db, ORG_ID);
  call = asUser(app.url, sessionFor(db, OWNER_ID));
  stripe = sdkFor(FAKE_PORT);
}, 120_000);

afterAll(async () => {
  db?.$client.close();
  await app?.stop();
});

describe('billing loop against the payments fake', () => {
  let checkoutUrl = '';

  test('does start a checkout for the seeded owner, on the fake, with a seat quantity', async () => {
    const before = await summary();
    expect(before.subscription).toBeNull();
    expect(before.seatsInUse).toBe(3); // seeded: owner and two crew
    const low = await call('/api/billing/checkout', { json: { seats: 2, interval: 'month' } });
    expect(low.status).toBe(409);
    expect(((await low.json()) as { error: string }).error).toBe('seats_below_members');
    const res = await call('/api/billing/checkout', { json: { seats: 4, interval: 'month' } });
    expect(res.status).toBe(200);
    checkoutUrl = ((await res.json()) as { url: string }).url;
    expect(checkoutUrl.startsWith(`${FAKE}/pay/cs_test_`)).toBe(true);
  });

  test('does keep billing to the owner: crew get 403', async () => {
    const crew = asUser(app.url, sessionFor(db, 'usr_demo_crew1'));
    expect((await crew('/api/billing/summary')).status).toBe(403);
    expect((await crew('/api/billing/checkout', { json: { seats: 9 } })).status).toBe(403);
    expect((await crew('/app/billing')).status).toBe(403);
  });

  test('does refuse the declining test card and change nothing', async () => {
    const res = await payWith(checkoutUrl, '4000 0000 0000 0002');
    expect(res.status).toBe(402);
    expect(await res.text()).toContain('Your card was declined.');
    await deliveriesSettled(FAKE);
    expect((await summary()).subscription).toBeNull();
  });

  test('does give full access with a 14-day trial once the webhook lands', async () => {
    const res = await payWith(checkoutUrl, '4242 4242 4242 4242');
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toContain(
      `${app.url}/app/billing?checkout=done&session=cs_test_`,
    );
    await deliveriesSettled(FAKE);
    const s = await summary();
    expect(s.subscription?.status).toBe('trialing');
    expect(s.entitlement).toMatchObject({ level: 'full', canWrite: true, seatsPaid: 4 });
    const sub = await stripe.subscriptions.retrieve(s.subscription!.id);
    expect(sub.trial_end! - sub.trial_start!).toBe(14 * 86_400);
  });

  test('does stop invitations at the paid seats', async () => {
    const first = await call('/api/team/invitations', {
      json: { email: 'new.crew@heronsgate.example' },
    });
    expect(first.status).toBe(201);
    const second = await call('/api/team/invitations', {
      json: { email: 'one.more@heronsgate.example' },
    });
    expect(((await second.json()) as { error: string }).error).toBe('seat_limit'); // 3 members + 1 invited = 4 paid
    expect((await summary()).seatsInUse).toBe(4);
  });

  test('does change seats through the SDK and refuse to go below the seats in use', async () => {
    const low = await call('/api/billing/seats', { json: { seats: 3 } });
    expect(low.status).toBe(409); // 4 in use
    const ok = await call('/api/billing/seats', { json: { seats: 6 } });
    expect(ok.status).toBe(200);
    const s = await summary();
    expect(s.entitlement.seatsPaid).toBe(6);
    expect((await stripe.subscriptions.retrieve(s.subscription!.id)).items.data[0].quantity).toBe(
      6,
    );
  });

  test('does list invoices from the service', async () => {
    const body = (await (await call('/api/billing/invoices')).json()) as {
      invoices: { amount: number; status: string }[];
    };
    expect(body.invoices.length).toBeGreaterThanOrEqual(1);
    expect(body.invoices.at(-1)).toMatchObject({ amount: 0, status: 'paid' }); // the trial's zero invoice
  });

  test('does put seats back up to the members when the portal sets fewer', async () => {
    const portal = (await (await call('/api/billing/portal', { json: {} })).json()) as {
      url: string;
    };
    expect(portal.url.startsWith(`${FAKE}/portal/`)).toBe(true);
    const subId = (await summary()).subscription!.id;
    const res = await fetch(`${portal.url}/seats`, {
      method: 'POST',
      body: new URLSearchParams({ subscription: subId, quantity: '1' }),
      redirect: 'manual',
    });
    expect(res.status).toBe(303);
    await deliveriesSettled(FAKE);
    await new Promise((r) => setTimeout(r, 300));
    await deliveriesSettled(FAKE);
    expect((await stripe.subscriptions.retrieve(subId)).items.data[0].quantity).toBe(4);
    expect((await summary()).entitlement.seatsPaid).toBe(4);
  });

  test('does turn read-only with export after cancelling in the portal, and keeps every job', async () => {
    const portal = (await (await call('/api/billing/portal', { json: {} })).json()) as {
      url: string;
    };
    const subId = (await summary()).subscription!.id;
    const res = await fetch(`${portal.url}/cancel`, {
      method: 'POST',
      body: new URLSearchParams({ subscription: subId, when: 'now' }),
      redirect: 'manual',
    });
    expect(res.status).toBe(303);
    await deliveriesSettled(FAKE);
    const s = await summary();
    expect(s.subscription?.status).toBe('canceled');
    expect(s.entitlement).toMatchObject({ level: 'read_only', canWrite: false, canExport: true });
    const invite = await call('/api/team/invitations', {
      json: { email: 'late@heronsgate.example' },
    });
    expect(((await invite.json()) as { error: string }).error).toBe('seat_limit');
    const kept = db.select({ n: count() }).from(jobs).where(eq(jobs.organisationId, ORG_ID)).get();
    expect(kept?.n).toBe(3); // the seeded jobs, untouched
  });
});

describe('a card that fails after sign-up', () => {
  test('does restart without a trial, fall past due with a banner, turn read-only when unpaid, recover on a new card', async () => {
    const res = await call('/api/billing/checkout', { json: { seats: 4, interval: 'year' } });
    const { url } = (await res.json()) as { url: string };
    expect((await payWith(url, '4000 0000 0000 0341')).status).toBe(303);
    await deliveriesSettled(FAKE);
    const started = await summary();
    expect(started.subscription?.status).toBe('active'); // a returning customer gets no second trial
    const id = started.subscription!.id;
    await fetch(`${FAKE}/_fake/subscriptions/${id}/advance`, { method: 'POST' });
    await deliveriesSettled(FAKE);
    const late = await summary();
    expect(late.subscription?.status).toBe('past_due');
    expect(late.entitlement).toMatchObject({ level: 'full', canWrite: true });
    expect((late.entitlement as { banner?: string }).banner).toContain('Crew payment failed');
    await fetch(`${FAKE}/_fake/subscriptions/${id}/advance`, { method: 'POST' });
    await deliveriesSettled(FAKE);
    const unpaid = await summary();
    expect(unpaid.subscription?.status).toBe('unpaid');
    expect(unpaid.entitlement).toMatchObject({ level: 'read_only', canExport: true });
    // Paying with another card in the portal brings the plan back.
    const portal = (await (await call('/api/billing/portal', { json: {} })).json()) as {
      url: string;
    };
    const card = { subscription: id, number: '4242 4242 4242 4242', expiry: '12 / 34', cvc: '123' };
    const paid = await fetch(`${portal.url}/card`, {
      method: 'POST',
      body: new URLSearchParams(card),
      redirect: 'manual',
    });
    expect(paid.status).toBe(303);
    await deliveriesSettled(FAKE);
    expect((await summary()).entitlement).toMatchObject({ level: 'full', status: 'active' });
  });
});

describe('webhook endpoint', () => {
  const post = (payload: string, header: string): Promise<Response> =>
    fetch(`${app.url}/api/webhooks/stripe`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'stripe-signature': header },
      body: payload,
    });
  const signed = (payload: string, secret = FAKE_STRIPE_WEBHOOK_SECRET): string =>
    stripe.webhooks.generateTestHeaderString({ payload, secret });

  test('does answer 400 to a forged signature and to none', async () => {
    const payload = JSON.stringify({
      id: 'evt_forged',
      object: 'event',
      type: 'customer.subscription.updated',
      created: 1,
      data: { object: {} },
    });
    expect((await post(payload, signed(payload, 'whsec_someone_else'))).status).toBe(400);
    expect((await post(payload, 't=1,v1=deadbeef')).status).toBe(400);
    const unsigned = {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: payload,
    };
    expect((await fetch(`${app.url}/api/webhooks/stripe`, unsigned)).status).toBe(400);
    expect(
      db.select().from(billingEvents).where(eq(billingEvents.id, 'evt_forged')).get(),
    ).toBeUndefined();
  });

  test('does record each event id once: a replayed event changes nothing', async () => {
    const events = (await (await fetch(`${FAKE}/_fake/deliveries`)).json()) as {
      deliveries: { eventId: string; copies: number }[];
    };
    const first = events.deliveries[0].eventId;
    expect(events.deliveries.some((d) => d.copies > 1)).toBe(true); // chaos did duplicate some
    const event = await stripe.events.retrieve(first);
    const payload = JSON.stringify(event);
    const res = await post(payload, signed(payload));
    expect(res.status).toBe(200);
    expect(((await res.json()) as { outcome: string }).outcome).toBe('duplicate');
    const rows = db
      .select({ n: count() })
      .from(billingEvents)
      .where(eq(billingEvents.id, first))
      .get();
    expect(rows?.n).toBe(1);
  });

  test('does not roll back: a late copy of the trial-start event leaves that subscription ended', async () => {
    const all = (await (await fetch(`${FAKE}/_fake/deliveries`)).json()) as {
      deliveries: { eventId: string; type: string }[];
    };
    const created = all.deliveries.find((d) => d.type === 'customer.subscription.created')!; // the trial's
    const old = await stripe.events.retrieve(created.eventId);
    // The same stale content under a new id, as a late event from another source would arrive.
    const late = JSON.stringify({ ...old, id: 'evt_late_copy_1', created: old.created + 1 });
    const res = await post(late, signed(late));
    expect(res.status).toBe(200);
    const subId = (old.data.object as { id: string }).id;
    expect(db.select().from(subscriptions).where(eq(subscriptions.id, subId)).get()?.status).toBe(
      'canceled',
    );
    expect((await summary()).subscription?.status).toBe('active'); // the newer plan, untouched
  });
});
