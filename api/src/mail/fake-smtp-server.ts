import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { parseMimeMessage } from './mime-message';

export interface CapturedMail {
  id: string;
  to: string;
  subject: string;
  text: string;
  html: string | null;
  messageId: string;
  receivedAt: Date;
}

/** Where captured mail is kept: in memory, newest last, bounded. */
export class CapturedMailStore {
  private readonly items: CapturedMail[] = [];
  // 500 messages is days of development mail and bounds the memory a runaway loop can take.
  constructor(private readonly capacity = 500) {}

  add(mail: CapturedMail): void {
    this.items.push(mail);
    if (this.items.length > this.capacity) this.items.shift();
  }

  newestFirst(): CapturedMail[] {
    return [...this.items].reverse();
  }
}

export interface FakeSmtpServer {
  store: CapturedMailStore;
  port: number;
  close(): Promise<void>;
}

// 10 MB is far above any mail Couplet writes and stops a stray client from filling memory.
const maxMessageBytes = 10 * 1024 * 1024;

/**
 * A local SMTP server for development and tests that accepts every message and keeps it, so a
 * developer can open invitation and reset links without a real mail account. Port 0 picks a
 * free port (see `port`).
 */
export async function startFakeSmtpServer(
  host: string,
  port: number,
  store = new CapturedMailStore(),
): Promise<FakeSmtpServer> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: maxMessageBytes,
    logger: false,
    onAuth(_auth, _session, callback) {
      callback(null, { user: 'capture' });
    },
    onData(stream, session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('end', () => {
        const parsed = parseMimeMessage(Buffer.concat(chunks).toString('utf8'));
        const envelopeTo = session.envelope.rcptTo.map((r) => r.address).join(', ');
        store.add({
          id: randomUUID(),
          to: parsed.to || envelopeTo,
          subject: parsed.subject,
          text: parsed.text,
          html: parsed.html,
          messageId: parsed.messageId,
          receivedAt: new Date(),
        });
        callback();
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  const address = server.server.address() as AddressInfo;
  return {
    store,
    port: address.port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
