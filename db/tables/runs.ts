/** Runs on the machine, the measured points they bring back, results and corrections. */
import { boolean, double, index, int, mysqlEnum, mysqlTable, text, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, id, jsonColumn, ref, timestamp, workspaceRef } from './columns';
import { users, workspaces } from './identity';
import { tolerances } from './parts';
import { revisions } from './programs';

export const runs = mysqlTable('runs', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  revisionId: ref('revision_id').notNull().references(() => revisions.id),
  /** The part's serial or lot number as the shop writes it. */
  serial: varchar('serial', { length: 80 }).notNull(),
  temperatureC: double('temperature_c'),
  /** True for results made by the simulator, never by a machine. */
  simulated: boolean('simulated').notNull().default(false),
  uploadedBy: ref('uploaded_by').notNull().references(() => users.id),
  measuredAt: timestamp('measured_at'),
  notes: text('notes'),
  createdAt: createdAt(),
}, (t) => [index('runs_revision_idx').on(t.revisionId), index('runs_workspace_created_idx').on(t.workspaceId, t.createdAt)]);

export const measurements = mysqlTable('measurements', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  runId: ref('run_id').notNull().references(() => runs.id, { onDelete: 'cascade' }),
  touchPointUuid: varchar('touch_point_uuid', { length: 36 }).notNull(),
  /** The reported trip point, part frame, mm. */
  xMm: double('x_mm').notNull(),
  yMm: double('y_mm').notNull(),
  zMm: double('z_mm').notNull(),
  /** Line of the uploaded file the record came from (null for simulated runs). */
  sourceLine: int('source_line'),
  /** Axis values as the control recorded them (machine frame, mm and degrees); null for CSV. */
  axes: jsonColumn<Record<string, number>>('axes'),
}, (t) => [index('measurements_run_idx').on(t.runId, t.touchPointUuid)]);

export const RESULT_STATUSES = ['conforming', 'marginal', 'nonconforming', 'not-evaluated'] as const;
export type ResultStatus = (typeof RESULT_STATUSES)[number];

export const results = mysqlTable('results', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  runId: ref('run_id').notNull().references(() => runs.id, { onDelete: 'cascade' }),
  toleranceId: ref('tolerance_id').notNull().references(() => tolerances.id),
  characteristic: varchar('characteristic', { length: 40 }).notNull(),
  value: double('value'),
  nominal: double('nominal'),
  lowerLimit: double('lower_limit'),
  upperLimit: double('upper_limit'),
  /** Extra tolerance from a material condition (MMC/LMC), mm. */
  bonus: double('bonus'),
  status: mysqlEnum('status', RESULT_STATUSES).notNull(),
  /** Expanded measurement uncertainty U (k = 2), mm. */
  uncertainty: double('uncertainty'),
  /** Decision rule applied, e.g. `simple-acceptance` or `guarded-acceptance`. */
  decisionRule: varchar('decision_rule', { length: 40 }).notNull(),
  /** Fit report and anything else the evaluation engine returns. */
  details: jsonColumn<Record<string, unknown>>('details').notNull(),
  createdAt: createdAt(),
}, (t) => [index('results_run_idx').on(t.runId), index('results_tolerance_idx').on(t.toleranceId)]);

export const corrections = mysqlTable('corrections', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  runId: ref('run_id').notNull().references(() => runs.id, { onDelete: 'cascade' }),
  /** e.g. `work-offset`, `tool-wear`, `tool-length`. */
  kind: varchar('kind', { length: 40 }).notNull(),
  /** Controller register, e.g. `G54 X` or `D12`. */
  register: varchar('register', { length: 40 }).notNull(),
  oldValue: double('old_value'),
  newValue: double('new_value').notNull(),
  /** The block to enter at the controller. */
  code: text('code').notNull(),
  /** Plain instructions, dead band, cap, the measurement it came from (from the evaluation engine). */
  details: jsonColumn<Record<string, unknown>>('details'),
  applied: boolean('applied').notNull().default(false),
  appliedBy: ref('applied_by').references(() => users.id),
  appliedAt: timestamp('applied_at'),
  createdAt: createdAt(),
}, (t) => [index('corrections_run_idx').on(t.runId)]);

