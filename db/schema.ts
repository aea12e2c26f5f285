/**
 * The whole Probity data model (Drizzle, MariaDB). Later work adds columns, not tables
 * for these concepts. Every record carries a UUID and a workspace id. Tables are split
 * by concern under db/tables/; this file is the single entry for drizzle-kit and the app.
 */
export * from './tables/identity';
export * from './tables/machines';
export * from './tables/parts';
export * from './tables/programs';
export * from './tables/runs';
export * from './tables/system';
