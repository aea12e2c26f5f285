/** Applies the committed migrations in drizzle/ (run by npm start and npm test). */
import { migrate } from 'drizzle-orm/mysql2/migrator';
import { closeDb, getDb } from './client';

async function main(): Promise<void> {
  const started = Date.now();
  await migrate(getDb(), { migrationsFolder: new URL('../drizzle', import.meta.url).pathname });
  console.log(`[migrate] schema up to date (${Date.now() - started} ms)`);
}

main()
  .catch((error: unknown) => {
    const cause = error instanceof Error && error.cause instanceof Error ? ` (${error.cause.message})` : '';
    console.error('[migrate] failed:', error instanceof Error ? error.message + cause : error);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
