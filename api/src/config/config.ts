import { z } from 'zod';

// The environment, parsed once at start-up. A bad value stops the process before it listens.

const flag = z
  .enum(['1', '0', 'true', 'false', 'yes', 'no', ''])
  .default('')
  .transform((v) => v === '1' || v === 'true' || v === 'yes');

const environmentSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number().int().min(0).max(65535).default(4300),
  HOST: z.string().min(1).default('127.0.0.1'),
  APP_URL: z.url().optional(),
  DATABASE_URL: z.url().refine((u) => /^postgres(ql)?:\/\//.test(u), 'must be a postgres:// URL'),
  // 64 hex characters = 256 bits, the HMAC-SHA-256 key size; a shorter key weakens HS256.
  JWT_SECRET: z.string().regex(/^[0-9a-fA-F]{64,}$/, 'must be at least 64 hexadecimal characters'),
  SMTP_HOST: z.string().min(1).default('127.0.0.1'),
  SMTP_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
  SMTP_SECURE: flag,
  SMTP_USER: z.string().optional(),
  SMTP_PASS: z.string().optional(),
  MAIL_FROM: z.string().min(3).default('Couplet <no-reply@couplet.example>'),
  MAIL_CAPTURE: flag,
  WEB_DIST: z.string().min(1).optional(),
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
  LOAD_DEMO: flag,
  // Sweep threads of this process. One by default: on a two-core machine the other core serves
  // the web requests and PostgreSQL; raise it (or run more workers elsewhere) on bigger hosts.
  SWEEP_WORKERS: z.coerce.number().int().min(1).max(64).default(1),
  // 0 runs the web server without a sweep worker (workers then run elsewhere: dist/api/worker.mjs).
  RUN_SWEEP_WORKER: flag.default(true),
});

export interface RateLimitConfig {
  windowMs: number;
  limit: number;
}

export interface AppConfig {
  nodeEnv: 'development' | 'test' | 'production';
  port: number;
  host: string;
  appUrl: string;
  databaseUrl: string;
  jwtSecretHex: string;
  smtp: { host: string; port: number; secure: boolean; user?: string; pass?: string };
  mailFrom: string;
  mailCapture: boolean;
  webDist?: string;
  logLevel: string;
  loadDemo: boolean;
  /** Sweep compute in this process: whether a worker runs here, and its threads. */
  sweeps: { runWorker: boolean; workers: number };
  rateLimits: { signIn: RateLimitConfig; forgotPassword: RateLimitConfig };
}

/** Thrown when the environment is unusable; main prints it and exits non-zero. */
export class ConfigError extends Error {}

export function parseConfig(env: NodeJS.ProcessEnv): AppConfig {
  const parsed = environmentSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new ConfigError(`Invalid environment:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  if (e.NODE_ENV === 'production' && e.MAIL_CAPTURE) {
    throw new ConfigError('Invalid environment:\n  MAIL_CAPTURE: must be off in production');
  }
  if (e.NODE_ENV === 'production' && !e.APP_URL) {
    throw new ConfigError('Invalid environment:\n  APP_URL: is required in production');
  }
  return {
    nodeEnv: e.NODE_ENV,
    port: e.PORT,
    host: e.HOST,
    appUrl: (e.APP_URL ?? `http://${e.HOST}:${e.PORT}`).replace(/\/+$/, ''),
    databaseUrl: e.DATABASE_URL,
    jwtSecretHex: e.JWT_SECRET,
    smtp: {
      host: e.SMTP_HOST,
      port: e.SMTP_PORT,
      secure: e.SMTP_SECURE,
      user: e.SMTP_USER || undefined,
      pass: e.SMTP_PASS || undefined,
    },
    mailFrom: e.MAIL_FROM,
    mailCapture: e.MAIL_CAPTURE,
    webDist: e.WEB_DIST,
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === 'test' ? 'silent' : 'info'),
    loadDemo: e.LOAD_DEMO,
    sweeps: { runWorker: e.RUN_SWEEP_WORKER, workers: e.SWEEP_WORKERS },
    rateLimits: {
      // Ten tries per quarter hour per address and e-mail slows guessing to ~1000 a day while a
      // person who mistypes a few times never notices (OWASP authentication cheat sheet spirit).
      signIn: { windowMs: 15 * 60_000, limit: 10 },
      // Five reset mails per quarter hour per address stops mail-bombing a victim's inbox.
      forgotPassword: { windowMs: 15 * 60_000, limit: 5 },
    },
  };
}
