/** `npm run db:backup`: an online, consistent copy of the database under DATA_DIR/backups. */
import { getConfig } from '../config';
import { backupDatabase } from '../db/backup';

const config = getConfig();
backupDatabase(config.databaseFile, config.dataDir)
  .then((file) => console.log(`Backup written: ${file}`))
  .catch((error: unknown) => {
    console.error(`Backup failed: ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  });
