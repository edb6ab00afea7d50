import { Resend } from 'resend';

/**
 * The one way the app sends e-mail: the resend SDK, pointed by configuration alone at the hosted
 * service (RESEND_API_KEY) or at our local fake (RESEND_BASE_URL, set by the start command and
 * the test setup when no real key is configured). Reports and support replies use this too.
 */
export interface OutgoingEmail {
  to: string | string[];
  subject: string;
  html: string;
  text: string;
  replyTo?: string;
  attachments?: { filename: string; content: Uint8Array; contentType: string }[];
}

/** A send the service refused or could not take; the message says why, without secrets. */
export class EmailError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'EmailError';
  }
}

/** Sender shown on every message; EMAIL_FROM overrides it per deployment. */
export function senderAddress(): string {
  return process.env.EMAIL_FROM || 'Drainwright <no-reply@drainwright.example>';
}

let client: { key: string; baseUrl: string | undefined; resend: Resend } | undefined;

/** The SDK client for the current env (rebuilt when the key or base URL changes). */
function resendClient(): Resend {
  const key = process.env.RESEND_API_KEY;
  if (!key) throw new EmailError('E-mail is not configured: set RESEND_API_KEY (or start the app with its fakes).');
  const baseUrl = process.env.RESEND_BASE_URL || undefined;
  if (!client || client.key !== key || client.baseUrl !== baseUrl) {
    client = { key, baseUrl, resend: new Resend(key, baseUrl ? { baseUrl } : undefined) };
  }
  return client.resend;
}

/** Send one message; resolves with the service's message id, or throws EmailError. */
export async function sendEmail(email: OutgoingEmail): Promise<string> {
  const { data, error } = await resendClient().emails.send({
    from: senderAddress(),
    to: email.to,
    subject: email.subject,
    html: email.html,
    text: email.text,
    replyTo: email.replyTo,
    attachments: email.attachments?.map((a) => ({
      filename: a.filename,
      content: Buffer.from(a.content),
      contentType: a.contentType,
    })),
  });
  if (error || !data) throw new EmailError(`The e-mail service refused the message: ${error?.message ?? 'no id returned'}`);
  return data.id;
}
