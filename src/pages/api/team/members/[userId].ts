import type { APIRoute } from 'astro';
import { RoleInput, teamErrorStatus } from '../../../../lib/auth/team';
import { TeamError, changeRole, removeMember } from '../../../../lib/data/memberships';

function refused(e: unknown): Response {
  if (e instanceof TeamError) return Response.json({ error: e.code, message: e.message }, { status: teamErrorStatus(e.code) });
  throw e;
}

/** Change a member's role: { role } → 200. Members of other organisations are not found. */
export const PATCH: APIRoute = async ({ locals, params, request }) => {
  const parsed = RoleInput.safeParse(await request.json().catch(() => null));
  if (!parsed.success) return Response.json({ error: 'invalid', issues: parsed.error.issues }, { status: 400 });
  try {
    changeRole(locals.organisation!.id, params.userId ?? '', parsed.data.role);
    return Response.json({ userId: params.userId, role: parsed.data.role });
  } catch (e) {
    return refused(e);
  }
};

/** Remove a member from the owner's organisation; their saved work stays with it. */
export const DELETE: APIRoute = ({ locals, params }) => {
  try {
    removeMember(locals.organisation!.id, params.userId ?? '');
    return new Response(null, { status: 204 });
  } catch (e) {
    return refused(e);
  }
};
