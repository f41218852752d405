import { index, integer, jsonb, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { studies } from './studies';
import { users } from './users';

/**
 * A frozen revision of a study: the inputs and copies of both coils as they were, the engine
 * version that computed the results, and the results. Rows are never updated (the API has no
 * update path for them), so a review always sees what was computed.
 */
export const studyRevisions = pgTable(
  'study_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studyId: uuid('study_id')
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    /** 1, 2, 3 … within the study. */
    number: integer('number').notNull(),
    /** What changed, in the author's words. */
    summary: text('summary').notNull().default(''),
    inputs: jsonb('inputs').$type<Record<string, unknown>>().notNull(),
    coilSnapshots: jsonb('coil_snapshots').$type<Record<string, unknown>>().notNull(),
    engineVersion: text('engine_version').notNull(),
    results: jsonb('results').$type<Record<string, unknown>>(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    unique('study_revisions_study_number_unique').on(t.studyId, t.number),
    index('study_revisions_created_by_idx').on(t.createdBy),
  ],
);

export type StudyRevisionRow = typeof studyRevisions.$inferSelect;
