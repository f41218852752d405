import { and, eq, sql } from 'drizzle-orm';
import { outboxMessages, type OutboxMessageRow } from '../../../schema/src/index';
import type { Executor } from '../db/database';

export interface NewOutboxMessage {
  idempotencyKey: string;
  toAddress: string;
  subject: string;
  textBody: string;
  htmlBody?: string;
}

/** A second enqueue with the same key is a no-op, so retried actions never mail twice. */
export async function insertOutboxMessage(ex: Executor, message: NewOutboxMessage) {
  await ex.insert(outboxMessages).values(message).onConflictDoNothing();
}

/**
 * Claims due messages for one sender. SKIP LOCKED lets several senders (processes or machines)
 * share the table without taking the same row; the lease makes a crashed sender's rows due again.
 */
export async function claimDueMessages(
  ex: Executor,
  batchSize: number,
  leaseMs: number,
): Promise<OutboxMessageRow[]> {
  const result = await ex.execute<Record<string, unknown>>(sql`
    UPDATE ${outboxMessages}
       SET status = 'sending',
           attempts = attempts + 1,
           locked_until = now() + ${leaseMs} * interval '1 millisecond'
     WHERE id IN (
       SELECT id FROM ${outboxMessages}
        WHERE (status = 'pending' AND next_attempt_at <= now())
           OR (status = 'sending' AND locked_until < now())
        ORDER BY next_attempt_at
        LIMIT ${batchSize}
        FOR UPDATE SKIP LOCKED)
    RETURNING id`);
  const ids = result.rows.map((r) => String(r.id));
  if (ids.length === 0) return [];
  return ex
    .select()
    .from(outboxMessages)
    .where(
      sql`${outboxMessages.id} IN (${sql.join(
        ids.map((id) => sql`${id}`),
        sql`, `,
      )})`,
    );
}

export async function markSent(ex: Executor, id: string): Promise<void> {
  await ex
    .update(outboxMessages)
    .set({ status: 'sent', sentAt: new Date(), lockedUntil: null, lastError: null })
    .where(and(eq(outboxMessages.id, id), eq(outboxMessages.status, 'sending')));
}

export async function markAttemptFailed(
  ex: Executor,
  id: string,
  error: string,
  retryAt: Date | null,
): Promise<void> {
  await ex
    .update(outboxMessages)
    .set({
      status: retryAt ? 'pending' : 'failed',
      nextAttemptAt: retryAt ?? new Date(),
      lockedUntil: null,
      lastError: error.slice(0, 2000),
    })
    .where(and(eq(outboxMessages.id, id), eq(outboxMessages.status, 'sending')));
}
