import { defineConfig } from 'drizzle-kit';

// drizzle-kit generates SQL migrations from db/schema into db/migrations; the app applies them
// with drizzle's migrator at start, so this file only serves `npm run db:generate`.
export default defineConfig({
  dialect: 'sqlite',
  schema: './db/schema/index.ts',
  out: './db/migrations',
});
