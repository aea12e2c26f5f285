/** Machines (with versioned engine models), probes and their calibration history. */
import { double, index, int, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import type { Machine } from '@/lib/kinematics/schema';
import { createdAt, id, jsonColumn, ref, timestamp, workspaceRef } from './columns';
import { users, workspaces } from './identity';

export const MACHINE_LAYOUTS = ['three-axis', 'table-table', 'head-table', 'head-head'] as const;
export type MachineLayout = (typeof MACHINE_LAYOUTS)[number];

export const machines = mysqlTable('machines', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  name: varchar('name', { length: 120 }).notNull(),
  layout: mysqlEnum('layout', MACHINE_LAYOUTS).notNull(),
  controller: varchar('controller', { length: 80 }),
  notes: text('notes'),
  /** The version programs get by default; null until the first version exists. */
  currentVersionId: ref('current_version_id'),
  archivedAt: timestamp('archived_at'),
  createdAt: createdAt(),
  updatedAt: timestamp('updated_at').notNull(),
}, (t) => [uniqueIndex('machines_workspace_name_uq').on(t.workspaceId, t.name)]);

/** An immutable snapshot of a machine's engine model; programs point at the version they were built for. */
export const machineVersions = mysqlTable('machine_versions', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  machineId: ref('machine_id').notNull().references(() => machines.id, { onDelete: 'cascade' }),
  version: int('version').notNull(),
  /** The full engine machine model (lib/kinematics/schema.ts). */
  model: jsonColumn<Machine>('model').notNull(),
  /** Spindle-head pivot to gauge line, mm (head rotaries); null for table-only machines. */
  headPivotMm: double('head_pivot_mm'),
  /** Post-processor id (a folder name under postprocessors/). */
  postId: varchar('post_id', { length: 64 }).notNull(),
  note: varchar('note', { length: 500 }),
  createdBy: ref('created_by').references(() => users.id),
  createdAt: createdAt(),
}, (t) => [uniqueIndex('machine_versions_machine_version_uq').on(t.machineId, t.version)]);

export const probes = mysqlTable('probes', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  name: varchar('name', { length: 120 }).notNull(),
  stylusDiameterMm: double('stylus_diameter_mm').notNull(),
  /** Effective (calibrated) ball diameter, mm; null until calibrated. */
  effectiveDiameterMm: double('effective_diameter_mm'),
  stylusLengthMm: double('stylus_length_mm').notNull(),
  /** Unidirectional repeatability, 2σ, mm. */
  repeatability2SigmaMm: double('repeatability_2sigma_mm').notNull(),
  approachMm: double('approach_mm').notNull(),
  overtravelMm: double('overtravel_mm').notNull(),
  clearanceMm: double('clearance_mm').notNull(),
  fastFeedMmPerMin: double('fast_feed_mm_per_min').notNull(),
  measureFeedMmPerMin: double('measure_feed_mm_per_min').notNull(),
  archivedAt: timestamp('archived_at'),
  createdAt: createdAt(),
  updatedAt: timestamp('updated_at').notNull(),
}, (t) => [uniqueIndex('probes_workspace_name_uq').on(t.workspaceId, t.name)]);

export const PROBE_EVENT_KINDS = ['calibration', 'stylus-change', 'collision'] as const;
export type ProbeEventKind = (typeof PROBE_EVENT_KINDS)[number];

/** Calibrations and the events that void one (stylus change, collision). */
export const probeCalibrations = mysqlTable('probe_calibrations', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  probeId: ref('probe_id').notNull().references(() => probes.id, { onDelete: 'cascade' }),
  kind: mysqlEnum('kind', PROBE_EVENT_KINDS).notNull(),
  occurredAt: timestamp('occurred_at').notNull(),
  effectiveDiameterMm: double('effective_diameter_mm'),
  repeatability2SigmaMm: double('repeatability_2sigma_mm'),
  /** Ring or sphere used, its certificate, and so on. */
  reference: varchar('reference', { length: 200 }),
  /** The calibration artifact's certificate number. */
  certificate: varchar('certificate', { length: 120 }),
  /** Feed of the calibration touches, mm/min (it should match the measuring feed). */
  feedMmPerMin: double('feed_mm_per_min'),
  note: varchar('note', { length: 500 }),
  recordedBy: ref('recorded_by').references(() => users.id),
  createdAt: createdAt(),
}, (t) => [index('probe_calibrations_probe_idx').on(t.probeId, t.occurredAt)]);

