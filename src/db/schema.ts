// Drizzle schema. Kind-specific parameters (regulator settings, PA/filter/relay data, part ratings) live in
// JSON columns validated with zod at the edge, so the core types stay the single description of them.
import { sqliteTable, text, integer, real, index, primaryKey } from 'drizzle-orm/sqlite-core';

export const projects = sqliteTable('projects', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  notes: text('notes').notNull().default(''),
  frequencyHz: real('frequency_hz').notNull(),
  targetPowerW: real('target_power_w').notNull(),
  // mains: null columns mean a battery / DC-only station
  mainsNominalV: real('mains_nominal_v'),
  mainsFrequencyHz: real('mains_frequency_hz'),
  mainsLowFraction: real('mains_low_fraction'),
  mainsHighFraction: real('mains_high_fraction'),
  ambientC: real('ambient_c').notNull(),
  currency: text('currency').notNull(),
  kits: integer('kits').notNull(),
  keyingDuty: real('keying_duty').notNull(),
  primaryFuseA: real('primary_fuse_a'),
  enclosureAreaM2: real('enclosure_area_m2'),
  enclosureUWPerM2K: real('enclosure_u_w_per_m2k'),
  // IEC 60127-2 sheet of the fitted primary fuse (null = T3) and the transformer sizing basis (null = duty)
  primaryFuseSheet: text('primary_fuse_sheet'),
  transformerSizing: text('transformer_sizing'),
  rf: text('rf', { mode: 'json' }).notNull(), // RfSettings
  costing: text('costing', { mode: 'json' }).notNull(), // Costing
  // id of the project this one was cloned from as a variant. No foreign key: drizzle-kit's ALTER TABLE for SQLite
  // drops the ON DELETE action, so deleteProject clears the links itself and insertProject drops a dangling one.
  variantOf: text('variant_of'),
  version: integer('version').notNull().default(1),
  createdAt: text('created_at').notNull(),
  updatedAt: text('updated_at').notNull(),
});

export const transformers = sqliteTable(
  'transformers',
  {
    id: text('id').primaryKey(),
    projectId: text('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    name: text('name').notNull(),
    construction: text('construction').notNull(),
    // null = no tolerance corner; rows from before this column read 5 % (the spec's default)
    secondaryToleranceFraction: real('secondary_tolerance_fraction').default(0.05),
  },
  (t) => [index('transformers_project').on(t.projectId)],
);

export const windings = sqliteTable(
  'windings',
  {
    id: text('id').primaryKey(),
    transformerId: text('transformer_id')
      .notNull()
      .references(() => transformers.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    name: text('name').notNull(),
    ratedVrms: real('rated_vrms').notNull(),
    ratedA: real('rated_a').notNull(),
    regulationFraction: real('regulation_fraction').notNull(),
    resistanceOhm: real('resistance_ohm'),
    leakageH: real('leakage_h'), // null = split from the regulation figure
  },
  (t) => [index('windings_transformer').on(t.transformerId)],
);

export const rails = sqliteTable(
  'rails',
  {
    id: text('id').primaryKey(),
    projectId: text('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    name: text('name').notNull(),
    kind: text('kind').notNull(), // rectified | regulated | battery
    params: text('params', { mode: 'json' }).notNull(), // the rest of the core Rail object
  },
  (t) => [index('rails_project').on(t.projectId)],
);

export const stages = sqliteTable(
  'stages',
  {
    id: text('id').primaryKey(),
    projectId: text('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    kind: text('kind').notNull(),
    name: text('name').notNull(),
    notes: text('notes').notNull().default(''),
    dissipationW: real('dissipation_w'),
    params: text('params', { mode: 'json' }), // { pa } | { lpf } | { relay } | null
  },
  (t) => [index('stages_project').on(t.projectId)],
);

export const stageLoads = sqliteTable(
  'stage_loads',
  {
    id: text('id').primaryKey(),
    stageId: text('stage_id')
      .notNull()
      .references(() => stages.id, { onDelete: 'cascade' }),
    railId: text('rail_id').notNull(),
    position: integer('position').notNull(),
    receiveA: real('receive_a').notNull(),
    keyUpA: real('key_up_a').notNull(),
    keyDownA: real('key_down_a').notNull(),
  },
  (t) => [index('stage_loads_stage').on(t.stageId)],
);

export const parts = sqliteTable(
  'parts',
  {
    id: text('id').primaryKey(),
    projectId: text('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    description: text('description').notNull(),
    category: text('category').notNull(),
    ratings: text('ratings', { mode: 'json' }).notNull(),
  },
  (t) => [index('parts_project').on(t.projectId)],
);

export const offers = sqliteTable(
  'offers',
  {
    id: text('id').primaryKey(),
    partId: text('part_id')
      .notNull()
      .references(() => parts.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    supplier: text('supplier').notNull(),
    sku: text('sku').notNull(),
    currency: text('currency').notNull(),
    breaks: text('breaks', { mode: 'json' }).notNull(), // PriceBreak[]
    minOrder: integer('min_order').notNull(),
    orderMultiple: integer('order_multiple').notNull(),
    stockNote: text('stock_note').notNull().default(''),
  },
  (t) => [index('offers_part').on(t.partId)],
);

export const bomLines = sqliteTable(
  'bom_lines',
  {
    id: text('id').primaryKey(),
    projectId: text('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    stageId: text('stage_id'),
    partId: text('part_id')
      .notNull()
      .references(() => parts.id),
    qtyPerRig: real('qty_per_rig').notNull(),
    refs: text('refs').notNull().default(''),
    notes: text('notes').notNull().default(''),
    // the design role the line fills (src/core/roles); null = not bound
    roleId: text('role_id'),
  },
  (t) => [index('bom_lines_project').on(t.projectId)],
);

// The project's core catalog: toroids and other cores a filter inductor or an output transformer is wound on.
// The numbers (AL, Ae, le, window, material range, flux limit) are the core's spec (src/core/spec/cores.ts), as JSON.
export const cores = sqliteTable(
  'cores',
  {
    id: text('id').primaryKey(),
    projectId: text('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    name: text('name').notNull(),
    params: text('params', { mode: 'json' }).notNull(),
  },
  (t) => [index('cores_project').on(t.projectId)],
);

// The stored project as it was after each version (JSON of the core Project), so a form loaded at an older
// version can be merged field by field with what was saved since. Only the last few per project are kept.
export const projectVersions = sqliteTable(
  'project_versions',
  {
    projectId: text('project_id')
      .notNull()
      .references(() => projects.id, { onDelete: 'cascade' }),
    version: integer('version').notNull(),
    snapshot: text('snapshot', { mode: 'json' }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.projectId, t.version] })],
);
