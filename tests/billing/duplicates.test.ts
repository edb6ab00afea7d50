import { count, eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { billingCustomers, billingEvents, memberships, subscriptions } from '../../db/schema';
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
  formAs,
  payWith,
  sdkFor,
  sessionFor,
} from './helpers';

// QA report s23, H1, H2, M6 and M8, replayed against the payments fake through the real SDK.
// Ports from the billing-fixes range 17200–17299.
const APP_PORT = 17201;
const FAKE_PORT = 17211;
const FAKE = `http://127.0.0.1:${FAKE_PORT}`;
const LEE = 'usr_demo_free';
const LEE_ORG = 'org_demo_lee';
const LIVE = ['trialing', 'active', 'past_due'];

let app: StartedApp;
let db: Db;
let stripe: Stripe;
let lee: ReturnType<typeof asUser>;
let leeForm: ReturnType<typeof formAs>;

beforeAll(async () => {
  app = await startApp(APP_PORT, {
    FAKE_STRIPE_PORT: String(FAKE_PORT),
    FAKE_RESEND_PORT: '17212',
    FAKE_STRIPE_CHAOS: '1',
    FAKE_STRIPE_RETRY_MS: '100',
    STRIPE_SECRET_KEY: '',
    STRIPE_WEBHOOK_SECRET: '',
  });
  db = appDb(app.dataDir);
  const token = sessionFor(db, LEE);
  lee = asUser(app.url, token);
  leeForm = formAs(app.url, token);
  stripe = sdkFor(FAKE_PORT);
}, 120_000);

afterAll(async () => {
  db?.$client.close();
  await app?.stop();
});

const leesCustomer = (): string =>
  db.select().from(billingCustomers).where(eq(billingCustomers.organisationId, LEE_ORG)).get()!
    .customerId;
const liveAtFake = async (): Promise<Stripe.Subscription[]> =>
  (await stripe.subscriptions.list({ customer: leesCustomer(), limit: 100 })).data.filter((s) =>
    LIVE.includes(s.status),
  );
const checkout = async (): Promise<string> => {
  const res = await lee('/api/billing/checkout', { json: { seats: 3, interval: 'month' } });
  expect(res.status).toBe(200);
  return ((await res.json()) as { url: string }).url;
};
/** Stop (empty) or restore the fake's webhook deliveries, as when events are late. */
const webhooks = async (url: string): Promise<void> => {
  await fetch(`${FAKE}/_fake/config`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ webhookUrl: url }),
  });
};

describe('checkout for a granted plan (M6)', () => {
  test('does not offer a purchase to the granted demo firm, and says what the grant means', async () => {
    const rosa = asUser(app.url, sessionFor(db, OWNER_ID));
    const page = await (await rosa('/app/billing')).text();
    expect(page).toContain('data-testid="granted-plan"');
    expect(page).toMatch(/granted: full use for 5 seats at no charge/);
    expect(page).not.toContain('action="/api/billing/checkout"');
    const res = await rosa('/api/billing/checkout', { json: { seats: 5, interval: 'month' } });
    expect(res.status).toBe(409);
    expect(((await res.json()) as { error: string }).error).toBe('granted_plan');
    const form = await formAs(app.url, sessionFor(db, OWNER_ID))('/api/billing/checkout', {
      seats: '5',
      interval: 'month',
    });
    expect(form.status).toBe(303);
    expect(form.headers.get('location')).toBe('/app/billing?error=granted_plan');
    expect(
      db.select().from(subscriptions).where(eq(subscriptions.organisationId, ORG_ID)).all(),
    ).toHaveLength(0);
  });
});

describe('two checkout pages for one organisation (H1)', () => {
  let first = '';
  let second = '';

  test('does keep only the older subscription when both pages are paid, cancelling the newer', async () => {
    const pageA = await checkout();
    const pageB = await checkout(); // opened before either is paid, as in a second tab
    expect((await payWith(pageB, '4242 4242 4242 4242')).status).toBe(303);
    await deliveriesSettled(FAKE);
    second = (await stripe.checkout.sessions.retrieve(pageB.split('/').pop()!))
      .subscription as string;
    expect((await payWith(pageA, '4242 4242 4242 4242')).status).toBe(303);
    await deliveriesSettled(FAKE);
    first = (await stripe.checkout.sessions.retrieve(pageA.split('/').pop()!))
      .subscription as string;
    expect((await liveAtFake()).map((s) => s.id)).toEqual([second]);
    const dup = await stripe.subscriptions.retrieve(first);
    expect(dup.status).toBe('canceled');
    expect(dup.metadata.duplicate_of).toBe(second);
    const row = db.select().from(subscriptions).where(eq(subscriptions.id, first)).get();
    expect(row).toMatchObject({ status: 'canceled', duplicateOf: second });
    const summary = (await (await lee('/api/billing/summary')).json()) as {
      subscription: { id: string };
    };
    expect(summary.subscription.id).toBe(second);
    expect(app.output()).toContain('second live subscription for one organisation');
  });

  test('does refuse a further checkout while the plan is live', async () => {
    const res = await lee('/api/billing/checkout', { json: { seats: 3, interval: 'month' } });
    expect(res.status).toBe(409);
    expect(((await res.json()) as { error: string }).error).toBe('already_subscribed');
  });

  test('does change nothing when the completion event comes again, by replay or under a new id', async () => {
    const { deliveries } = (await (await fetch(`${FAKE}/_fake/deliveries`)).json()) as {
      deliveries: { eventId: string; type: string }[];
    };
    const completions = deliveries.filter((d) => d.type === 'checkout.session.completed');
    const last = await stripe.events.retrieve(completions.at(-1)!.eventId);
    expect((last.data.object as { subscription: string }).subscription).toBe(first);
    await fetch(`${FAKE}/_fake/events/${last.id}/resend`, { method: 'POST' });
    await deliveriesSettled(FAKE);
    const rows = db.select({ n: count() }).from(billingEvents).where(eq(billingEvents.id, last.id));
    expect(rows.get()?.n).toBe(1);
    const payload = JSON.stringify({ ...last, id: 'evt_completion_again' });
    const res = await fetch(`${app.url}/api/webhooks/stripe`, {
      method: 'POST',
      headers: {
        'content-type': 'application/json',
        'stripe-signature': stripe.webhooks.generateTestHeaderString({
          payload,
          secret: FAKE_STRIPE_WEBHOOK_SECRET,
        }),
      },
      body: payload,
    });
    expect(res.status).toBe(200);
    expect((await liveAtFake()).map((s) => s.id)).toEqual([second]);
  });

  test('does refuse to start a checkout when the service holds a live plan our events have not shown yet', async () => {
    // The plan ends (the app hears of it), then a new one is paid while deliveries are off.
    const price = (await stripe.subscriptions.retrieve(second)).items.data[0].price.id;
    await stripe.subscriptions.cancel(second);
    await deliveriesSettled(FAKE);
    expect((await (await lee('/api/billing/summary')).json()) as object).toMatchObject({
      entitlement: { level: 'read_only' },
    });
    await webhooks('');
    const other = await stripe.checkout.sessions.create({
      mode: 'subscription',
      customer: leesCustomer(),
      client_reference_id: LEE_ORG,
      line_items: [{ price, quantity: 3 }],
      success_url: `${app.url}/app/billing?checkout=done`,
    });
    expect((await payWith(other.url!, '4242 4242 4242 4242')).status).toBe(303);
    await webhooks(`${app.url}/api/webhooks/stripe`);
    expect((await liveAtFake()).length).toBe(1);
    const res = await lee('/api/billing/checkout', { json: { seats: 3, interval: 'month' } });
    expect(res.status).toBe(409);
    expect(((await res.json()) as { error: string }).error).toBe('already_subscribed');
  });
});

describe('cancelling the plan (H2, M8)', () => {
  test('does refuse a cancel without confirmation and change nothing', async () => {
    const json = await lee('/api/billing/cancel', { json: { when: 'now' } });
    expect(json.status).toBe(400);
    expect(await json.json()).toMatchObject({ error: 'confirm_required' });
    const form = await leeForm('/api/billing/cancel', { when: 'now' });
    expect(form.status).toBe(303);
    expect(form.headers.get('location')).toBe('/app/billing?confirm=cancel&when=now');
    const page = await (await lee('/app/billing?confirm=cancel&when=now')).text();
    expect(page).toContain('data-testid="confirm-cancel"');
    expect(page).toContain('Yes, cancel the plan');
    expect(await liveAtFake()).toHaveLength(1);
    expect((await liveAtFake())[0].cancel_at_period_end).toBe(false);
  });

  test('does set every live subscription the service holds for the customer to end', async () => {
    // A second live one the app has not heard of (deliveries off), as after H1.
    const [known] = await liveAtFake();
    await webhooks('');
    const extra = await stripe.checkout.sessions.create({
      mode: 'subscription',
      customer: leesCustomer(),
      line_items: [{ price: known.items.data[0].price.id, quantity: 2 }],
      success_url: `${app.url}/app/billing?checkout=done`,
    });
    expect((await payWith(extra.url!, '4242 4242 4242 4242')).status).toBe(303);
    expect(await liveAtFake()).toHaveLength(2);
    const res = await leeForm('/api/billing/cancel', { when: 'period_end', confirm: 'yes' });
    expect(res.headers.get('location')).toBe('/app/billing?notice=cancelled');
    const live = await liveAtFake();
    expect(live.map((s) => s.cancel_at_period_end)).toEqual([true, true]);
    await webhooks(`${app.url}/api/webhooks/stripe`);
    for (const s of live)
      await fetch(`${FAKE}/_fake/subscriptions/${s.id}/advance`, { method: 'POST' });
    expect(await liveAtFake()).toHaveLength(0);
  });
});

describe('removing a team member (M8)', () => {
  test('does ask first and remove only on the confirming submit', async () => {
    const rosa = formAs(app.url, sessionFor(db, OWNER_ID));
    const stillThere = (): boolean =>
      db
        .select()
        .from(memberships)
        .where(eq(memberships.userId, 'usr_demo_crew1'))
        .all()
        .some((m) => m.organisationId === ORG_ID);
    const ask = await rosa('/app/team', { action: 'remove', target: 'usr_demo_crew1' });
    expect(ask.status).toBe(200);
    const html = await ask.text();
    expect(html).toContain('data-testid="confirm-remove"');
    expect(html).toContain('Remove Tomas Berg from Heronsgate');
    expect(stillThere()).toBe(true);
    const done = await rosa('/app/team', {
      action: 'remove',
      target: 'usr_demo_crew1',
      confirm: 'yes',
    });
    expect(await done.text()).toContain('Member removed.');
    expect(stillThere()).toBe(false);
  });
});
