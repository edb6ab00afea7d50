import type { z } from 'zod';
import type { StaffActor } from './audit';
import { FlagActionError } from './thread';
import { issuesOf } from './schemas';

/**
 * The staff member behind a request. The route table already keeps others out of /api/support;
 * checking again here means a routing slip can never open the desk.
 */
export function staffOf(locals: App.Locals): StaffActor | null {
  const u = locals.user;
  if (!u || (u.staffRole !== 'support' && u.staffRole !== 'admin')) return null;
  return { id: u.id, email: u.email, staffRole: u.staffRole };
}

export function forbidden(): Response {
  return Response.json({ error: 'forbidden' }, { status: 403 });
}

export function invalid(error: z.ZodError): Response {
  return Response.json({ error: 'invalid_request', issues: issuesOf(error) }, { status: 400 });
}

/** The request body as JSON, or undefined when it is not JSON (the schema then rejects it). */
export async function jsonBody(request: Request): Promise<unknown> {
  try {
    return await request.json();
  } catch {
    return undefined;
  }
}

/** A desk action's refusal as JSON; anything else is re-thrown. */
export function actionError(err: unknown): Response {
  if (err instanceof FlagActionError) {
    return Response.json(
      { error: err.status === 404 ? 'not_found' : 'invalid_request', message: err.message },
      { status: err.status },
    );
  }
  throw err;
}
