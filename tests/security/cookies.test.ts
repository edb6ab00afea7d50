/**
 * Cookie flags on the real sign-in flow (form → e-mailed link in the fake inbox → callback) and
 * on the organisation switch, in development (plain http) and in production (NODE_ENV=production:
 * Secure, the __Secure- name, HSTS). Session, CSRF and callback cookies must be HttpOnly,
 * SameSite=Lax and Path=/; script must never read them.
 */
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { inbox } from '../support/helpers';
import { OWNER, startSecApp } from './helpers';
import type { SecApp } from './helpers';

let dev: SecApp;
let prod: SecApp;

beforeAll(async () => {
  [dev, prod] = await Promise.all([
    startSecApp(19530),
    startSecApp(19540, { NODE_ENV: 'production' }),
  ]);
}, 180_000);
afterAll(async () => {
  await Promise.all([dev?.stop(), prod?.stop()]);
});

interface Cookie {
  name: string;
  attrs: Map<string, string>;
}

function parse(setCookie: string[]): Cookie[] {
  return setCookie.map((line) => {
    const [pair, ...rest] = line.split(';').map((s) => s.trim());
    const attrs = new Map(
      rest.map(
        (a) => [a.split('=')[0].toLowerCase(), a.split('=').slice(1).join('=')] as [string, string],
      ),
    );
    return { name: pair.split('=')[0], attrs };
  });
}

/** Every cookie the sign-in flow sets, from the CSRF request to the callback's session. */
async function signInCookies(sec: SecApp, email: string): Promise<Cookie[]> {
  const csrf = await fetch(`${sec.app.url}/api/auth/csrf`);
  const form = new URLSearchParams({ email, next: '/app' });
  const sent = await fetch(`${sec.app.url}/signin`, {
    method: 'POST',
    body: form,
    headers: { origin: sec.app.url },
    redirect: 'manual',
  });
  expect(sent.status).toBe(303);
  const [mail] = await inbox(sec.inboxUrl, email);
  const link = /https?:\/\/\S+/.exec(mail.text ?? '')![0];
  const callback = await fetch(link, { redirect: 'manual' });
  expect(callback.status).toBe(302);
  return parse([...csrf.headers.getSetCookie(), ...callback.headers.getSetCookie()]);
}

function expectLocked(c: Cookie, secure: boolean): void {
  expect(c.attrs.has('httponly'), `${c.name} HttpOnly`).toBe(true);
  expect(c.attrs.get('samesite')?.toLowerCase(), `${c.name} SameSite`).toBe('lax');
  expect(c.attrs.get('path'), `${c.name} Path`).toBe('/');
  expect(c.attrs.has('secure'), `${c.name} Secure`).toBe(secure);
}

describe('auth cookies', () => {
  test('does set HttpOnly, SameSite=Lax, Path=/ and no Secure on plain-http development', async () => {
    const cookies = await signInCookies(dev, 'rosa@heronsgate.example');
    const session = cookies.find((c) => c.name === 'authjs.session-token');
    expect(session, cookies.map((c) => c.name).join()).toBeDefined();
    for (const c of cookies) expectLocked(c, false);
    expect(cookies.map((c) => c.name)).toEqual(
      expect.arrayContaining(['authjs.csrf-token', 'authjs.session-token']),
    );
    expect(session!.attrs.get('expires')).toMatch(/GMT/);
  });

  test('does set Secure and the __Secure-/__Host- names in production, with HSTS', async () => {
    const cookies = await signInCookies(prod, 'rosa@heronsgate.example');
    expect(cookies.map((c) => c.name)).toContain('__Secure-authjs.session-token');
    for (const c of cookies) {
      expectLocked(c, true);
      expect(c.name).toMatch(/^__(Secure|Host)-/);
    }
    const res = await fetch(`${prod.app.url}/`);
    expect(res.headers.get('strict-transport-security')).toMatch(/max-age=\d{7,}/);
    expect((await fetch(`${dev.app.url}/`)).headers.get('strict-transport-security')).toBeNull();
  });
});

describe('organisation cookie', () => {
  const switchOrg = async (sec: SecApp): Promise<Cookie> => {
    const headers = {
      ...sec.as(OWNER, false),
      'content-type': 'application/x-www-form-urlencoded',
    };
    const body = new URLSearchParams({ action: 'switch', organisation: 'org_demo_heronsgate' });
    const r = await fetch(`${sec.app.url}/app/account`, {
      method: 'POST',
      headers,
      body,
      redirect: 'manual',
    });
    expect(r.status).toBe(303);
    const c = parse(r.headers.getSetCookie()).find((x) => x.name === 'dw_org');
    expect(c).toBeDefined();
    return c!;
  };

  test('does lock dw_org the same way, Secure in production even behind a TLS proxy', async () => {
    expectLocked(await switchOrg(dev), false);
    expectLocked(await switchOrg(prod), true);
  });
});
