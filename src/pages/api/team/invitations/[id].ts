import type { APIRoute } from 'astro';
import { teamErrorStatus } from '../../../../lib/auth/team';
import { revokeInvitation } from '../../../../lib/data/invitations';
import { TeamError } from '../../../../lib/data/memberships';

/** Withdraw an open invitation of the owner's organisation (another organisation's id: 404). */
export const DELETE: APIRoute = ({ locals, params }) => {
  try {
    revokeInvitation(locals.organisation!.id, params.id ?? '');
    return new Response(null, { status: 204 });
  } catch (e) {
    if (e instanceof TeamError) return Response.json({ error: e.code, message: e.message }, { status: teamErrorStatus(e.code) });
    throw e;
  }
};
