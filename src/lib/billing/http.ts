import type { APIContext } from 'astro';
import { BillingError } from './actions';
import { BillingUnavailableError } from './stripe-client';
import { logger } from '../server/logger';

/**
 * The billing API answers two kinds of caller: scripts and islands sending JSON get JSON; plain
 * HTML forms on /app/billing get a 303 back to the page (or on to a hosted page) with a notice.
 */
export function isFormPost(request: Request): boolean {
  const type = request.headers.get('content-type') ?? '';
  return type.includes('application/x-www-form-urlencoded') || type.includes('multipart/form-data');
}

export async function readInput(request: Request): Promise<Record<string, unknown>> {
  if (request.method === 'GET') return {};
  const unreadable = (): never => {
    throw new BillingError(400, 'invalid_body', 'The request body could not be read.');
  };
  if (isFormPost(request))
    return Object.fromEntries((await request.formData().catch(unreadable)).entries());
  const text = await request.text().catch(unreadable);
  if (!text) return {};
  try {
    const value: unknown = JSON.parse(text);
    return value && typeof value === 'object' ? (value as Record<string, unknown>) : {};
  } catch {
    throw new BillingError(400, 'invalid_json', 'The request body is not valid JSON.');
  }
}

export type Outcome = { json: Record<string, unknown>; redirect?: string; notice?: string };

const back = (params: Record<string, string>): string =>
  `/app/billing?${new URLSearchParams(params)}`;

/** Run a billing action and answer in the caller's style; known refusals never become a 500. */
export async function billingRoute(
  context: APIContext,
  action: (input: Record<string, unknown>, org: { id: string; name: string }) => Promise<Outcome>,
): Promise<Response> {
  const form = isFormPost(context.request);
  try {
    const org = context.locals.organisation;
    if (!org) throw new BillingError(403, 'no_organisation', 'No current organisation.');
    const outcome = await action(await readInput(context.request), org);
    if (!form) return Response.json(outcome.json);
    return context.redirect(outcome.redirect ?? back({ notice: outcome.notice ?? 'done' }), 303);
  } catch (error) {
    const known =
      error instanceof BillingError
        ? error
        : error instanceof BillingUnavailableError
          ? new BillingError(503, 'billing_unavailable', error.message)
          : paymentsError(error);
    if (form) return context.redirect(back({ error: known.code }), 303);
    return Response.json({ error: known.code, message: known.message }, { status: known.status });
  }
}

function paymentsError(error: unknown): BillingError {
  const e = error as { type?: string; message?: string };
  if (typeof e?.type === 'string' && e.type.startsWith('Stripe')) {
    logger.error({ err: error, stripeType: e.type }, 'payments service refused a request');
    return new BillingError(
      502,
      'payments_error',
      'The payments service did not accept the request. Try again shortly.',
    );
  }
  throw error;
}
