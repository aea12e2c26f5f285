import { defineConfig } from 'drizzle-kit';

// Migrations are generated (`npm run db:generate`) and applied by db/migrate.ts.
// Never use `drizzle-kit push` against MariaDB.
export default defineConfig({
  dialect: 'mysql',
  schema: './db/schema.ts',
  out: './drizzle',
});
