import pino from 'pino';
import { ConfigError } from '../config/config';
import { migrate } from '../db/migrate';
import { parseWorkerConfig } from './worker-config';
import { SweepQueue } from './sweep-queue';
import { SweepWorker } from './sweep-worker';

// A sweep worker on its own: `DATABASE_URL=… SWEEP_WORKERS=4 node dist/api/worker.mjs` on any
// machine that reaches the database. It takes jobs from the same queue as the web server's own
// worker; progress reaches the browsers through PostgreSQL NOTIFY.

async function main(): Promise<void> {
  const config = parseWorkerConfig(process.env);
  const logger = pino({ level: config.logLevel });
  await migrate(config.databaseUrl);
  const queue = new SweepQueue(config.databaseUrl, { supervise: true, logger });
  await queue.start();
  const worker = await SweepWorker.start({
    databaseUrl: config.databaseUrl,
    queue,
    threads: config.threads,
    logger,
  });
  console.log(`Couplet sweep worker running with ${config.threads} thread(s)`);

  let stopping = false;
  const shutdown = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'sweep worker shutting down');
    // Running sweeps go back to the queue for another worker (or this one after a restart).
    await worker.stop();
    await queue.stop();
    console.log('Couplet sweep worker stopped.');
    process.exit(0);
  };
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  if (err instanceof ConfigError) console.error(err.message);
  else console.error('Couplet sweep worker failed to start:', err);
  process.exit(1);
});
