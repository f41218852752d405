import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  unique,
  uuid,
} from 'drizzle-orm/pg-core';
import { coils } from './coils';
import { users } from './users';
import { workspaces } from './workspaces';

/**
 * A study: one Tx and one Rx coil from the library, the operating point and the pose ranges.
 * Deleting a coil that a study uses is refused (restrict); revisions keep their own snapshots.
 */
export const studies = pgTable(
  'studies',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    workspaceId: uuid('workspace_id')
      .notNull()
      .references(() => workspaces.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    txCoilId: uuid('tx_coil_id').references(() => coils.id, { onDelete: 'restrict' }),
    rxCoilId: uuid('rx_coil_id').references(() => coils.id, { onDelete: 'restrict' }),
    operatingFrequencyHz: doublePrecision('operating_frequency_hz'),
    /** Tx coil current (rms), A. */
    txCurrentA: doublePrecision('tx_current_a'),
    /** Which figure the threshold bounds: 'k' (coupling) or 'eta' (maximum link efficiency). */
    thresholdKind: text('threshold_kind').notNull().default('k'),
    /** Lowest coupling coefficient the power stage works with (dimensionless). */
    minCouplingK: doublePrecision('min_coupling_k'),
    /** Lowest maximum link efficiency the design accepts, 0 … 1 (when thresholdKind = 'eta'). */
    minEfficiency: doublePrecision('min_efficiency'),
    compensation: text('compensation').notNull().default('series-series'),
    notes: text('notes').notNull().default(''),
    /** Nominal pose of the Rx in the Tx frame { x, y, z, tiltX, tiltY }, metres and degrees. */
    nominalPose: jsonb('nominal_pose').$type<Record<string, number>>().notNull().default({}),
    settings: jsonb('settings').$type<Record<string, unknown>>().notNull().default({}),
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    unique('studies_workspace_name_unique').on(t.workspaceId, t.name),
    index('studies_workspace_idx').on(t.workspaceId, t.updatedAt),
    index('studies_tx_coil_idx').on(t.txCoilId),
    index('studies_rx_coil_idx').on(t.rxCoilId),
  ],
);

export type StudyRow = typeof studies.$inferSelect;
