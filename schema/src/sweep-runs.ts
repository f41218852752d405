import {
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uuid,
} from 'drizzle-orm/pg-core';
import { studyRevisions } from './revisions';
import { studies } from './studies';
import { users } from './users';

export const sweepStatus = pgEnum('sweep_status', [
  'queued',
  'running',
  'succeeded',
  'failed',
  'cancelled',
]);

/** One sweep of poses (gap, offset, tilt) for a study, run by a job-queue worker. */
export const sweepRuns = pgTable(
  'sweep_runs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studyId: uuid('study_id')
      .notNull()
      .references(() => studies.id, { onDelete: 'cascade' }),
    revisionId: uuid('revision_id').references(() => studyRevisions.id, { onDelete: 'set null' }),
    /** 'xy-map', 'gap', 'tilt' or 'xy-stack'. */
    kind: text('kind').notNull().default('xy-map'),
    /** Hash of the study inputs and coil specs the run computed from (stale once they change). */
    inputsHash: text('inputs_hash').notNull().default(''),
    spec: jsonb('spec').$type<Record<string, unknown>>().notNull(),
    status: sweepStatus('status').notNull().default('queued'),
    pointsTotal: integer('points_total').notNull().default(0),
    pointsDone: integer('points_done').notNull().default(0),
    /** 0 … 1. */
    progressFraction: doublePrecision('progress_fraction').notNull().default(0),
    /** Job-queue id, so a cancel can reach the worker. */
    jobId: text('job_id'),
    queuedAt: timestamp('queued_at', { withTimezone: true }).notNull().defaultNow(),
    startedAt: timestamp('started_at', { withTimezone: true }),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
    computeTimeS: doublePrecision('compute_time_s'),
    error: text('error'),
    /** Set when a user asks to cancel; the worker stops at its next chunk. */
    cancelRequestedAt: timestamp('cancel_requested_at', { withTimezone: true }),
    result: jsonb('result').$type<Record<string, unknown>>(),
    requestedBy: uuid('requested_by').references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [
    index('sweep_runs_study_idx').on(t.studyId, t.queuedAt),
    index('sweep_runs_status_idx').on(t.status),
    index('sweep_runs_revision_idx').on(t.revisionId),
  ],
);

export type SweepRunRow = typeof sweepRuns.$inferSelect;
