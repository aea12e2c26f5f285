/** Workspaces, people, memberships (roles per workspace), invitations, API tokens. */
import { boolean, double, index, int, mysqlTable, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import type { Role } from '@/lib/auth/roles';
import { createdAt, id, jsonColumn, ref, timestamp, workspaceRef } from './columns';


export const workspaces = mysqlTable('workspaces', {
  id: id(),
  slug: varchar('slug', { length: 60 }).notNull(),
  name: varchar('name', { length: 120 }).notNull(),
  createdAt: createdAt(),
}, (t) => [uniqueIndex('workspaces_slug_uq').on(t.slug)]);

/** One row per workspace; later settings add columns here. */
export const workspaceSettings = mysqlTable('workspace_settings', {
  workspaceId: ref('workspace_id').primaryKey().references(() => workspaces.id, { onDelete: 'cascade' }),
  /** A probe calibration older than this many days is flagged before a run. */
  calibrationAgeLimitDays: int('calibration_age_limit_days').notNull().default(7),
  /** A result past this share of its tolerance is `marginal`. */
  warningShare: double('warning_share').notNull().default(0.8),
  updatedAt: timestamp('updated_at').notNull(),
});

/** A person. E-mail is the sign-in name; one person may belong to several workspaces. */
export const users = mysqlTable('users', {
  id: id(),
  email: varchar('email', { length: 254 }).notNull(),
  name: varchar('name', { length: 120 }).notNull(),
  /** argon2id hash; null until the person has set a password through an invitation. */
  passwordHash: varchar('password_hash', { length: 255 }),
  active: boolean('active').notNull().default(true),
  lastSignInAt: timestamp('last_sign_in_at'),
  createdAt: createdAt(),
}, (t) => [uniqueIndex('users_email_uq').on(t.email)]);

/** A person's roles in one workspace. */
export const memberships = mysqlTable('memberships', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  userId: ref('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
  roles: jsonColumn<Role[]>('roles').notNull(),
  /** Deactivated members cannot sign in to this workspace; their history stays. */
  active: boolean('active').notNull().default(true),
  deactivatedAt: timestamp('deactivated_at'),
  createdAt: createdAt(),
}, (t) => [
  uniqueIndex('memberships_workspace_user_uq').on(t.workspaceId, t.userId),
  index('memberships_user_idx').on(t.userId),
]);

/** An invitation by e-mail: a single-use token (only its SHA-256 is stored) that expires. */
export const invitations = mysqlTable('invitations', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  email: varchar('email', { length: 254 }).notNull(),
  name: varchar('name', { length: 120 }).notNull(),
  roles: jsonColumn<Role[]>('roles').notNull(),
  tokenHash: varchar('token_hash', { length: 64 }).notNull(),
  invitedBy: ref('invited_by').notNull().references(() => users.id),
  expiresAt: timestamp('expires_at').notNull(),
  acceptedAt: timestamp('accepted_at'),
  acceptedUserId: ref('accepted_user_id').references(() => users.id),
  revokedAt: timestamp('revoked_at'),
  createdAt: createdAt(),
}, (t) => [
  uniqueIndex('invitations_token_uq').on(t.tokenHash),
  index('invitations_workspace_email_idx').on(t.workspaceId, t.email),
]);

/** Personal API tokens for the engine command line and scripts (only the SHA-256 is stored). */
export const apiTokens = mysqlTable('api_tokens', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  userId: ref('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
  name: varchar('name', { length: 80 }).notNull(),
  tokenHash: varchar('token_hash', { length: 64 }).notNull(),
  lastUsedAt: timestamp('last_used_at'),
  revokedAt: timestamp('revoked_at'),
  createdAt: createdAt(),
}, (t) => [uniqueIndex('api_tokens_hash_uq').on(t.tokenHash), index('api_tokens_user_idx').on(t.userId)]);

