/** `npm run db:seed`: migrate, then insert the demo scenario (idempotent). */
import { seedDemo } from '../../../db/seed';
import { getConfig } from '../config';
import { openDatabase } from '../db/client';
import { runMigrations } from '../db/migrate';

const db = openDatabase(getConfig().databaseFile);
runMigrations(db);
seedDemo(db);
db.$client.close();
console.log('Demo data seeded.');
