/**
 * Request ids: a caller's own X-Request-Id is kept when it is a sane token (so a user's report or
 * a load balancer's id matches our logs), anything else is replaced by a new UUID.
 */
import { randomUUID } from 'node:crypto';

const SANE_ID = /^[\w-]{1,64}$/;

/** The id for a request, given the X-Request-Id header it arrived with (if any). */
export function requestIdFor(given: string | null | undefined): string {
  return given && SANE_ID.test(given) ? given : randomUUID();
}
