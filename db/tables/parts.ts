/** Parts, their features, tolerances and datums. Feature and tolerance ids are the engine's UUIDs. */
import { double, index, int, mysqlEnum, mysqlTable, text, uniqueIndex, varchar } from 'drizzle-orm/mysql-core';
import { createdAt, id, jsonColumn, ref, timestamp, workspaceRef } from './columns';
import { workspaces } from './identity';

export const parts = mysqlTable('parts', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  number: varchar('number', { length: 100 }).notNull(),
  revision: varchar('revision', { length: 20 }).notNull(),
  name: varchar('name', { length: 200 }).notNull(),
  material: varchar('material', { length: 60 }),
  notes: text('notes'),
  archivedAt: timestamp('archived_at'),
  createdAt: createdAt(),
  updatedAt: timestamp('updated_at').notNull(),
}, (t) => [uniqueIndex('parts_workspace_number_rev_uq').on(t.workspaceId, t.number, t.revision)]);

export const FEATURE_TYPES = ['plane', 'bore', 'boss', 'slot', 'web', 'sphere'] as const;

export const features = mysqlTable('features', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  partId: ref('part_id').notNull().references(() => parts.id, { onDelete: 'cascade' }),
  type: mysqlEnum('type', FEATURE_TYPES).notNull(),
  label: varchar('label', { length: 40 }).notNull(),
  /** Type-specific geometry in the part frame, mm (origin/normal/center/axis/diameter…). */
  geometry: jsonColumn<Record<string, unknown>>('geometry').notNull(),
  /** Point options: points, levels, margin, startAngle. */
  pointOptions: jsonColumn<Record<string, unknown>>('point_options').notNull(),
  sortOrder: int('sort_order').notNull().default(0),
  createdAt: createdAt(),
}, (t) => [uniqueIndex('features_part_label_uq').on(t.partId, t.label)]);

export const CHARACTERISTICS = [
  'diameter', 'width', 'position', 'flatness', 'circularity', 'cylindricity',
  'perpendicularity', 'parallelism', 'profile',
] as const;
export const MATERIAL_CONDITIONS = ['MMC', 'LMC', 'RFS'] as const;

export const tolerances = mysqlTable('tolerances', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  partId: ref('part_id').notNull().references(() => parts.id, { onDelete: 'cascade' }),
  featureId: ref('feature_id').notNull().references(() => features.id, { onDelete: 'cascade' }),
  characteristic: mysqlEnum('characteristic', CHARACTERISTICS).notNull(),
  value: double('value'),
  upper: double('upper'),
  lower: double('lower'),
  fit: varchar('fit', { length: 20 }),
  material: mysqlEnum('material', MATERIAL_CONDITIONS),
  datums: jsonColumn<string[]>('datums').notNull(),
  /** The drawing's balloon or characteristic number, as the shop calls it. */
  reference: varchar('reference', { length: 40 }),
  createdAt: createdAt(),
}, (t) => [index('tolerances_feature_idx').on(t.featureId), index('tolerances_part_idx').on(t.partId)]);

export const datums = mysqlTable('datums', {
  id: id(),
  workspaceId: workspaceRef().references(() => workspaces.id, { onDelete: 'cascade' }),
  partId: ref('part_id').notNull().references(() => parts.id, { onDelete: 'cascade' }),
  letter: varchar('letter', { length: 1 }).notNull(),
  featureId: ref('feature_id').notNull().references(() => features.id, { onDelete: 'cascade' }),
  createdAt: createdAt(),
}, (t) => [uniqueIndex('datums_part_letter_uq').on(t.partId, t.letter)]);
