import type { APIRoute } from 'astro';
import { z } from 'zod';
import { BillingError, cancelPlan } from '../../../lib/billing/actions';
import { billingRoute } from '../../../lib/billing/http';
import { getDb } from '../../../lib/db/client';

const Body = z.object({ when: z.enum(['period_end', 'now']).default('period_end') });

/** Cancel the Crew plan at the end of the period, or now. Nothing is deleted. */
export const POST: APIRoute = (context) =>
  billingRoute(context, async (input, org) => {
    const parsed = Body.safeParse(input);
    if (!parsed.success)
      throw new BillingError(400, 'invalid_input', 'when must be period_end or now.');
    const sub = await cancelPlan(getDb(), org.id, parsed.data.when);
    return {
      json: { status: sub.status, cancelAtPeriodEnd: sub.cancelAtPeriodEnd },
      notice: 'cancelled',
    };
  });
