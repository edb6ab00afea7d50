import type { APIRoute } from 'astro';
import { listPendingInvitations, seatsInUse } from '../../../lib/data/invitations';
import { listMembers } from '../../../lib/data/memberships';
import { seatLimit } from '../../../lib/billing/seats';

/** The owner's team: members, open invitations and seats. */
export const GET: APIRoute = ({ locals }) => {
  const orgId = locals.organisation!.id;
  return Response.json({
    organisation: locals.organisation,
    members: listMembers(orgId),
    invitations: listPendingInvitations(orgId),
    seats: { inUse: seatsInUse(orgId), limit: seatLimit(orgId) },
  });
};
