/**
 * Security headers for every response the server sends, static files included (the Node
 * adapter serves dist/client before any Astro middleware runs, so they are set here, in our own
 * server, not in src/middleware.ts).
 *
 * Scripts and styles: Astro's island hydration and the service-worker registration are inline
 * scripts, so 'unsafe-inline' stays for script-src until Astro's hashed CSP is adopted; nothing is
 * loaded from another origin, no plugins, no framing, no <base> rewriting.
 */
export function securityHeaders(production: boolean): Record<string, string> {
  const csp = [
    "default-src 'self'",
    "script-src 'self' 'unsafe-inline'",
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self'",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
  const headers: Record<string, string> = {
    'Content-Security-Policy': csp,
    'X-Content-Type-Options': 'nosniff',
    'X-Frame-Options': 'DENY',
    'Referrer-Policy': 'strict-origin-when-cross-origin',
    'Permissions-Policy': 'camera=(), microphone=(), geolocation=(), payment=()',
    'Cross-Origin-Opener-Policy': 'same-origin',
  };
  if (production) headers['Strict-Transport-Security'] = 'max-age=31536000; includeSubDomains';
  return headers;
}
