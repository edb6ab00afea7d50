import type { APIRoute } from 'astro';
import { resumePlan } from '../../../lib/billing/actions';
import { billingRoute } from '../../../lib/billing/http';
import { getDb } from '../../../lib/db/client';

/** Keep a plan that was set to end at the end of the period. */
export const POST: APIRoute = (context) =>
  billingRoute(context, async (_input, org) => {
    const sub = await resumePlan(getDb(), org.id);
    return {
      json: { status: sub.status, cancelAtPeriodEnd: sub.cancelAtPeriodEnd },
      notice: 'resumed',
    };
  });
