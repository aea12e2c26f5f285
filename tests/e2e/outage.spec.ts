/**
 * The health route reports the database; when MariaDB stops the app answers 503 with a
 * message, and it recovers without a restart once MariaDB is back. Runs last (its own project).
 */
import { execFileSync } from 'node:child_process';
import { expect, test } from '@playwright/test';

const db = (command: 'start' | 'stop') => execFileSync('bash', ['db/mariadb.sh', command], { stdio: 'pipe', timeout: 60_000 });

test('health: 200 → 503 while the database is down → 200 again', async ({ request }) => {
  test.setTimeout(90_000);
  const up = await request.get('/api/health');
  expect(up.status()).toBe(200);
  expect(await up.json()).toMatchObject({ status: 'ok', database: 'up' });

  db('stop');
  try {
    const down = await request.get('/api/health');
    expect(down.status()).toBe(503);
    const body = (await down.json()) as { database: string; error: { code: string; message: string } };
    expect(body.database).toBe('down');
    expect(body.error.code).toBe('unavailable');
    expect(body.error.message).toContain('The database is not answering');
  } finally {
    db('start');
  }
  await expect.poll(async () => (await request.get('/api/health')).status(), { timeout: 30_000 }).toBe(200);
});
