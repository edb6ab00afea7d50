import { eq } from 'drizzle-orm';
import { users } from '../../../db/schema';
import { getDb } from '../db/client';
import type { UnitSystem } from '../hydraulics/units';

/** Remember the unit system a person picked, so their other devices start on it. */
export function saveUnitSystem(userId: string, system: UnitSystem): void {
  getDb().update(users).set({ unitSystem: system }).where(eq(users.id, userId)).run();
}
