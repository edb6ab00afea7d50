import type { APIRoute } from 'astro';
import { z } from 'zod';
import { BillingError, changeSeats } from '../../../lib/billing/actions';
import { billingRoute } from '../../../lib/billing/http';
import { getDb } from '../../../lib/db/client';

const Body = z.object({ seats: z.coerce.number().int() });

/** Change the number of paid seats (never below the seats in use). */
export const POST: APIRoute = (context) =>
  billingRoute(context, async (input, org) => {
    const parsed = Body.safeParse(input);
    if (!parsed.success)
      throw new BillingError(400, 'invalid_seats', 'Seats must be a whole number.');
    const sub = await changeSeats(getDb(), org.id, parsed.data.seats);
    return { json: { seats: sub.seats, status: sub.status }, notice: 'seats_changed' };
  });
