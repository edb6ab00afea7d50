import { createHash, randomBytes } from 'node:crypto';

/** A new random id with a readable prefix (e.g. flg_…), 96 bits of randomness. */
export function newId(prefix: string): string {
  return `${prefix}_${randomBytes(12).toString('base64url')}`;
}

/** A reporter's view token: 256 random bits, only ever sent in their e-mail. */
export function newViewToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What the database keeps of a view token, so a leaked database does not open threads. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
