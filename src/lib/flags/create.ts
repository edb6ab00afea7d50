import { flagSnapshots, flags } from '../../../db/schema';
import type { Db } from '../db/client';
import { hashToken, newId, newViewToken } from './ids';
import type { NewFlag } from './schemas';

/** Who is flagging: a signed-in user (with their organisation, if any) or an e-mail address. */
export interface Reporter {
  userId: string | null;
  email: string;
  organisationId: string | null;
}

export interface CreatedFlag {
  id: string;
  /** The reporter's view token; goes into their e-mail and nowhere else. */
  token: string;
}

/** Store a flag and its frozen snapshot in one transaction. */
export function createFlag(
  db: Db,
  input: NewFlag,
  reporter: Reporter,
  now = new Date(),
): CreatedFlag {
  const id = newId('flg');
  const token = newViewToken();
  db.transaction((tx) => {
    tx.insert(flags)
      .values({
        id,
        tool: input.tool,
        reason: input.reason,
        message: input.message,
        reporterUserId: reporter.userId,
        reporterEmail: reporter.email.toLowerCase(),
        organisationId: reporter.organisationId,
        status: 'new',
        viewTokenHash: hashToken(token),
        createdAt: now,
        updatedAt: now,
      })
      .run();
    tx.insert(flagSnapshots)
      .values({ flagId: id, ...input.snapshot, createdAt: now })
      .run();
  });
  return { id, token };
}
