/**
 * The one MariaDB connection pool (mysql2), cached on globalThis so module reloads in
 * development do not open a new pool each time. Created on first use.
 */
import { drizzle, type MySql2Database } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import { getEnv } from '@/lib/env';
import * as schema from './schema';

export type Db = MySql2Database<typeof schema>;
/** The handle a transaction callback receives; data-layer functions accept Db or Tx. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;

const globalForDb = globalThis as unknown as { probityPool?: mysql.Pool; probityDb?: Db };

export function createPool(url: string): mysql.Pool {
  return mysql.createPool({
    uri: url,
    connectionLimit: 10,
    timezone: 'Z',
    connectTimeout: 3000,
    enableKeepAlive: true,
    // A statement waits at most this long for a free connection (health checks stay quick).
    maxIdle: 10,
  });
}

export function getPool(): mysql.Pool {
  globalForDb.probityPool ??= createPool(getEnv().DATABASE_URL);
  return globalForDb.probityPool;
}

export function getDb(): Db {
  globalForDb.probityDb ??= drizzle(getPool(), { schema, mode: 'default' });
  return globalForDb.probityDb;
}

/** Closes the pool (scripts and tests). */
export async function closeDb(): Promise<void> {
  const pool = globalForDb.probityPool;
  globalForDb.probityPool = undefined;
  globalForDb.probityDb = undefined;
  if (pool) await pool.end();
}
