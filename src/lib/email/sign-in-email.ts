import { esc } from './escape';
import type { OutgoingEmail } from './send';

/** The sign-in link message: one clear button, the plain link, and when it stops working. */
export function signInEmail(to: string, url: string, minutes: number): OutgoingEmail {
  const safe = esc(url);
  return {
    to,
    subject: 'Your Drainwright sign-in link',
    html: `<div style="font-family:system-ui,sans-serif;color:#14212b;max-width:32rem">
<h1 style="font-size:1.3rem">Sign in to Drainwright</h1>
<p>Tap the button to sign in as <strong>${esc(to)}</strong>. The link works once, for ${minutes} minutes.</p>
<p><a href="${safe}" style="display:inline-block;background:#0b6e74;color:#fff;padding:.8rem 1.4rem;border-radius:.5rem;text-decoration:none;font-weight:700">Sign in</a></p>
<p style="color:#55606a;font-size:.9rem">Or paste this address into your browser:<br>${safe}</p>
<p style="color:#55606a;font-size:.9rem">Did not ask for this? Ignore it; nobody can sign in without the link.</p></div>`,
    text: `Sign in to Drainwright as ${to}:\n\n${url}\n\nThe link works once, for ${minutes} minutes. Did not ask for this? Ignore it.`,
  };
}
