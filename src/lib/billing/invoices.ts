import { eq } from 'drizzle-orm';
import { billingCustomers } from '../../../db/schema';
import type { Db } from '../db/client';
import { BillingError } from './actions';
import { getStripe } from './stripe-client';

/** A hosted portal session for the organisation's customer. */
export async function portalUrl(
  db: Db,
  organisationId: string,
  returnUrl: string,
): Promise<string> {
  const known = db
    .select()
    .from(billingCustomers)
    .where(eq(billingCustomers.organisationId, organisationId))
    .get();
  if (!known)
    throw new BillingError(
      409,
      'no_customer',
      'Start the Crew plan first; there is nothing to manage yet.',
    );
  const session = await getStripe().billingPortal.sessions.create({
    customer: known.customerId,
    return_url: returnUrl,
  });
  return session.url;
}

export interface InvoiceLine {
  id: string;
  number: string | null;
  created: Date;
  amount: number;
  currency: string;
  status: string | null;
  url: string | null;
}

/** The latest invoices, newest first. */
export async function listInvoices(
  db: Db,
  organisationId: string,
  limit = 12,
): Promise<InvoiceLine[]> {
  const known = db
    .select()
    .from(billingCustomers)
    .where(eq(billingCustomers.organisationId, organisationId))
    .get();
  if (!known) return [];
  const list = await getStripe().invoices.list({ customer: known.customerId, limit });
  return list.data.map((i) => ({
    id: i.id ?? '',
    number: i.number,
    created: new Date(i.created * 1000),
    amount: i.amount_due,
    currency: i.currency,
    status: i.status,
    url: i.hosted_invoice_url ?? null,
  }));
}
