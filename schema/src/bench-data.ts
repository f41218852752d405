import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { studies } from './studies';
import { users } from './users';

/** Bench measurements uploaded against a study, parsed into rows for comparison with the model. */
export const benchData = pgTable(
  'bench_data',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studyId: uuid('study_id')
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    fileName: text('file_name').notNull(),
    mimeType: text('mime_type').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    /** Parsed rows, each with SI-named fields (e.g. `gap_m`, `mutual_inductance_h`). */
    rows: jsonb('rows').$type<Record<string, unknown>[]>().notNull(),
    uploadedBy: uuid('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
    uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('bench_data_study_idx').on(t.studyId, t.uploadedAt),
    index('bench_data_uploaded_by_idx').on(t.uploadedBy),
  ],
);

export type BenchDataRow = typeof benchData.$inferSelect;
