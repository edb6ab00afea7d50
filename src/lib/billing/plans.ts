import { PLANS as DISPLAY } from '../pricing';

/**
 * What is charged. Plan ids match `organisations.plan`; names and per-seat prices come from the
 * pricing page's data (src/lib/pricing.ts) so the page and the bill cannot disagree.
 */
export type BillingInterval = 'month' | 'year';

export const TRIAL_DAYS = 14;
/** Days a past-due organisation keeps full use (with a banner) before it turns read-only. */
export const GRACE_DAYS = 7;
/** Seats for an organisation marked Pro without any subscription (demo or complimentary). */
export const GRANTED_SEATS = 5;
export const MAX_SEATS = 500;

const pro = DISPLAY.find((p) => p.id === 'pro')!;
const free = DISPLAY.find((p) => p.id === 'free')!;

export const PLAN_NAMES = { free: free.name, pro: pro.name } as const;

/** The product and its two per-seat prices, found (or created once) by lookup key. */
export const PRO_PRODUCT = {
  name: `Drainwright ${pro.name}`,
  description: pro.pitch,
} as const;

export interface PriceSpec {
  interval: BillingInterval;
  lookupKey: string;
  /** Per seat, in cents. */
  unitAmount: number;
  currency: string;
}

export const PRO_PRICES: Record<BillingInterval, PriceSpec> = {
  month: {
    interval: 'month',
    lookupKey: 'drainwright_crew_seat_monthly',
    unitAmount: pro.monthly * 100,
    currency: 'usd',
  },
  year: {
    interval: 'year',
    lookupKey: 'drainwright_crew_seat_yearly',
    unitAmount: pro.yearly * 100,
    currency: 'usd',
  },
};
