import { getConfig } from '../config';
import { sendEmail } from '../email/send';
import { logger } from '../server/logger';
import { REASON_LABELS } from './labels';
import type { FlagReason } from './labels';

/** Link to the reporter's thread; the token is the only key to it. */
export function threadUrl(token: string): string {
  return `${getConfig().publicUrl}/flags/${token}`;
}

/** Tell the reporter we have their flag, with the link to follow it. False when sending failed. */
export async function sendReceivedEmail(p: {
  to: string;
  flagId: string;
  token: string;
  reason: FlagReason;
}): Promise<boolean> {
  const link = threadUrl(p.token);
  const text = [
    'Thanks for flagging a result. Our support desk has a frozen copy of your inputs and results',
    'and will look at it.',
    '',
    `What you told us: ${REASON_LABELS[p.reason]}`,
    '',
    'Follow the answer here (keep this link to yourself; it opens your flag without signing in):',
    link,
    '',
    `Reference: ${p.flagId}`,
  ].join('\n');
  return deliver({ to: p.to, subject: 'We have your flagged result', text, tag: 'flag_received' });
}

/** Send a support reply to the reporter. False when sending failed. */
export async function sendReplyEmail(p: {
  to: string;
  flagId: string;
  body: string;
}): Promise<boolean> {
  const text = [
    'Drainwright support replied about the result you flagged:',
    '',
    p.body,
    '',
    'The whole thread is at the link in our first e-mail, or under Flagged results when you sign in:',
    `${getConfig().publicUrl}/app/flags`,
    '',
    `Reference: ${p.flagId}`,
  ].join('\n');
  return deliver({ to: p.to, subject: 'Reply about your flagged result', text, tag: 'flag_reply' });
}

function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** The plain text as simple HTML: paragraphs kept, links made clickable. */
function htmlOf(text: string): string {
  const body = text
    .split('\n')
    .map((line) => {
      const safe = escapeHtml(line);
      return /^https?:\/\/\S+$/.test(line) ? `<a href="${safe}">${safe}</a>` : safe;
    })
    .join('<br>\n');
  return `<div style="font-family:sans-serif;color:#14212b;line-height:1.5">${body}</div>`;
}

async function deliver(m: {
  to: string;
  subject: string;
  text: string;
  tag: string;
}): Promise<boolean> {
  try {
    await sendEmail({ to: m.to, subject: m.subject, text: m.text, html: htmlOf(m.text) });
    return true;
  } catch (err) {
    // No recipient address in the log: the tag says which notice failed.
    logger.error({ err, tag: m.tag }, 'flag e-mail failed');
    return false;
  }
}
