import type { Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { Database } from '../db/database';
import { claimDueMessages, markAttemptFailed, markSent } from './outbox-repository';

export interface OutboxSenderOptions {
  db: Database;
  transport: Transporter;
  from: string;
  logger: Logger;
  pollMs?: number;
  batchSize?: number;
  /** First retry delay; doubles per attempt up to maxBackoffMs. */
  baseBackoffMs?: number;
  maxBackoffMs?: number;
  maxAttempts?: number;
}

/**
 * Delivers the e-mail outbox. A message is sent, then marked sent; if the process dies in
 * between, the lease lapses and it is sent again with the same Message-ID, which receiving
 * servers use to drop the duplicate. A failed attempt is retried with exponential backoff.
 */
export class OutboxSender {
  private timer: NodeJS.Timeout | undefined;
  private running: Promise<number> | undefined;
  private stopped = true;
  private readonly pollMs: number;
  private readonly batchSize: number;
  private readonly baseBackoffMs: number;
  private readonly maxBackoffMs: number;
  private readonly maxAttempts: number;

  constructor(private readonly options: OutboxSenderOptions) {
    // One second keeps invitation mail feeling immediate at the cost of one cheap query.
    this.pollMs = options.pollMs ?? 1000;
    this.batchSize = options.batchSize ?? 20;
    this.baseBackoffMs = options.baseBackoffMs ?? 5000;
    // Capped at 30 min: an outage of a day still gets a try every half hour.
    this.maxBackoffMs = options.maxBackoffMs ?? 30 * 60_000;
    // 60 attempts with that cap is more than a day of trying before a message is marked failed.
    this.maxAttempts = options.maxAttempts ?? 60;
  }

  start(): void {
    if (!this.stopped) return;
    this.stopped = false;
    this.schedule(0);
  }

  /** Stops polling and waits for a batch in flight. */
  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearTimeout(this.timer);
    await this.running;
  }

  /** Sends every due message once; returns how many were sent. */
  async runOnce(): Promise<number> {
    const { db, transport, from, logger } = this.options;
    // Five minutes is far beyond one SMTP exchange with the timeouts of mail-transport.ts.
    const leaseMs = 5 * 60_000;
    const claimed = await claimDueMessages(db, this.batchSize, leaseMs);
    let sent = 0;
    for (const message of claimed) {
      try {
        await transport.sendMail({
          from,
          to: message.toAddress,
          subject: message.subject,
          text: message.textBody,
          html: message.htmlBody ?? undefined,
          messageId: `<${message.id}@couplet.outbox>`,
        });
        await markSent(db, message.id);
        sent += 1;
      } catch (err) {
        const text = err instanceof Error ? err.message : String(err);
        const giveUp = message.attempts >= this.maxAttempts;
        const delay = Math.min(
          this.maxBackoffMs,
          this.baseBackoffMs * 2 ** Math.max(0, message.attempts - 1),
        );
        await markAttemptFailed(db, message.id, text, giveUp ? null : new Date(Date.now() + delay));
        logger.warn({ outboxId: message.id, attempts: message.attempts, err: text }, 'mail failed');
      }
    }
    return sent;
  }

  private schedule(delayMs: number): void {
    if (this.stopped) return;
    this.timer = setTimeout(() => {
      this.running = this.runOnce().catch((err: unknown) => {
        this.options.logger.error({ err }, 'outbox sender pass failed');
        return 0;
      });
      void this.running.finally(() => this.schedule(this.pollMs));
    }, delayMs);
    this.timer.unref();
  }
}
