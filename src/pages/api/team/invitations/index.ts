import type { APIRoute } from 'astro';
import { InviteInput, inviteCrew, teamErrorStatus } from '../../../../lib/auth/team';
import { listPendingInvitations } from '../../../../lib/data/invitations';
import { TeamError } from '../../../../lib/data/memberships';
import { EmailError } from '../../../../lib/email/send';

/** Open invitations of the owner's organisation. */
export const GET: APIRoute = ({ locals }) => {
  return Response.json({ invitations: listPendingInvitations(locals.organisation!.id) });
};

/** Invite someone by e-mail: { email, role? } → 201 { id, expiresAt }. */
export const POST: APIRoute = async ({ locals, request, url }) => {
  const body = await request.json().catch(() => null);
  const parsed = InviteInput.safeParse(body);
  if (!parsed.success) return Response.json({ error: 'invalid', issues: parsed.error.issues }, { status: 400 });
  try {
    const made = await inviteCrew(locals.organisation!, locals.user!, parsed.data, url.origin);
    return Response.json(made, { status: 201 });
  } catch (e) {
    if (e instanceof TeamError) return Response.json({ error: e.code, message: e.message }, { status: teamErrorStatus(e.code) });
    if (e instanceof EmailError) return Response.json({ error: 'email_failed', message: e.message }, { status: 502 });
    throw e;
  }
};
