import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  unique,
  uuid,
} from 'drizzle-orm/pg-core';
import { users } from './users';
import { workspaces } from './workspaces';

/** The physics engine's coil kinds (physics/src/coils/coil-schema.ts), spelt the same way. */
export const coilKind = pgEnum('coil_kind', [
  'ring',
  'rings',
  'circular-spiral',
  'rectangular-spiral',
  'solenoid',
  'path',
]);

/**
 * A workspace's coil library. `spec` holds the kind-specific geometry in SI units (validated by
 * the API against the physics engine's types); the figures are cached from the engine so tables
 * can sort by them. `version` guards against lost updates (optimistic concurrency).
 */
export const coils = pgTable(
  'coils',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    workspaceId: uuid('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    kind: coilKind('kind').notNull(),
    description: text('description').notNull().default(''),
    spec: jsonb('spec').$type<Record<string, unknown>>().notNull(),
    /** Frequency the library's figures (R_ac, Q) are given at, Hz. */
    operatingFrequencyHz: doublePrecision('operating_frequency_hz'),
    /** Current the stored energy is given at, A. */
    ratedCurrentA: doublePrecision('rated_current_a'),
    selfInductanceH: doublePrecision('self_inductance_h'),
    dcResistanceOhm: doublePrecision('dc_resistance_ohm'),
    acResistanceOhm: doublePrecision('ac_resistance_ohm'),
    qualityFactor: doublePrecision('quality_factor'),
    wireLengthM: doublePrecision('wire_length_m'),
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    unique('coils_workspace_name_unique').on(t.workspaceId, t.name),
    index('coils_workspace_idx').on(t.workspaceId, t.updatedAt),
  ],
);

export type CoilRow = typeof coils.$inferSelect;
