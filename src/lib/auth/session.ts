import { and, eq, gt } from 'drizzle-orm';
import type { AstroCookies } from 'astro';
import { sessions, users } from '../../../db/schema';
import { getConfig } from '../config';
import { getDb } from '../db/client';
import { membershipsForUser } from '../data/memberships';
import type { Viewer } from './access';

/** Auth.js's database-session cookie, plain and with the prefix it uses on https. */
export const SESSION_COOKIES = ['__Secure-authjs.session-token', 'authjs.session-token'] as const;

/** Cookie naming the organisation a user with several memberships is working in. */
export const ORG_COOKIE = 'dw_org';

/**
 * How the org cookie is set: script cannot read it, other sites do not send it, and it is Secure
 * in production even when TLS ends at a proxy and the request URL here is plain http (the same
 * rule as the Auth.js cookies, see auth.config.ts).
 */
export function orgCookieOptions(url: URL): {
  path: '/';
  httpOnly: true;
  sameSite: 'lax';
  secure: boolean;
} {
  const secure =
    getConfig().production ||
    url.protocol === 'https:' ||
    (process.env.PUBLIC_URL ?? '').startsWith('https:');
  return { path: '/', httpOnly: true, sameSite: 'lax', secure };
}

export const SIGNED_OUT: Viewer = { user: null, organisation: null, role: null };

/** The session token from the request's cookies, if any. */
export function sessionToken(cookies: AstroCookies): string | null {
  for (const name of SESSION_COOKIES) {
    const value = cookies.get(name)?.value;
    if (value) return value;
  }
  return null;
}

/**
 * Who holds this session: one lookup of the unexpired session with its user, then their
 * memberships. The current organisation is the one named by the org cookie when the user belongs
 * to it, else their oldest company (non-personal) membership, else their personal workspace.
 */
export function resolveViewer(token: string | null, preferredOrg: string | null): Viewer {
  if (!token) return SIGNED_OUT;
  const row = getDb()
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      staffRole: users.staffRole,
      unitSystem: users.unitSystem,
    })
    .from(sessions)
    .innerJoin(users, eq(users.id, sessions.userId))
    .where(and(eq(sessions.sessionToken, token), gt(sessions.expires, new Date())))
    .get();
  if (!row) return SIGNED_OUT;
  const user = { ...row, staffRole: row.staffRole ?? null, unitSystem: row.unitSystem ?? null };
  const all = membershipsForUser(user.id);
  const chosen =
    all.find((m) => m.organisation.id === preferredOrg) ??
    all.find((m) => !m.organisation.personal) ??
    all[0];
  if (!chosen) return { user, organisation: null, role: null };
  return { user, organisation: chosen.organisation, role: chosen.role };
}

/** Delete a session (sign out). */
export function endSession(token: string): void {
  getDb().delete(sessions).where(eq(sessions.sessionToken, token)).run();
}
