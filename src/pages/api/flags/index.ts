import type { APIRoute } from 'astro';
import { getDb } from '../../../lib/db/client';
import { createFlag } from '../../../lib/flags/create';
import { invalid, jsonBody } from '../../../lib/flags/http';
import { sendReceivedEmail } from '../../../lib/flags/mail';
import { takeFlagPoint } from '../../../lib/flags/rate-limit';
import { newFlagSchema } from '../../../lib/flags/schemas';
import { routeClientAddress } from '../../../lib/server/client-address';

/** Flag a result: anyone may; signed-out reporters must leave an e-mail address. */
export const POST: APIRoute = async (context) => {
  const { request, locals } = context;
  const wait = await takeFlagPoint(routeClientAddress(context));
  if (wait !== null) {
    return Response.json(
      {
        error: 'rate_limited',
        message: `Too many flags from this address; try again in ${wait} s.`,
      },
      { status: 429, headers: { 'Retry-After': String(wait) } },
    );
  }
  const parsed = newFlagSchema.safeParse(await jsonBody(request));
  if (!parsed.success) return invalid(parsed.error);
  const email = locals.user?.email ?? parsed.data.email;
  if (!email) {
    return Response.json(
      {
        error: 'invalid_request',
        issues: [{ path: 'email', message: 'Leave an e-mail address so we can answer you.' }],
      },
      { status: 400 },
    );
  }
  const reporter = {
    userId: locals.user?.id ?? null,
    email,
    organisationId: locals.organisation?.id ?? null,
  };
  const { id, token } = createFlag(getDb(), parsed.data, reporter);
  const emailed = await sendReceivedEmail({
    to: email,
    flagId: id,
    token,
    reason: parsed.data.reason,
  });
  // `email` is where we write: the account's address when signed in, whatever was typed
  return Response.json({ id, status: 'new', emailed, email }, { status: 201 });
};
