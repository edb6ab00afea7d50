import { Auth } from '@auth/core';
import authConfig from './auth.config';
import { logger } from '../server/logger';

/** The outcome of asking Auth.js to e-mail a sign-in link. */
export type LinkResult = { ok: true } | { ok: false; reason: string };

/** Where links in e-mails point: PUBLIC_URL when set, else the origin the visitor used. */
export function linkBase(requestOrigin: string): string {
  const configured = process.env.PUBLIC_URL;
  return configured ? new URL(configured).origin : requestOrigin;
}

function authOptions(): Parameters<typeof Auth>[1] {
  const { prefix: _prefix, configFile: _file, injectEndpoints: _inject, ...options } = authConfig;
  return options as Parameters<typeof Auth>[1];
}

/** `name=value` pairs of every cookie a response sets, for the next internal request. */
function cookiePairs(response: Response): string {
  return response.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
}

/**
 * Ask Auth.js to e-mail a sign-in link, the way its own form would: fetch a CSRF token, then post
 * the sign-in. The requests are built here (no forwarded-host headers), so the link in the e-mail
 * always points at our own origin. `next` is a same-site path to land on after signing in.
 */
export async function requestSignInLink(email: string, next: string, origin: string): Promise<LinkResult> {
  const base = linkBase(origin);
  const options = authOptions();
  const csrfResponse = await Auth(new Request(`${base}/api/auth/csrf`), options);
  const { csrfToken } = (await csrfResponse.json()) as { csrfToken?: string };
  if (!csrfToken) return { ok: false, reason: 'Could not start sign-in.' };
  const body = new URLSearchParams({ email, csrfToken, callbackUrl: `${base}${next}` });
  const response = await Auth(
    new Request(`${base}/api/auth/signin/resend`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/x-www-form-urlencoded', Cookie: cookiePairs(csrfResponse) },
      body,
    }),
    options,
  );
  const location = response.headers.get('location') ?? '';
  const error = location ? new URL(location, base).searchParams.get('error') : 'NoRedirect';
  if (!error && response.status >= 300 && response.status < 400) return { ok: true };
  logger.warn({ status: response.status, error }, 'sign-in link request failed');
  return { ok: false, reason: error === 'EmailSignin' ? 'The sign-in e-mail could not be sent.' : 'Sign-in failed.' };
}

/** A same-site path to return to after sign-in; anything else becomes /app. */
export function safeNext(raw: string | null | undefined): string {
  if (!raw || !raw.startsWith('/') || raw.startsWith('//') || raw.startsWith('/\\')) return '/app';
  return raw.length > 500 ? '/app' : raw;
}
