import { randomBytes } from 'node:crypto';
import path from 'node:path';
import { seedFlags } from '../../db/seed-flags';
import { sessions, users } from '../../db/schema';
import { openDatabase } from '../../src/lib/db/client';
import type { Db } from '../../src/lib/db/client';

/** The started app's own database file (the server keeps its own connection to it). */
export function appDb(dataDir: string): Db {
  return openDatabase(path.join(dataDir, 'drainwright.sqlite'));
}

export const ADMIN_ID = 'usr_test_admin';

/**
 * Test-only set-up on a started app: an admin user (the demo seed has none) and the demo flags
 * (seedFlags is idempotent, so this works whether or not db/seed.ts already calls it).
 */
export function prepareDesk(db: Db): void {
  db.insert(users)
    .values({
      id: ADMIN_ID,
      email: 'ops@drainwright.example',
      name: 'Ops Admin',
      staffRole: 'admin',
      createdAt: new Date(),
    })
    .onConflictDoNothing()
    .run();
  seedFlags(db);
}

/**
 * A signed-in cookie for a user: an Auth.js database-session row written directly, as the sign-in
 * flow would leave it, so these tests do not depend on clicking through the e-mailed link.
 */
export function sessionCookie(db: Db, userId: string): string {
  const token = randomBytes(24).toString('hex');
  db.insert(sessions)
    .values({ sessionToken: token, userId, expires: new Date(Date.now() + 86_400_000) })
    .run();
  return `authjs.session-token=${token}`;
}

export interface FakeEmail {
  id: string;
  to: string[];
  subject: string;
  text: string | null;
  html: string | null;
}

/** Messages the e-mail fake holds for an address, newest first, read over its HTTP API. */
export async function inbox(fakeUrl: string, to: string): Promise<FakeEmail[]> {
  const res = await fetch(`${fakeUrl}/emails?to=${encodeURIComponent(to)}`, {
    headers: { Authorization: 'Bearer re_fake_local_key' },
  });
  if (!res.ok) throw new Error(`fake inbox answered ${res.status}`);
  return ((await res.json()) as { data: FakeEmail[] }).data;
}

/** Wait until a message matching `match` reaches `to` (sending is synchronous, but be patient). */
export async function waitForEmail(
  fakeUrl: string,
  to: string,
  match: (e: FakeEmail) => boolean,
  timeoutMs = 10_000,
): Promise<FakeEmail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await inbox(fakeUrl, to)).find(match);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no matching e-mail reached ${to}`);
}

/** The first /flags/<token> link in a message. */
export function threadLink(e: FakeEmail): string {
  const m = /https?:\/\/\S+\/flags\/[\w-]+/.exec(e.text ?? '');
  if (!m) throw new Error('no thread link in the e-mail');
  return m[0];
}

/**
 * Fail fast when something already answers on a test port (an app left over from an aborted
 * run would otherwise answer the health check, and its database is not the one we prepare).
 */
export async function assertPortFree(port: number): Promise<void> {
  const taken = await fetch(`http://127.0.0.1:${port}/api/health`, {
    signal: AbortSignal.timeout(500),
  }).then(
    () => true,
    () => false,
  );
  if (taken) throw new Error(`port ${port} is already in use; stop the leftover server first`);
}
