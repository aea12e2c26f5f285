import 'server-only';
import { sql } from 'drizzle-orm';
import { getDb } from '@/db/client';
import { driverErrorCode } from '@/lib/server/errors';

const TIMEOUT_MS = 2000;

export async function checkDatabase(): Promise<{ up: true; latencyMs: number } | { up: false; reason: string }> {
  const started = Date.now();
  let timer: NodeJS.Timeout | undefined;
  try {
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`no answer within ${TIMEOUT_MS} ms`)), TIMEOUT_MS);
    });
    await Promise.race([getDb().execute(sql`SELECT 1`), timeout]);
    return { up: true, latencyMs: Date.now() - started };
  } catch (error) {
    const code = driverErrorCode(error);
    return { up: false, reason: code ?? (error instanceof Error ? error.message : String(error)) };
  } finally {
    clearTimeout(timer);
  }
}
