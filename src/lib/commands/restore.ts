/** `npm run db:restore FILE`: replace the database with a checked backup (server stopped). */
import { getConfig } from '../config';
import { restoreDatabase } from '../db/backup';

const file = process.argv[2];
if (!file) {
  console.error('Usage: npm run db:restore -- FILE   (stop the server first)');
  process.exit(2);
}
try {
  restoreDatabase(file, getConfig().databaseFile);
  console.log(`Restored ${getConfig().databaseFile} from ${file}`);
} catch (error) {
  console.error(`Restore failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}
