import {
  index,
  integer,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';

export const outboxStatus = pgEnum('outbox_status', ['pending', 'sending', 'sent', 'failed']);

/**
 * E-mail outbox. Rows are written in the same transaction as the action that causes the mail, and
 * a sender loop delivers them, so an SMTP outage delays mail but loses none. The idempotency key
 * makes a repeated enqueue a no-op and doubles as the Message-ID.
 */
export const outboxMessages = pgTable(
  'outbox_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    idempotencyKey: text('idempotency_key').notNull(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    textBody: text('text_body').notNull(),
    htmlBody: text('html_body'),
    status: outboxStatus('status').notNull().default('pending'),
    attempts: integer('attempts').notNull().default(0),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }).notNull().defaultNow(),
    /** While `sending`, the claim lapses at this time so a crashed sender's rows are retried. */
    lockedUntil: timestamp('locked_until', { withTimezone: true }),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    lastError: text('last_error'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('outbox_messages_idempotency_key_unique').on(t.idempotencyKey),
    index('outbox_messages_due_idx').on(t.status, t.nextAttemptAt),
  ],
);

export type OutboxMessageRow = typeof outboxMessages.$inferSelect;
