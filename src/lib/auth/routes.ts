/**
 * THE route table: every page and API route pattern with who may use it. The middleware enforces
 * it (src/middleware.ts via ./access.ts) and tests/auth/route-table.test.ts checks every entry
 * against every role, and fails when a file under src/pages has no entry here.
 *
 * Patterns use Astro's route syntax: literal segments, `[param]` for one segment, and a final
 * `**` for "this prefix and everything under it". The most specific matching pattern wins.
 *
 * Access levels, from open to closed:
 * - anyone     no sign-in needed
 * - signed_in  any signed-in user
 * - member     a signed-in user with a current organisation (owner or member of it)
 * - owner      the owner of the current organisation
 * - support    staff with staffRole 'support' or 'admin'
 * - admin      staff with staffRole 'admin'
 *
 * When you add a route, add its line here (and, for a resource-id route, a sample id in
 * tests/auth/samples.ts so the cross-organisation test covers it).
 */
export type Access = 'anyone' | 'signed_in' | 'member' | 'owner' | 'support' | 'admin';

export interface RouteRule {
  pattern: string;
  access: Access;
  /**
   * For 'anyone' routes: 'skip' (default) does no session or database work at all; 'optional'
   * resolves the visitor so the page can show their signed-in state.
   */
  session?: 'skip' | 'optional';
  /** A catch-all default for paths nobody declared; does not count as declaring a route. */
  fallback?: boolean;
  /**
   * Exempt from the Origin check: server-to-server endpoints (signed webhooks) and the public,
   * cookie-free API v1, which any site may call.
   */
  originExempt?: boolean;
}

export const ROUTES: readonly RouteRule[] = [
  // Catch-all defaults: public site pages; signed-in for unknown app pages and APIs.
  { pattern: '/**', access: 'anyone', fallback: true },
  { pattern: '/app/**', access: 'signed_in', fallback: true },
  { pattern: '/api/**', access: 'signed_in', fallback: true },

  // Public site and calculators (no session work).
  { pattern: '/', access: 'anyone' },
  { pattern: '/404', access: 'anyone' },
  { pattern: '/cautions', access: 'anyone' },
  { pattern: '/check', access: 'anyone' },
  { pattern: '/siphon', access: 'anyone' },
  { pattern: '/gravity-line', access: 'anyone' },
  { pattern: '/drain', access: 'anyone' },
  { pattern: '/guides', access: 'anyone' },
  { pattern: '/guides/**', access: 'anyone' },
  { pattern: '/pricing', access: 'anyone' },
  { pattern: '/developers/**', access: 'anyone' },
  // Read-only report share links (random token, checked by the page).
  { pattern: '/r/**', access: 'anyone' },
  // A reporter's view of their flag through the e-mailed link.
  { pattern: '/flags/[token]', access: 'anyone', session: 'optional' },
  { pattern: '/developers/api', access: 'anyone' },
  { pattern: '/api/health', access: 'anyone' },
  // Public calculation API: cookie-free and CORS-open, so no Origin check (API v1 answers 415 etc.).
  { pattern: '/api/v1/**', access: 'anyone', originExempt: true },

  // Sign-in and invitations: open, but they look at who is visiting.
  { pattern: '/signin', access: 'anyone', session: 'optional' },
  { pattern: '/signin/sent', access: 'anyone', session: 'optional' },
  { pattern: '/signin/out', access: 'anyone', session: 'optional' },
  { pattern: '/api/auth/**', access: 'anyone', session: 'optional' },
  { pattern: '/invite/[token]', access: 'anyone', session: 'optional' },

  // Signed-in app.
  { pattern: '/app', access: 'signed_in' },
  { pattern: '/app/account', access: 'signed_in' },
  // The unit system is remembered on the account when someone is signed in (see the endpoint).
  { pattern: '/api/account/units', access: 'anyone', session: 'optional' },
  { pattern: '/app/team', access: 'owner' },
  { pattern: '/app/billing', access: 'owner' },
  { pattern: '/app/brand', access: 'owner' },
  { pattern: '/app/jobs', access: 'member' },
  { pattern: '/app/jobs/[id]', access: 'member' },
  { pattern: '/app/jobs/[id]/report', access: 'member' },
  { pattern: '/app/jobs/**', access: 'member' },
  { pattern: '/app/jobs/[id]/report.pdf', access: 'member' },
  { pattern: '/app/flags', access: 'signed_in' },
  { pattern: '/app/flags/**', access: 'signed_in' },

  // Team management (owner of the current organisation).
  { pattern: '/api/team/**', access: 'owner' },
  { pattern: '/api/team', access: 'owner' },
  { pattern: '/api/team/invitations', access: 'owner' },
  { pattern: '/api/team/invitations/[id]', access: 'owner' },
  { pattern: '/api/team/members/[userId]', access: 'owner' },

  // Jobs API (members of the current organisation; entitlements are checked by the endpoints).
  { pattern: '/api/jobs/**', access: 'member' },
  { pattern: '/api/jobs', access: 'member' },
  { pattern: '/api/jobs/[id]', access: 'member' },
  { pattern: '/api/jobs/[id]/calculations', access: 'member' },
  { pattern: '/api/jobs/[id]/calculations/[cid]', access: 'member' },
  { pattern: '/api/jobs/export', access: 'member' },
  { pattern: '/api/jobs/[id]/shares', access: 'member' },
  { pattern: '/api/jobs/[id]/shares/[sid]', access: 'member' },
  { pattern: '/api/jobs/[id]/report/email', access: 'member' },
  { pattern: '/api/brand', access: 'owner' },
  { pattern: '/api/brand/logo', access: 'owner' },
  // Read-only report links: the random token is the key; revocable and expiring.
  { pattern: '/r/[token]', access: 'anyone' },
  { pattern: '/r/[token]/report.pdf', access: 'anyone' },
  { pattern: '/api/export/**', access: 'member' },

  // Billing.
  { pattern: '/api/billing/**', access: 'owner' },
  { pattern: '/api/brand/**', access: 'owner' },
  { pattern: '/api/webhooks/**', access: 'anyone', originExempt: true },

  // Flags: anyone may flag a result; the reporter reads theirs signed in or by e-mailed link.
  { pattern: '/api/flags', access: 'anyone', session: 'optional' },
  { pattern: '/api/flags/**', access: 'anyone', session: 'optional' },

  // Support desk (staff only; members and owners get 403).
  { pattern: '/support', access: 'support' },
  { pattern: '/support/**', access: 'support' },
  { pattern: '/api/support/**', access: 'support' },
  { pattern: '/support/audit', access: 'admin' },
  { pattern: '/api/support/audit', access: 'admin' },
  { pattern: '/support/flags/[id]', access: 'support' },
  { pattern: '/api/support/flags', access: 'support' },
  { pattern: '/api/support/flags/[id]', access: 'support' },
  { pattern: '/api/support/flags/[id]/notes', access: 'support' },
  { pattern: '/api/support/flags/[id]/replies', access: 'support' },
  { pattern: '/api/support/flags/[id]/rerun', access: 'support' },
  // The reporter's e-mailed link: the token itself is the key, no sign-in.
  { pattern: '/flags/[token]', access: 'anyone' },
];
