/**
 * Cross-site form-post protection for the app, with the public API left out.
 *
 * Astro's own `security.checkOrigin` refuses, before any of our code runs, every cross-site POST
 * whose content type a plain HTML form can send (form-urlencoded, multipart, text/plain) or that
 * has no content type. That would answer 403 to API callers on other sites (and to curl, which
 * sends no Origin header), where API v1 promises 415 or a result. So the check is off in
 * astro.config.mjs and done here by the middleware instead: the same rule, for every route but
 * /api/v1/, which uses no cookies and so has nothing a forged form could ride on.
 */

const FORM_TYPES = ['application/x-www-form-urlencoded', 'multipart/form-data', 'text/plain'];
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** The public calculation API: anonymous, cookie-free, open to any origin. */
export function isPublicApiPath(pathname: string): boolean {
  return pathname === '/api/v1' || pathname.startsWith('/api/v1/');
}

/**
 * The 403 answer for a cross-site form post, or null to let the request through. Same rule as
 * Astro 5's origin check: an unsafe method from another origin with a form content type or none.
 */
export function refuseCrossSiteForm(request: Request, url: URL): Response | null {
  if (SAFE_METHODS.has(request.method) || isPublicApiPath(url.pathname)) return null;
  if (request.headers.get('origin') === url.origin) return null;
  const type = request.headers.get('content-type')?.toLowerCase();
  if (type !== undefined && !FORM_TYPES.some((t) => type.includes(t))) return null;
  return new Response(`Cross-site ${request.method} form submissions are forbidden`, {
    status: 403,
  });
}
