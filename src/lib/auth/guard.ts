import type { APIContext } from 'astro';
import { decide, isApiPath, needsViewer, ruleFor } from './access';
import type { Decision } from './access';
import { ORG_COOKIE, SIGNED_OUT, resolveViewer, sessionToken } from './session';

const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
/** The Auth.js actions under /api/auth/; it answers any other with a bare 500. */
const AUTH_ACTIONS = new Set([
  'providers',
  'session',
  'csrf',
  'signin',
  'signout',
  'callback',
  'verify-request',
  'error',
]);

/**
 * Everything the middleware decides about a request before a route runs: resolve who is asking
 * (only where the route table needs it), refuse cross-site state changes, and enforce the route's
 * access level. Returns the refusal, or null to let the request through with locals filled in.
 */
export function guard(context: APIContext): Response | null {
  const { pathname } = context.url;
  const rule = ruleFor(pathname);
  const api = isApiPath(pathname);
  if (STATE_CHANGING.has(context.request.method) && !rule.originExempt && !sameOrigin(context)) {
    return refuse('forbidden', api, context);
  }
  // Sign-in e-mails are only requested through /signin, which rate-limits them.
  if (context.request.method === 'POST' && pathname.startsWith('/api/auth/signin')) {
    return refuse('forbidden', true, context);
  }
  if (pathname.startsWith('/api/auth/') && !AUTH_ACTIONS.has(pathname.split('/')[3] ?? '')) {
    return Response.json({ error: 'not_found' }, { status: 404 });
  }
  const viewer = needsViewer(rule)
    ? resolveViewer(sessionToken(context.cookies), context.cookies.get(ORG_COOKIE)?.value ?? null)
    : SIGNED_OUT;
  Object.assign(context.locals, viewer);
  const decision = decide(rule.access, viewer);
  return decision === 'allow' ? null : refuse(decision, api, context);
}

/**
 * A browser always sends Origin (or Sec-Fetch-Site) on a state-changing request; refuse one that
 * names another site. Requests with neither come from non-browser clients, which carry no ambient
 * cookies to abuse.
 */
function sameOrigin(context: APIContext): boolean {
  const origin = context.request.headers.get('origin');
  if (origin) return allowedOrigins(context).includes(origin);
  const site = context.request.headers.get('sec-fetch-site');
  return !site || site === 'same-origin' || site === 'none';
}

function allowedOrigins(context: APIContext): string[] {
  const list = [context.url.origin];
  const publicUrl = process.env.PUBLIC_URL;
  if (publicUrl) {
    try {
      list.push(new URL(publicUrl).origin);
    } catch {
      // a malformed PUBLIC_URL adds nothing
    }
  }
  return list;
}

function refuse(decision: Exclude<Decision, 'allow'>, api: boolean, context: APIContext): Response {
  if (api) {
    const status = decision === 'unauthorised' ? 401 : 403;
    return Response.json({ error: decision }, { status });
  }
  if (decision === 'unauthorised') {
    const next = context.url.pathname + context.url.search;
    return new Response(null, {
      status: 302,
      headers: { Location: `/signin?next=${encodeURIComponent(next)}` },
    });
  }
  return forbiddenPage();
}

// Plain HTML: the hash-based CSP (src/lib/server/security-headers.ts) allows no inline style here.
function forbiddenPage(): Response {
  const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Not for this account · Drainwright</title></head>
<body>
<h1>This page is not open to your account</h1>
<p>Your role in this organisation does not include it. Ask the account owner if you need it.</p>
<p><a href="/app">Back to your Drainwright</a></p></body></html>`;
  return new Response(html, {
    status: 403,
    headers: { 'Content-Type': 'text/html; charset=utf-8' },
  });
}
