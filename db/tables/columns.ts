/**
 * Column helpers shared by every table.
 *
 * MariaDB stores JSON as LONGTEXT (with a json_valid check), so mysql2 hands it back
 * as a string; drizzle's own `json()` only stringifies on the way in. `jsonColumn`
 * parses on the way out, so reads give objects on MariaDB and MySQL alike.
 */
import { customType, datetime, varchar } from 'drizzle-orm/mysql-core';

export function jsonColumn<T>(name: string) {
  return customType<{ data: T; driverData: string }>({
    dataType: () => 'json',
    toDriver: (value: T) => JSON.stringify(value),
    fromDriver: (value: unknown) => (typeof value === 'string' ? JSON.parse(value) : value) as T,
  })(name);
}

/** UUID primary key (36 characters, generated in the app). */
export const id = () => varchar('id', { length: 36 }).primaryKey();
/** Foreign UUID reference column. */
export const ref = (name: string) => varchar(name, { length: 36 });
/** Every record belongs to a workspace. */
export const workspaceRef = () => ref('workspace_id').notNull();
/** UTC timestamps with millisecond precision. */
export const timestamp = (name: string) => datetime(name, { mode: 'date', fsp: 3 });
export const createdAt = () => timestamp('created_at').notNull();
