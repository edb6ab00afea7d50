import type { APIRoute } from 'astro';
import { ORG_COOKIE, SESSION_COOKIES, endSession, sessionToken } from '../../lib/auth/session';

/** Sign out: end the database session and clear the cookies, then go home. */
export const POST: APIRoute = ({ cookies, redirect }) => {
  const token = sessionToken(cookies);
  if (token) endSession(token);
  for (const name of [...SESSION_COOKIES, ORG_COOKIE]) cookies.delete(name, { path: '/' });
  return redirect('/', 303);
};
