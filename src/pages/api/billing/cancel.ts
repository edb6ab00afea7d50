import type { APIRoute } from 'astro';
import { z } from 'zod';
import { BillingError, cancelPlan } from '../../../lib/billing/actions';
import { billingRoute, isFormPost } from '../../../lib/billing/http';
import { getDb } from '../../../lib/db/client';

const Body = z.object({
  when: z.enum(['period_end', 'now']).default('period_end'),
  // A form sends "yes" from the confirmation step; a script sends true.
  confirm: z
    .unknown()
    .optional()
    .transform((v) => v === true || v === 'yes'),
});

/**
 * Cancel the Crew plan at the end of the period, or now. Nothing is deleted. Only a confirmed
 * request acts: the page's first submit is sent back to be confirmed, a script must say so.
 */
export const POST: APIRoute = (context) =>
  billingRoute(context, async (input, org) => {
    const parsed = Body.safeParse(input);
    if (!parsed.success)
      throw new BillingError(400, 'invalid_input', 'when must be period_end or now.');
    const { when, confirm } = parsed.data;
    if (!confirm && isFormPost(context.request))
      return { json: {}, redirect: `/app/billing?confirm=cancel&when=${when}` };
    if (!confirm)
      throw new BillingError(
        400,
        'confirm_required',
        'Cancelling the plan needs confirmation: send confirm: true. Nothing was changed.',
      );
    const sub = await cancelPlan(getDb(), org.id, when);
    return {
      json: { status: sub.status, cancelAtPeriodEnd: sub.cancelAtPeriodEnd },
      notice: 'cancelled',
    };
  });
