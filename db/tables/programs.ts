/** Programs, their revisions (the reviewed unit), touch points and review decisions. */
import { index, int, longtext, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, id, jsonColumn, ref, timestamp, workspaceRef } from './columns';
import { users, workspaces } from './identity';
import { machines, machineVersions, probes } from './machines';
import { features, parts } from './parts';

export const programs = mysqlTable('programs', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  name: varchar('name', { length: 160 }).notNull(),
  partId: ref('part_id').notNull().references(() => parts.id),
  machineId: ref('machine_id').notNull().references(() => machines.id),
  machineVersionId: ref('machine_version_id').notNull().references(() => machineVersions.id),
  probeId: ref('probe_id').notNull().references(() => probes.id),
  postId: varchar('post_id', { length: 64 }).notNull(),
  /** The program this one was copied from (e.g. the same part on another machine). */
  linkedFromProgramId: ref('linked_from_program_id'),
  createdBy: ref('created_by').notNull().references(() => users.id),
  archivedAt: timestamp('archived_at'),
  createdAt: createdAt(),
  updatedAt: timestamp('updated_at').notNull(),
}, (t) => [index('programs_part_idx').on(t.partId), index('programs_machine_idx').on(t.machineId)]);

export const REVISION_STATUSES = ['draft', 'in-review', 'approved', 'sent-back'] as const;
export type RevisionStatus = (typeof REVISION_STATUSES)[number];

export const revisions = mysqlTable('revisions', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  programId: ref('program_id').notNull().references(() => programs.id, { onDelete: 'cascade' }),
  number: int('number').notNull(),
  authorId: ref('author_id').notNull().references(() => users.id),
  message: varchar('message', { length: 500 }).notNull(),
  status: mysqlEnum('status', REVISION_STATUSES).notNull().default('draft'),
  programText: longtext('program_text').notNull(),
  /** SHA-256 of programText (hex), as written into the package manifest. */
  sha256: varchar('sha256', { length: 64 }).notNull(),
  /** The engine plan (lib/program/plan-schema.ts) this text was generated from. */
  plan: jsonColumn<unknown>('plan').notNull(),
  /** Verifier findings; a revision with blocking findings cannot be approved. */
  findings: jsonColumn<unknown[]>('findings').notNull(),
  baseRevisionId: ref('base_revision_id'),
  submittedAt: timestamp('submitted_at'),
  approverId: ref('approver_id').references(() => users.id),
  approvedAt: timestamp('approved_at'),
  createdAt: createdAt(),
}, (t) => [
  uniqueIndex('revisions_program_number_uq').on(t.programId, t.number),
  index('revisions_workspace_status_idx').on(t.workspaceId, t.status),
]);

/** One planned touch; `uuid` is the engine's deterministic id, repeated across revisions. */
export const touchPoints = mysqlTable('touch_points', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  revisionId: ref('revision_id').notNull().references(() => revisions.id, { onDelete: 'cascade' }),
  uuid: varchar('uuid', { length: 36 }).notNull(),
  featureId: ref('feature_id').notNull().references(() => features.id),
  seq: int('seq').notNull(),
  /** surface, normal, direction, target, start, end, toolAxis (part frame, mm). */
  geometry: jsonColumn<Record<string, unknown>>('geometry').notNull(),
  /** Machine axis values for this touch (mm, degrees). */
  axes: jsonColumn<Record<string, number>>('axes').notNull(),
}, (t) => [
  uniqueIndex('touch_points_revision_uuid_uq').on(t.revisionId, t.uuid),
  index('touch_points_revision_seq_idx').on(t.revisionId, t.seq),
]);

export const REVIEW_DECISIONS = ['approved', 'sent-back', 'comment'] as const;

export const reviewDecisions = mysqlTable('review_decisions', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  revisionId: ref('revision_id').notNull().references(() => revisions.id, { onDelete: 'cascade' }),
  reviewerId: ref('reviewer_id').notNull().references(() => users.id),
  decision: mysqlEnum('decision', REVIEW_DECISIONS).notNull(),
  comment: text('comment'),
  createdAt: createdAt(),
}, (t) => [index('review_decisions_revision_idx').on(t.revisionId)]);
