import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { decide, ruleFor } from '../../src/lib/auth/access';
import type { Viewer } from '../../src/lib/auth/access';
import { ROUTES } from '../../src/lib/auth/routes';
import type { Access } from '../../src/lib/auth/routes';

/** The six kinds of visitor the issue names. */
const org = (id: string, personal = false) => ({ id, name: id, plan: 'pro' as const, personal });
const user = (id: string, staffRole: 'support' | 'admin' | null = null) => ({ id, email: `${id}@x.test`, name: id, staffRole, unitSystem: null });
export const VIEWERS: Record<string, Viewer> = {
  signedOut: { user: null, organisation: null, role: null },
  freeUser: { user: user('free'), organisation: org('org_free', true), role: 'owner' },
  crew: { user: user('crew'), organisation: org('org_a'), role: 'member' },
  otherOwner: { user: user('other'), organisation: org('org_b'), role: 'owner' },
  owner: { user: user('owner'), organisation: org('org_a'), role: 'owner' },
  support: { user: user('desk', 'support'), organisation: null, role: null },
};

/**
 * The specification, written out by hand (not derived from access.ts): what each access level
 * lets each visitor do. 'allow', 401 (signed out) or 403 (signed in but not allowed).
 * A free user owns a personal workspace, so the middleware lets them through to 'owner' routes;
 * the Pro entitlement is the billing layer's check.
 */
const EXPECTED: Record<Access, Record<keyof typeof VIEWERS, 'allow' | 401 | 403>> = {
  anyone: { signedOut: 'allow', freeUser: 'allow', crew: 'allow', otherOwner: 'allow', owner: 'allow', support: 'allow' },
  signed_in: { signedOut: 401, freeUser: 'allow', crew: 'allow', otherOwner: 'allow', owner: 'allow', support: 'allow' },
  member: { signedOut: 401, freeUser: 'allow', crew: 'allow', otherOwner: 'allow', owner: 'allow', support: 403 },
  owner: { signedOut: 401, freeUser: 'allow', crew: 403, otherOwner: 'allow', owner: 'allow', support: 403 },
  support: { signedOut: 401, freeUser: 403, crew: 403, otherOwner: 403, owner: 403, support: 'allow' },
  admin: { signedOut: 401, freeUser: 403, crew: 403, otherOwner: 403, owner: 403, support: 403 },
};

const STATUS = { allow: 'allow', unauthorised: 401, forbidden: 403 } as const;

/** Every route file under src/pages, as the URL pattern Astro serves it at. */
export function pageRoutes(): string[] {
  const root = path.resolve('src/pages');
  const out: string[] = [];
  const walk = (dir: string): void => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (/\.(astro|ts|js|md|mdx)$/.test(entry.name)) {
        const rel = '/' + path.relative(root, full).replace(/\\/g, '/').replace(/\.(astro|ts|js|md|mdx)$/, '');
        out.push(rel.replace(/\/index$/, '') || '/');
      }
    }
  };
  walk(root);
  return out.sort();
}

describe('route table', () => {
  test('does declare every file under src/pages (a catch-all default does not count)', () => {
    const missing = pageRoutes().filter((r) => ruleFor(r).fallback);
    expect(missing).toEqual([]);
  });

  test('does keep the routes the issue names at their levels', () => {
    expect(ruleFor('/api/v1/line').access).toBe('anyone');
    expect(ruleFor('/api/health').access).toBe('anyone');
    expect(ruleFor('/app/anything/new').access).toBe('signed_in');
    expect(ruleFor('/app/team').access).toBe('owner');
    expect(ruleFor('/support/flags/f1').access).toBe('support');
    expect(ruleFor('/api/support/flags').access).toBe('support');
    expect(ruleFor('/api/jobs/j1/calculations/c1').access).toBe('member');
    expect(ruleFor('/api/unknown-new-thing').access).toBe('signed_in');
  });

  for (const rule of ROUTES) {
    for (const [who, viewer] of Object.entries(VIEWERS)) {
      test(`does answer ${String(EXPECTED[rule.access][who])} to ${who} on ${rule.pattern} (${rule.access})`, () => {
        const concrete = rule.pattern.replace(/\[[^\]]+\]/g, 'x1').replace(/\/\*\*$/, '/deep/x1');
        expect(ruleFor(concrete).access).toBe(rule.access);
        expect(STATUS[decide(rule.access, viewer)]).toBe(EXPECTED[rule.access][who]);
      });
    }
  }
});
