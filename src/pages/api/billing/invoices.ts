import type { APIRoute } from 'astro';
import { listInvoices } from '../../../lib/billing/invoices';
import { billingRoute } from '../../../lib/billing/http';
import { getDb } from '../../../lib/db/client';

/** The organisation's latest invoices, newest first. */
export const GET: APIRoute = (context) =>
  billingRoute(context, async (_input, org) => ({
    json: { invoices: await listInvoices(getDb(), org.id) },
  }));
