import { expect } from 'vitest';
import { siphonRequest } from '../api/samples';
import { threadLink, waitForEmail } from '../support/helpers';
import { CREW, OWNER } from './helpers';
import type { SecApp } from './helpers';

/**
 * Hostile text for every user text field: markup that would add elements (each carries
 * data-pwned, so the test can look for it in the DOM), a javascript: URL, SQL-ish text, a
 * right-to-left override and an astral-plane character. 120 UTF-16 units: it fits every field but
 * member names (80), which get SHORT.
 */
export const PAYLOAD = `<script data-pwned>alert(1)</script>"><img src=x data-pwned onerror=alert(2)>'; DROP TABLE jobs;-- javascript:alert(3)\u202E𝔇`;
export const SHORT = `"><img src=x data-pwned onerror=alert(4)>\u202Eok`;
export const FORMULAS = [
  '=HYPERLINK("http://evil.example/","open me")',
  '+1+2',
  '-3+4',
  '@SUM(A1:A2)',
];
export const FLAG_EMAIL = 'flagger-sec@example.test';

export interface Planted {
  jobId: string;
  calcId: string;
  flagId: string;
  shareUrl: string;
  flagThreadUrl: string;
}

async function ok(
  res: Promise<Response>,
  status: number,
  what: string,
): Promise<Record<string, unknown>> {
  const r = await res;
  const text = await r.text();
  expect(r.status, `${what}: ${text}`).toBe(status);
  return text ? (JSON.parse(text) as Record<string, unknown>) : {};
}

/** Put the payloads into every text field through the real endpoints and forms. */
export async function plant(sec: SecApp): Promise<Planted> {
  const url = sec.app.url;
  const post = (path: string, user: string, body: unknown, method = 'POST'): Promise<Response> =>
    fetch(`${url}${path}`, { method, headers: sec.as(user), body: JSON.stringify(body) });
  await ok(
    post(
      '/api/brand',
      OWNER,
      {
        companyName: PAYLOAD,
        primaryColour: '#12343b',
        accentColour: '#1b7f86',
        licenceNumber: PAYLOAD,
        contactBlock: PAYLOAD,
        reportFooter: PAYLOAD,
      },
      'PUT',
    ),
    200,
    'brand',
  );
  const job = await ok(
    post('/api/jobs', OWNER, {
      title: PAYLOAD,
      client: PAYLOAD,
      siteAddress: PAYLOAD,
      notes: `${PAYLOAD}\n${PAYLOAD}`,
    }),
    201,
    'job',
  );
  const jobId = (job.job as { id: string }).id;
  const calc = await ok(
    post(`/api/jobs/${jobId}/calculations`, OWNER, {
      tool: 'siphon',
      label: PAYLOAD,
      inputs: siphonRequest,
      unitSystem: 'metric',
    }),
    201,
    'calculation',
  );
  const calcId = (calc.calculation as { id: string }).id;
  for (const title of FORMULAS)
    await ok(post('/api/jobs', OWNER, { title, client: title, notes: title }), 201, 'formula job');
  const share = await ok(post(`/api/jobs/${jobId}/shares`, OWNER, { days: 7 }), 201, 'share');
  // Member names: the owner's (shown in invitation e-mails) and a crew member's (team page).
  for (const user of [OWNER, CREW]) {
    const form = new URLSearchParams({ name: SHORT });
    const h = { ...sec.as(user, false), 'content-type': 'application/x-www-form-urlencoded' };
    expect(
      (await fetch(`${url}/app/account`, { method: 'POST', headers: h, body: form })).status,
    ).toBe(200);
  }
  await ok(
    post('/api/team/invitations', OWNER, { email: "o'brien+sec@example.test" }),
    201,
    'invitation',
  );
  const flag = await ok(
    fetch(`${url}/api/flags`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: url },
      body: JSON.stringify({
        tool: 'siphon',
        reason: 'looks_wrong',
        message: PAYLOAD,
        email: FLAG_EMAIL,
        snapshot: {
          inputs: { note: PAYLOAD },
          results: { note: PAYLOAD },
          engineVersion: '1.0.0',
          unitSystem: 'metric',
          page: '/siphon?x="><img/src=x/data-pwned>',
        },
      }),
    }),
    201,
    'flag',
  );
  const flagId = String(flag.id);
  const received = await waitForEmail(sec.inboxUrl, FLAG_EMAIL, (e) =>
    e.subject.includes('flagged'),
  );
  await ok(
    post(`/api/support/flags/${flagId}/notes`, 'usr_demo_support', { body: PAYLOAD }),
    201,
    'note',
  );
  await ok(
    post(`/api/support/flags/${flagId}/replies`, 'usr_demo_support', { body: PAYLOAD }),
    201,
    'reply',
  );
  return {
    jobId,
    calcId,
    flagId,
    shareUrl: String(share.url),
    flagThreadUrl: threadLink(received),
  };
}
