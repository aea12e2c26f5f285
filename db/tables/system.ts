/** Audit trail, sign-in attempts (throttling) and the persisted mail outbox. */
import { boolean, index, int, mysqlEnum, mysqlTable, text, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, id, jsonColumn, ref, timestamp } from './columns';
import { workspaces } from './identity';

/**
 * Who did what, when. `workspaceId` is null only for events that belong to no
 * workspace (a failed sign-in for an unknown e-mail address).
 */
export const auditEvents = mysqlTable('audit_events', {
  id: id(),
  workspaceId: ref('workspace_id').references(() => workspaces.id, { onDelete: 'cascade' }),
  actorUserId: ref('actor_user_id'),
  /** Copied so the trail stays readable after a person changes name or leaves. */
  actorEmail: varchar('actor_email', { length: 254 }),
  action: varchar('action', { length: 64 }).notNull(),
  targetType: varchar('target_type', { length: 40 }),
  targetId: varchar('target_id', { length: 64 }),
  summary: varchar('summary', { length: 500 }).notNull(),
  details: jsonColumn<Record<string, unknown>>('details').notNull(),
  ip: varchar('ip', { length: 64 }),
  createdAt: createdAt(),
}, (t) => [
  index('audit_workspace_created_idx').on(t.workspaceId, t.createdAt),
  index('audit_workspace_action_idx').on(t.workspaceId, t.action),
]);

/** Every sign-in try, kept for throttling (failures per account and per address). */
export const signInAttempts = mysqlTable('sign_in_attempts', {
  id: id(),
  email: varchar('email', { length: 254 }).notNull(),
  ip: varchar('ip', { length: 64 }).notNull(),
  success: boolean('success').notNull(),
  createdAt: createdAt(),
}, (t) => [
  index('sign_in_attempts_email_idx').on(t.email, t.createdAt),
  index('sign_in_attempts_ip_idx').on(t.ip, t.createdAt),
]);

export const MAIL_STATUSES = ['pending', 'sent', 'failed'] as const;

/** Mail is written here in the same transaction as the change that causes it, then delivered and retried. */
export const mailOutbox = mysqlTable('mail_outbox', {
  id: id(),
  workspaceId: ref('workspace_id').references(() => workspaces.id, { onDelete: 'cascade' }),
  kind: varchar('kind', { length: 40 }).notNull(),
  toAddress: varchar('to_address', { length: 254 }).notNull(),
  subject: varchar('subject', { length: 200 }).notNull(),
  textBody: text('text_body').notNull(),
  htmlBody: text('html_body'),
  status: mysqlEnum('status', MAIL_STATUSES).notNull().default('pending'),
  attempts: int('attempts').notNull().default(0),
  lastError: varchar('last_error', { length: 500 }),
  nextAttemptAt: timestamp('next_attempt_at').notNull(),
  sentAt: timestamp('sent_at'),
  createdAt: createdAt(),
}, (t) => [index('mail_outbox_due_idx').on(t.status, t.nextAttemptAt)]);
