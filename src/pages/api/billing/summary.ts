import type { APIRoute } from 'astro';
import { billingSummary } from '../../../lib/billing/summary';
import { billingRoute } from '../../../lib/billing/http';
import { getDb } from '../../../lib/db/client';

/** Plan, status, seats paid and in use, and the entitlement the server applies. */
export const GET: APIRoute = (context) =>
  billingRoute(context, async (_input, org) => ({ json: { ...billingSummary(getDb(), org.id) } }));
