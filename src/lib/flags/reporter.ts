import { desc, eq, or, sql } from 'drizzle-orm';
import { flags } from '../../../db/schema';
import type { Db } from '../db/client';
import { forReporter, getFlagDetail } from './detail';
import type { FlagDetail } from './detail';
import { hashToken } from './ids';

/** A user's own flags, newest first: made while signed in, or signed out with the same address. */
export function flagsOfUser(db: Db, user: { id: string; email: string }): FlagDetail[] {
  const rows = db
    .select({ id: flags.id })
    .from(flags)
    .where(
      or(eq(flags.reporterUserId, user.id), eq(flags.reporterEmail, sql`lower(${user.email})`)),
    )
    .orderBy(desc(flags.createdAt))
    .limit(100)
    .all();
  return rows.flatMap((r) => {
    const d = getFlagDetail(db, r.id);
    return d ? [forReporter(d)] : [];
  });
}

/** The flag a view token opens, as its reporter may see it, or null. */
export function flagByToken(db: Db, token: string): FlagDetail | null {
  if (!/^[\w-]{20,100}$/.test(token)) return null;
  const row = db
    .select({ id: flags.id })
    .from(flags)
    .where(eq(flags.viewTokenHash, hashToken(token)))
    .get();
  const d = row ? getFlagDetail(db, row.id) : null;
  return d ? forReporter(d) : null;
}
