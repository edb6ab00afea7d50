import { esc } from './escape';
import type { OutgoingEmail } from './send';

/** The invitation message: who invites you to which company, and the one-time link. */
export function invitationEmail(p: { to: string; orgName: string; inviter: string; url: string; days: number }): OutgoingEmail {
  return {
    to: p.to,
    subject: `${p.inviter} invites you to ${p.orgName} on Drainwright`,
    html: `<div style="font-family:system-ui,sans-serif;color:#14212b;max-width:32rem">
<h1 style="font-size:1.3rem">Join ${esc(p.orgName)} on Drainwright</h1>
<p>${esc(p.inviter)} invites you to work with the crew: shared jobs, calculations and reports.</p>
<p><a href="${esc(p.url)}" style="display:inline-block;background:#0b6e74;color:#fff;padding:.8rem 1.4rem;border-radius:.5rem;text-decoration:none;font-weight:700">Accept the invitation</a></p>
<p style="color:#55606a;font-size:.9rem">The link works once and expires in ${p.days} days:<br>${esc(p.url)}</p></div>`,
    text: `${p.inviter} invites you to ${p.orgName} on Drainwright.\n\nAccept: ${p.url}\n\nThe link works once and expires in ${p.days} days.`,
  };
}
