/**
 * Seats an organisation may fill (members plus open invitations). A constant until the billing
 * work replaces this with the number of seats paid for; callers only use seatLimit(orgId).
 */
export const DEFAULT_SEAT_LIMIT = 10;

export function seatLimit(_orgId: string): number {
  return DEFAULT_SEAT_LIMIT;
}
