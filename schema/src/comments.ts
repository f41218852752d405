import {
  boolean,
  doublePrecision,
  index,
  pgTable,
  text,
  timestamp,
  uuid,
} from 'drizzle-orm/pg-core';
import { studyRevisions } from './revisions';
import { users } from './users';

/**
 * Review comments on a frozen revision. A comment may be pinned to a point of a coupling map,
 * given in the map's pose coordinates (lateral offset x/y and gap z, metres).
 */
export const comments = pgTable(
  'comments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    revisionId: uuid('revision_id')
      .notNull()
      .references(() => studyRevisions.id, { onDelete: 'cascade' }),
    authorId: uuid('author_id').references(() => users.id, { onDelete: 'set null' }),
    body: text('body').notNull(),
    pinXM: doublePrecision('pin_x_m'),
    pinYM: doublePrecision('pin_y_m'),
    pinZM: doublePrecision('pin_z_m'),
    resolved: boolean('resolved').notNull().default(false),
    resolvedBy: uuid('resolved_by').references(() => users.id, { onDelete: 'set null' }),
    resolvedAt: timestamp('resolved_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('comments_revision_idx').on(t.revisionId, t.createdAt),
    index('comments_author_idx').on(t.authorId),
  ],
);

export type CommentRow = typeof comments.$inferSelect;
