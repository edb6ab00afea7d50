import type { APIRoute } from 'astro';
import { portalUrl } from '../../../lib/billing/invoices';
import { billingRoute } from '../../../lib/billing/http';
import { getDb } from '../../../lib/db/client';

/** Open the hosted billing portal (seats, card, cancel, invoices). */
export const POST: APIRoute = (context) =>
  billingRoute(context, async (_input, org) => {
    const origin = process.env.PUBLIC_URL || context.url.origin;
    const url = await portalUrl(getDb(), org.id, `${origin}/app/billing?notice=portal`);
    return { json: { url }, redirect: url };
  });
