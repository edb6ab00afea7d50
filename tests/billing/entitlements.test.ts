import { eq } from 'drizzle-orm';
import { beforeEach, describe, expect, test } from 'vitest';
import { memberships, organisations, subscriptions, users } from '../../db/schema';
import { checkoutRefusal, entitlementFor, planRefusal } from '../../src/lib/billing/entitlements';
import { applySubscription, staleReason } from '../../src/lib/billing/sync';
import type { SubscriptionRow } from '../../src/lib/billing/sync';
import type { Db } from '../../src/lib/db/client';
import { freshDb } from '../helpers/db';

const DAY = 86_400_000;
const T0 = new Date(Date.UTC(2026, 11, 1, 9));
let db: Db;

function row(overrides: Partial<SubscriptionRow> = {}): SubscriptionRow {
  return {
    id: 'sub_1',
    organisationId: 'org_a',
    customerId: 'cus_1',
    status: 'active',
    priceId: 'price_m',
    itemId: 'si_1',
    interval: 'month',
    seats: 4,
    cancelAtPeriodEnd: false,
    currentPeriodStart: T0,
    currentPeriodEnd: new Date(T0.getTime() + 30 * DAY),
    trialEnd: null,
    canceledAt: null,
    endedAt: null,
    startedAt: T0,
    pastDueSince: null,
    syncedAt: T0,
    duplicateOf: null,
    ...overrides,
  };
}
const apply = (r: SubscriptionRow): 'applied' | 'stale' =>
  db.transaction((tx) => applySubscription(tx, r));

beforeEach(() => {
  db = freshDb().db;
  db.insert(organisations).values({ id: 'org_a', name: 'Test Drains', plan: 'free' }).run();
  db.insert(users).values({ id: 'u1', email: 'o@example.test' }).run();
  db.insert(memberships).values({ organisationId: 'org_a', userId: 'u1', role: 'owner' }).run();
});

describe('entitlementFor', () => {
  test('does give a free organisation no Pro features', () => {
    const e = entitlementFor(db, 'org_a');
    expect(e).toMatchObject({ level: 'none', canWrite: false, canExport: false, seatsPaid: 0 });
    expect(planRefusal(e, 'read')?.status).toBe(403);
  });

  test('does give trialing and active full use with the paid seats', () => {
    apply(row({ status: 'trialing' }));
    expect(entitlementFor(db, 'org_a')).toMatchObject({
      level: 'full',
      canWrite: true,
      seatsPaid: 4,
    });
    apply(row({ status: 'active', syncedAt: new Date(T0.getTime() + 1) }));
    expect(entitlementFor(db, 'org_a').level).toBe('full');
    expect(db.select().from(organisations).where(eq(organisations.id, 'org_a')).get()?.plan).toBe(
      'pro',
    );
  });

  test('does keep past due in full use with a banner for 7 days, then read-only', () => {
    apply(row({ status: 'past_due', pastDueSince: T0 }));
    const inGrace = entitlementFor(db, 'org_a', new Date(T0.getTime() + 6.9 * DAY));
    expect(inGrace.level).toBe('full');
    expect(inGrace.banner).toContain('2026-12-08');
    const after = entitlementFor(db, 'org_a', new Date(T0.getTime() + 7.1 * DAY));
    expect(after).toMatchObject({ level: 'read_only', canWrite: false, canExport: true });
  });

  test('does make canceled and unpaid read-only with export', async () => {
    apply(row({ status: 'unpaid' }));
    const unpaid = entitlementFor(db, 'org_a');
    expect(unpaid).toMatchObject({ level: 'read_only', canExport: true });
    const refused = planRefusal(unpaid, 'write')!;
    expect(refused.status).toBe(403);
    expect(await refused.json()).toMatchObject({ error: 'read_only' });
    expect(planRefusal(unpaid, 'export')).toBeNull();
    apply(row({ status: 'canceled', endedAt: T0, syncedAt: new Date(T0.getTime() + 1) }));
    expect(entitlementFor(db, 'org_a').level).toBe('read_only');
    expect(db.select().from(subscriptions).all()).toHaveLength(1); // kept, not deleted
  });

  test('does grant a Pro-marked organisation without a subscription (demo accounts)', () => {
    db.update(organisations).set({ plan: 'pro' }).run();
    expect(entitlementFor(db, 'org_a')).toMatchObject({
      level: 'full',
      status: 'granted',
      seatsPaid: 5,
    });
  });
});

describe('checkoutRefusal', () => {
  test('does refuse a checkout to a granted organisation and say what the grant is', () => {
    db.update(organisations).set({ plan: 'pro' }).run();
    const refusal = checkoutRefusal(entitlementFor(db, 'org_a'));
    expect(refusal?.code).toBe('granted_plan');
    expect(refusal?.message).toMatch(/granted.*5 seats.*no charge/);
  });

  test('does refuse while a subscription is live and allow it once the plan has ended', () => {
    for (const status of ['trialing', 'active', 'past_due'] as const) {
      db.delete(subscriptions).run();
      apply(row({ status }));
      expect(checkoutRefusal(entitlementFor(db, 'org_a'))?.code).toBe('already_subscribed');
    }
    apply(row({ status: 'canceled', endedAt: T0, syncedAt: new Date(T0.getTime() + 1) }));
    expect(checkoutRefusal(entitlementFor(db, 'org_a'))).toBeNull();
  });

  test('does allow a free organisation to start', () => {
    expect(checkoutRefusal(entitlementFor(db, 'org_a'))).toBeNull();
  });
});

describe('applySubscription', () => {
  test('does refuse a state read before the stored one', () => {
    apply(row({ seats: 6, syncedAt: new Date(T0.getTime() + 5000) }));
    expect(apply(row({ seats: 2, syncedAt: T0 }))).toBe('stale');
    expect(entitlementFor(db, 'org_a').seatsPaid).toBe(6);
  });

  test('does refuse to bring an ended subscription back or go back a period', () => {
    const ended = row({ status: 'canceled', endedAt: T0 });
    expect(staleReason(ended, row({ syncedAt: new Date(T0.getTime() + 1) }))).toMatch(/ended/);
    const later = row({ currentPeriodStart: new Date(T0.getTime() + 30 * DAY) });
    expect(staleReason(later, row({ syncedAt: new Date(T0.getTime() + 1) }))).toMatch(
      /earlier billing period/,
    );
  });

  test('does keep the first past-due time across later reads, so the grace is not extended', () => {
    apply(row({ status: 'past_due', pastDueSince: T0, syncedAt: T0 }));
    const later = new Date(T0.getTime() + 3 * DAY);
    apply(row({ status: 'past_due', pastDueSince: later, syncedAt: later }));
    expect(db.select().from(subscriptions).get()?.pastDueSince?.getTime()).toBe(T0.getTime());
  });
});
