/** `npm run db:migrate`: apply pending migrations to DATA_DIR's database. */
import { getConfig } from '../config';
import { openDatabase } from '../db/client';
import { runMigrations } from '../db/migrate';

const db = openDatabase(getConfig().databaseFile);
runMigrations(db);
db.$client.close();
console.log('Migrations applied.');
