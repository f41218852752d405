import { z } from 'zod';
import { ConfigError } from '../config/config';

// The environment of a worker-only process (dist/api/worker.mjs): it needs the database and its
// thread count, not the web server's secrets.

const workerEnvironment = z.object({
  DATABASE_URL: z.url().refine((u) => /^postgres(ql)?:\/\//.test(u), 'must be a postgres:// URL'),
  // One thread per core suits a machine that only computes; the default leaves room for others.
  SWEEP_WORKERS: z.coerce.number().int().min(1).max(64).default(1),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
});

export interface WorkerConfig {
  databaseUrl: string;
  threads: number;
  logLevel: string;
}

export function parseWorkerConfig(env: NodeJS.ProcessEnv): WorkerConfig {
  const parsed = workerEnvironment.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new ConfigError(`Invalid environment:\n${lines.join('\n')}`);
  }
  return {
    databaseUrl: parsed.data.DATABASE_URL,
    threads: parsed.data.SWEEP_WORKERS,
    logLevel: parsed.data.LOG_LEVEL,
  };
}
