/**
 * Security headers for every response the server sends, static files included (the Node
 * adapter serves dist/client before any Astro middleware runs, so they are set here, in our own
 * server, not in src/middleware.ts).
 *
 * Content-Security-Policy: hash-based, no 'unsafe-inline'. Astro's experimental CSP
 * (astro.config.mjs) hashes every script and style it emits — the island loader and hydration
 * runtime, bundled scripts it inlines, the island style — and sends the policy as a header: on
 * server pages from the render, on prerendered pages from dist/_experimentalHeaders.json (the
 * Node adapter's experimentalStaticHeaders). The hash list is the same for every page, so the
 * policy read back from that file is also the default here, for every other response (static
 * files, middleware answers, error pages) — one page policy everywhere; API v1's JSON answers
 * carry API_CSP instead. Pages that build an inline style
 * per request (the print report's brand colours) add its hash with Astro.csp.insertStyleHash.
 * Rules that keep it working: no `is:inline` scripts, no `style="…"` attributes in server-rendered
 * markup (React setting element.style at run time is not affected), no event-handler attributes.
 * frame-ancestors is honoured only in a header, which is why the policy is never a <meta>.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { AstroUserConfig } from 'astro';

type CspConfig = Exclude<NonNullable<NonNullable<AstroUserConfig['experimental']>['csp']>, boolean>;
type CspDirective = NonNullable<CspConfig['directives']>[number];

/** Every CSP directive except script-src and style-src, which Astro's hashed CSP owns. */
export const CSP_DIRECTIVES: CspDirective[] = [
  "default-src 'self'",
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self'",
  "manifest-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "frame-ancestors 'none'",
];

/**
 * The policy on API v1's JSON answers: load nothing, never be framed. A JSON answer runs no
 * script or style, so the pages' hash list (1 KB on every answer) would buy it nothing.
 */
export const API_CSP = "default-src 'none'; frame-ancestors 'none'";

/** Strictest fallback when no build policy is found: no inline script or style at all. */
const FALLBACK_CSP = [...CSP_DIRECTIVES, "script-src 'self'", "style-src 'self'"].join('; ');

/** The policy Astro wrote for the prerendered pages (identical for all), or null. */
export function builtPolicy(distDir = 'dist'): string | null {
  try {
    const file = path.resolve(distDir, '_experimentalHeaders.json');
    const routes = JSON.parse(fs.readFileSync(file, 'utf8')) as {
      headers: { key: string; value: string }[];
    }[];
    const csp = routes
      .flatMap((r) => r.headers)
      .find((h) => h.key.toLowerCase() === 'content-security-policy');
    return csp?.value ?? null;
  } catch {
    return null;
  }
}

export function securityHeaders(
  production: boolean,
  csp: string | null = builtPolicy(),
): Record<string, string> {
  const headers: Record<string, string> = {
    'Content-Security-Policy': csp ?? FALLBACK_CSP,
    'X-Content-Type-Options': 'nosniff',
    'X-Frame-Options': 'DENY',
    'Referrer-Policy': 'strict-origin-when-cross-origin',
    'Permissions-Policy': 'camera=(), microphone=(), geolocation=(), payment=()',
    'Cross-Origin-Opener-Policy': 'same-origin',
  };
  if (production) headers['Strict-Transport-Security'] = 'max-age=31536000; includeSubDomains';
  return headers;
}
