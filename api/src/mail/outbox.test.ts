import net from 'node:net';
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outboxMessages } from '../../../schema/src/index';
import { createTestApp, uniqueEmail, type TestApp } from '../testing/test-app';
import { CapturedMailStore, startFakeSmtpServer, type FakeSmtpServer } from './fake-smtp-server';
import { createMailTransport } from './mail-transport';
import { insertOutboxMessage } from './outbox-repository';
import { OutboxSender } from './outbox-sender';

const silent = pino({ level: 'silent' });
let t: TestApp;
let smtp: FakeSmtpServer;
const store = new CapturedMailStore();

beforeAll(async () => {
  smtp = await startFakeSmtpServer('127.0.0.1', 0, store);
  t = await createTestApp({}, store);
});
afterAll(async () => {
  await smtp.close();
  await t.close();
});

/** A port nothing listens on: bind one, note it, close it. */
async function closedPort(): Promise<number> {
  const server = net.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const port = (server.address() as net.AddressInfo).port;
  await new Promise<void>((resolve) => server.close(() => resolve()));
  return port;
}

function sender(port: number) {
  return new OutboxSender({
    db: t.database.db,
    transport: createMailTransport({ host: '127.0.0.1', port, secure: false, ignoreTls: true }),
    from: 'Couplet <no-reply@couplet.example>',
    logger: silent,
    baseBackoffMs: 0,
    // Other test files queue mail in the same database at the same time; a batch far larger than
    // they ever queue makes sure this test's own message is among the claimed ones.
    batchSize: 10_000,
  });
}

async function row(key: string) {
  const rows = await t.database.db
    .select()
    .from(outboxMessages)
    .where(eq(outboxMessages.idempotencyKey, key));
  return rows;
}

const received = (to: string) => store.newestFirst().filter((m) => m.to.includes(to));

describe('outbox', () => {
  it('keeps mail queued through an SMTP outage and sends it exactly once afterwards', async () => {
    const to = uniqueEmail('outage');
    const key = `test:${randomUUID()}`;
    const message = { idempotencyKey: key, toAddress: to, subject: 'Bench day', textBody: 'Hi' };
    await insertOutboxMessage(t.database.db, message);
    await insertOutboxMessage(t.database.db, message);
    expect(await row(key)).toHaveLength(1);

    const down = sender(await closedPort());
    await down.runOnce();
    const [queued] = await row(key);
    expect(queued).toMatchObject({ status: 'pending', attempts: 1, sentAt: null });
    expect(queued!.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(received(to)).toHaveLength(0);

    const up = sender(smtp.port);
    await up.runOnce();
    await up.runOnce();
    const [sent] = await row(key);
    expect(sent).toMatchObject({ status: 'sent', attempts: 2 });
    expect(sent!.sentAt).not.toBeNull();
    expect(received(to)).toHaveLength(1);
    expect(received(to)[0]).toMatchObject({ subject: 'Bench day' });
  });

  it('lets two senders share the table without sending a message twice', async () => {
    const recipients = Array.from({ length: 6 }, (_, i) => uniqueEmail(`shared${i}`));
    for (const to of recipients) {
      await insertOutboxMessage(t.database.db, {
        idempotencyKey: `test:${randomUUID()}`,
        toAddress: to,
        subject: 'Shared',
        textBody: 'Once only',
      });
    }
    await Promise.all([sender(smtp.port).runOnce(), sender(smtp.port).runOnce()]);
    for (const to of recipients) expect(received(to), to).toHaveLength(1);
  });

  it('delivers a real invitation mail whose link appears in the dev mail page', async () => {
    const signUp = await request(t.app)
      .post('/api/v1/auth/sign-up')
      .send({
        email: uniqueEmail('dev-owner'),
        password: 'correct horse battery',
        displayName: 'Zoë Ünal',
      });
    const token = signUp.body.accessToken as string;
    const ws = await request(t.app)
      .post('/api/v1/workspaces')
      .set('Authorization', `Bearer ${token}`)
      .send({ name: 'Kühl lab “cradle” tests' });
    const to = uniqueEmail('dev-invitee');
    await request(t.app)
      .post(`/api/v1/workspaces/${ws.body.id}/invitations`)
      .set('Authorization', `Bearer ${token}`)
      .send({ email: to, role: 'viewer' });
    await sender(smtp.port).runOnce();

    const res = await request(t.app).get('/api/v1/dev/mail');
    expect(res.status).toBe(200);
    const mail = (
      res.body.items as Array<{ to: string; subject: string; text: string; html: string }>
    ).find((m) => m.to.includes(to));
    expect(mail?.subject).toBe('Join "Kühl lab “cradle” tests" on Couplet');
    expect(mail?.text).toMatch(/Zoë Ünal invites you/);
    expect(mail?.text).toMatch(/http:\/\/couplet\.test\/invitations\/[A-Za-z0-9_-]{43}/);
    expect(mail?.html).toContain('href="http://couplet.test/invitations/');
  });

  it('does not serve the dev mail page in production', async () => {
    const prod = await createTestApp({ nodeEnv: 'production' }, store);
    try {
      const res = await request(prod.app).get('/api/v1/dev/mail');
      expect(res.status).toBe(404);
    } finally {
      await prod.close();
    }
  });
});
