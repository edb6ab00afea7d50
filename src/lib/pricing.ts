/**
 * What the pricing page shows. Display only: the billing code (src/lib/billing) owns what is
 * charged. Plan ids match `organisations.plan` ('free' | 'pro'). Prices are per seat.
 */
export type PlanId = 'free' | 'pro';

export interface PlanDisplay {
  id: PlanId;
  /** Our own plan name, shown as the card heading. */
  name: string;
  /** One line on who the plan is for. */
  pitch: string;
  /** Per seat, in whole currency units; 0 for the free plan. */
  monthly: number;
  yearly: number;
  features: readonly string[];
  cta: { label: string; href: string };
  /** Trial length in days, when the plan offers one. */
  trialDays?: number;
}

export const CURRENCY = 'USD';

export const PLANS: readonly PlanDisplay[] = [
  {
    id: 'free',
    name: 'Field',
    pitch: 'Every calculator, on any phone, with no account.',
    monthly: 0,
    yearly: 0,
    features: [
      'Quick check, siphon, gravity-line and drain-down tools',
      'Loss breakdown, drawdown curve and crest-pressure charts',
      'Share a result by link; works offline after one visit',
      'Public calculation API',
      'No sign-in needed',
    ],
    cta: { label: 'Open the quick check', href: '/check' },
  },
  {
    id: 'pro',
    name: 'Crew',
    pitch: 'For firms that document, price and keep a record of every job.',
    monthly: 19,
    yearly: 190,
    features: [
      'Everything in Field',
      'Saved jobs with clients, sites, notes and several calculations each',
      'Branded reports: your name, logo, colours, licence number and disclaimer',
      'E-mail reports to clients as PDF',
      'Export jobs and results',
      'Crew seats: invite and remove crew, change seats any time',
      'Read-only access and export if the plan lapses — your data stays',
    ],
    cta: { label: 'Start a 14-day trial', href: '/signin?next=/app/billing' },
    trialDays: 14,
  },
];

/** The plan's own name ('Field', 'Crew') for an organisation's plan id. */
export function planName(id: PlanId): string {
  return PLANS.find((p) => p.id === id)?.name ?? id;
}

/** A whole-unit price as text, e.g. "$19"; free shows "$0". */
export function formatPrice(amount: number, currency: string = CURRENCY): string {
  return new Intl.NumberFormat('en-US', {
    style: 'currency',
    currency,
    maximumFractionDigits: 0,
  }).format(amount);
}

/** Months saved by paying yearly rather than monthly (rounded down). */
export function monthsSavedYearly(plan: PlanDisplay): number {
  if (plan.monthly <= 0) return 0;
  return Math.floor((plan.monthly * 12 - plan.yearly) / plan.monthly);
}
