import { z } from 'zod';
import { INVITE_DAYS, createInvitation } from '../data/invitations';
import { sendEmail } from '../email/send';
import { invitationEmail } from '../email/invitation-email';
import { linkBase } from './request-link';

/** What an owner sends to invite someone. */
export const InviteInput = z.object({
  // 254: the longest address SMTP carries (RFC 5321), common practice for a length cap.
  email: z.string().trim().toLowerCase().max(254).pipe(z.email()),
  role: z.enum(['owner', 'member']).default('member'),
});

export const RoleInput = z.object({ role: z.enum(['owner', 'member']) });

/** Create an invitation and e-mail its link; returns the invitation id. */
export async function inviteCrew(
  org: { id: string; name: string },
  inviter: { id: string; name: string | null; email: string },
  input: z.infer<typeof InviteInput>,
  origin: string,
): Promise<{ id: string; expiresAt: Date }> {
  const { id, token, expiresAt } = createInvitation(org.id, { ...input, invitedBy: inviter.id });
  const url = `${linkBase(origin)}/invite/${token}`;
  await sendEmail(invitationEmail({ to: input.email, orgName: org.name, inviter: inviter.name || inviter.email, url, days: INVITE_DAYS }));
  return { id, expiresAt };
}

/** HTTP status for a refused team change. */
export function teamErrorStatus(code: string): number {
  return code === 'not_found' ? 404 : code === 'invalid' ? 400 : 409;
}
