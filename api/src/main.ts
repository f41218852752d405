import type { AddressInfo } from 'node:net';
import pino from 'pino';
import { loadDemo } from '../../demo-data/load-demo';
import { createApp } from './app';
import { ConfigError, parseConfig } from './config/config';
import { createDatabase } from './db/database';
import { migrate } from './db/migrate';
import { SweepWorker } from './jobs/sweep-worker';
import { startFakeSmtpServer, type FakeSmtpServer } from './mail/fake-smtp-server';
import { createMailTransport } from './mail/mail-transport';
import { OutboxSender } from './mail/outbox-sender';
import { SweepsRuntime } from './sweeps/sweeps-runtime';

async function main(): Promise<void> {
  const config = parseConfig(process.env);
  const logger = pino({ level: config.logLevel });

  await migrate(config.databaseUrl);
  const database = createDatabase(config.databaseUrl, 10, (err) =>
    logger.warn({ err: err.message }, 'idle PostgreSQL connection lost'),
  );

  if (config.loadDemo) {
    const signIns = await loadDemo(database.db);
    console.log('Demo workspace ready. Sign in as:');
    for (const s of signIns) {
      const note = s.passwordChanged ? ' (password changed since the demo was loaded)' : '';
      console.log(`  ${s.role.padEnd(8)} ${s.email.padEnd(34)} ${s.password}${note}`);
    }
  }

  let smtpFake: FakeSmtpServer | undefined;
  if (config.mailCapture) {
    smtpFake = await startFakeSmtpServer(config.smtp.host, config.smtp.port);
    console.log(`Mail capture: SMTP on ${config.smtp.host}:${smtpFake.port}`);
  }
  const transport = createMailTransport({
    ...config.smtp,
    port: smtpFake?.port ?? config.smtp.port,
    ignoreTls: config.mailCapture,
  });
  const sender = new OutboxSender({ db: database.db, transport, from: config.mailFrom, logger });
  sender.start();

  // The queue's schema is created here even without a worker, so runs are sent as jobs at once.
  const sweeps = new SweepsRuntime({
    databaseUrl: config.databaseUrl,
    logger,
    supervise: config.sweeps.runWorker,
  });
  await sweeps.start();
  const sweepWorker = config.sweeps.runWorker
    ? await SweepWorker.start({
        databaseUrl: config.databaseUrl,
        queue: sweeps.queue,
        threads: config.sweeps.workers,
        logger,
      })
    : undefined;
  if (sweepWorker) sweeps.onQueued = () => sweepWorker.wake();
  console.log(
    sweepWorker
      ? `Sweep worker: ${config.sweeps.workers} thread(s) in this process`
      : 'Sweep worker: off here (RUN_SWEEP_WORKER=0); run dist/api/worker.mjs elsewhere',
  );

  const { app } = createApp({
    config,
    db: database.db,
    logger,
    capturedMail: smtpFake?.store,
    sweeps,
  });
  const server = app.listen(config.port, config.host);
  await new Promise<void>((resolve, reject) => {
    server.once('listening', resolve);
    server.once('error', reject);
  });
  const port = (server.address() as AddressInfo).port;
  const shownHost = config.host === '0.0.0.0' ? 'localhost' : config.host;
  console.log(`Couplet is running at http://${shownHost}:${port}/ (API docs: /api/docs)`);

  let stopping = false;
  const shutdown = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down');
    // Open event streams would hold server.close() until their clients leave: end them first.
    await sweeps.events.close();
    // Idle keep-alive sockets would hold server.close() open until they time out.
    server.closeIdleConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await sender.stop();
    // Running sweeps are handed back to the queue, to be computed again after the restart.
    await sweepWorker?.stop();
    await sweeps.close();
    transport.close();
    await smtpFake?.close();
    await database.close();
    console.log('Couplet stopped.');
    process.exit(0);
  };
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}

function isAddressInUse(err: unknown): err is NodeJS.ErrnoException & { port: number } {
  return (err as NodeJS.ErrnoException | undefined)?.code === 'EADDRINUSE';
}

main().catch((err: unknown) => {
  if (err instanceof ConfigError) console.error(err.message);
  else if (isAddressInUse(err)) {
    console.error(
      `Couplet failed to start: port ${err.port} is taken by another program; stop it or ` +
        'choose another port (PORT, or COUPLET_PORT for npm start).',
    );
  } else console.error('Couplet failed to start:', err);
  process.exit(1);
});
