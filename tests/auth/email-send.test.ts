import { Resend } from 'resend';
import { describe, expect, inject, test } from 'vitest';
import { sendEmail } from '../../src/lib/email/send';

// The real resend SDK against the fake started by the global setup, over HTTP.
describe('sendEmail through the e-mail fake', () => {
  const env = inject('fakeEnv');

  test('does deliver html, text and a base64 attachment that read back byte for byte', async () => {
    expect(process.env.RESEND_BASE_URL).toBe(env.FAKE_RESEND_URL);
    const pdf = new TextEncoder().encode('%PDF-1.7 test bytes \u00e9');
    const id = await sendEmail({
      to: 'crew@example.test',
      subject: 'Report for job 12',
      html: '<p>Your <a href="http://127.0.0.1/r/1">report</a></p>',
      text: 'Your report: http://127.0.0.1/r/1',
      attachments: [{ filename: 'report.pdf', content: pdf, contentType: 'application/pdf' }],
    });
    const sdk = new Resend('re_fake_test', { baseUrl: env.FAKE_RESEND_URL });
    const { data } = await sdk.emails.get(id);
    expect(data?.subject).toBe('Report for job 12');
    expect(data?.to).toEqual(['crew@example.test']);
    expect(data?.text).toContain('http://127.0.0.1/r/1');
    const list = await fetch(`${env.FAKE_RESEND_URL}/emails/${id}/attachments`, {
      headers: { Authorization: 'Bearer re_fake_test' },
    }).then((r) => r.json() as Promise<{ data: { download_url: string; size: number }[] }>);
    expect(list.data[0].size).toBe(pdf.length);
    const bytes = new Uint8Array(await (await fetch(list.data[0].download_url)).arrayBuffer());
    expect(bytes).toEqual(pdf);
  });

  test('does refuse a message without a subject with a validation error', async () => {
    await expect(sendEmail({ to: 'a@example.test', subject: '', html: 'x', text: 'x' })).rejects.toThrow(
      /subject/,
    );
  });

  test('does list the message in the inbox page with its links', async () => {
    await sendEmail({ to: 'inbox@example.test', subject: 'Link check', html: '<a href="http://127.0.0.1/x?a=1&amp;b=2">go</a>', text: 'go' });
    const inbox = await (await fetch(`${env.FAKE_RESEND_URL}/?to=inbox@example.test`)).text();
    const id = /href="\/m\/([\w-]+)"/.exec(inbox)?.[1];
    expect(id).toBeTruthy();
    const page = await (await fetch(`${env.FAKE_RESEND_URL}/m/${id}`)).text();
    expect(page).toContain('class="message-link" href="http://127.0.0.1/x?a=1&#38;b=2"');
  });
});
