import { Buffer } from 'node:buffer';
import type { StoredAttachment, StoredEmail } from './store';

/** The API's error body: what the SDK hands back as `error`. */
export interface ApiError {
  statusCode: number;
  name: string;
  message: string;
}

function list(value: unknown): string[] | null {
  if (value === undefined || value === null) return null;
  const items = Array.isArray(value) ? value : [value];
  const ok = items.length > 0 && items.every((v) => typeof v === 'string' && v.length > 0);
  return ok ? (items as string[]) : null;
}

function invalid(message: string): ApiError {
  return { statusCode: 422, name: 'validation_error', message };
}

function attachments(value: unknown): StoredAttachment[] | ApiError {
  if (value === undefined || value === null) return [];
  if (!Array.isArray(value)) return invalid('The `attachments` field must be an array.');
  const out: StoredAttachment[] = [];
  for (const [i, raw] of value.entries()) {
    const a = raw as Record<string, unknown>;
    if (typeof a.filename !== 'string' || !a.filename) return invalid(`attachments[${i}].filename is required.`);
    if (typeof a.content !== 'string') return invalid(`attachments[${i}].content must be base64 text.`);
    const bytes = Buffer.from(a.content, 'base64');
    out.push({
      id: `att_${i + 1}`,
      filename: a.filename,
      contentType: typeof a.content_type === 'string' ? a.content_type : 'application/octet-stream',
      content: bytes.toString('base64'),
      size: bytes.length,
    });
  }
  return out;
}

/** Check a send request the way the hosted API does (the parts we use), and shape it for storage. */
export function parseSend(body: unknown): Omit<StoredEmail, 'id' | 'createdAt'> | ApiError {
  if (!body || typeof body !== 'object') return invalid('The body must be a JSON object.');
  const b = body as Record<string, unknown>;
  if (typeof b.from !== 'string' || !b.from) return invalid('The `from` field is required.');
  const to = list(b.to);
  if (!to) return invalid('The `to` field is required.');
  if (typeof b.subject !== 'string' || !b.subject) return invalid('The `subject` field is required.');
  const html = typeof b.html === 'string' ? b.html : null;
  const text = typeof b.text === 'string' ? b.text : null;
  if (html === null && text === null) return invalid('Give `html` or `text`.');
  const files = attachments(b.attachments);
  if (!Array.isArray(files)) return files;
  return {
    from: b.from,
    to,
    cc: list(b.cc),
    bcc: list(b.bcc),
    replyTo: list(b.reply_to),
    subject: b.subject,
    html,
    text,
    headers: b.headers && typeof b.headers === 'object' ? (b.headers as Record<string, string>) : null,
    tags: Array.isArray(b.tags) ? (b.tags as { name: string; value: string }[]) : null,
    attachments: files,
  };
}

/** A stored message as GET /emails/{id} answers it. */
export function emailResource(e: StoredEmail): Record<string, unknown> {
  return {
    object: 'email',
    id: e.id,
    message_id: `<${e.id}@fake-resend.local>`,
    created_at: e.createdAt,
    from: e.from,
    to: e.to,
    cc: e.cc,
    bcc: e.bcc,
    reply_to: e.replyTo,
    subject: e.subject,
    html: e.html,
    text: e.text,
    tags: e.tags ?? undefined,
    last_event: 'delivered',
    scheduled_at: null,
  };
}

export function attachmentResource(emailId: string, a: StoredAttachment, base: string): Record<string, unknown> {
  return {
    object: 'attachment',
    id: a.id,
    filename: a.filename,
    content_type: a.contentType,
    size: a.size,
    download_url: `${base}/emails/${emailId}/attachments/${a.id}/raw`,
  };
}
