import { NextResponse } from 'next/server';
import { checkDatabase } from '@/db/queries/health';

export const dynamic = 'force-dynamic';

/**
 * Public liveness and database state. 200 when the database answers, 503 with a message
 * when it does not; the pool reconnects by itself once the database is back.
 */
export async function GET(): Promise<Response> {
  const db = await checkDatabase();
  if (db.up) return NextResponse.json({ status: 'ok', database: 'up', latencyMs: db.latencyMs });
  return NextResponse.json(
    { status: 'degraded', database: 'down', error: { code: 'unavailable', message: `The database is not answering: ${db.reason}` } },
    { status: 503, headers: { 'Retry-After': '5' } },
  );
}
