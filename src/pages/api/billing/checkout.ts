import type { APIRoute } from 'astro';
import { z } from 'zod';
import { BillingError, startCheckout } from '../../../lib/billing/actions';
import { billingRoute } from '../../../lib/billing/http';
import { getDb } from '../../../lib/db/client';

const Body = z.object({
  interval: z.enum(['month', 'year']).default('month'),
  seats: z.coerce.number().int(),
});

/** Start the Crew plan: answers with (or redirects to) the hosted checkout page. */
export const POST: APIRoute = (context) =>
  billingRoute(context, async (input, org) => {
    const parsed = Body.safeParse(input);
    if (!parsed.success)
      throw new BillingError(
        400,
        'invalid_input',
        'Give seats (a whole number) and interval month or year.',
      );
    const url = await startCheckout(getDb(), {
      org,
      email: context.locals.user?.email ?? '',
      interval: parsed.data.interval,
      seats: parsed.data.seats,
      origin: process.env.PUBLIC_URL || context.url.origin,
    });
    return { json: { url }, redirect: url };
  });
