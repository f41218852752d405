// Starts the bundled server for the browser tests and stops it afterwards. Expects `npm test` to
// have built dist/web and dist/api and to pass DATABASE_URL and JWT_SECRET.
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { repoRoot, startCluster } from '../../../api/dev/pg-cluster.mjs';
import { testCluster } from '../../support/global-setup';

export const e2ePort = Number(process.env.COUPLET_E2E_PORT ?? 4310);
const smtpPort = Number(process.env.COUPLET_E2E_SMTP_PORT ?? 2536);

let server: ChildProcess | undefined;

async function waitForHealth(url: string, child: ChildProcess): Promise<void> {
  const deadline = Date.now() + 30_000; // the bundled server starts in ~2 s; migrations add little
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited early with ${child.exitCode}`);
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  throw new Error(`server did not answer ${url} within 30 s`);
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  // `npm test` passes DATABASE_URL; run directly, the browser tests start (and stop) their own.
  const ownCluster = process.env.DATABASE_URL
    ? undefined
    : await startCluster({ ...testCluster, database: 'couplet_test', throwaway: true });
  const databaseUrl = process.env.DATABASE_URL ?? ownCluster!.url;
  const baseUrl = `http://127.0.0.1:${e2ePort}`;
  server = spawn(
    process.execPath,
    ['--enable-source-maps', path.join(repoRoot, 'dist/api/main.mjs')],
    {
      cwd: repoRoot,
      stdio: ['ignore', 'inherit', 'inherit'],
      env: {
        ...process.env,
        NODE_ENV: 'test',
        HOST: '127.0.0.1',
        PORT: String(e2ePort),
        APP_URL: baseUrl,
        DATABASE_URL: databaseUrl,
        JWT_SECRET: process.env.JWT_SECRET ?? 'e2e'.repeat(43),
        MAIL_CAPTURE: '1',
        SMTP_HOST: '127.0.0.1',
        SMTP_PORT: String(smtpPort),
        MAIL_FROM: 'Couplet <no-reply@couplet.example>',
        WEB_DIST: path.join(repoRoot, 'dist/web/browser'),
        LOG_LEVEL: 'warn',
      },
    },
  );
  await waitForHealth(`${baseUrl}/api/v1/health`, server);
  project.provide('baseUrl', baseUrl);
  return async () => {
    if (server && server.exitCode === null) {
      const exited = new Promise((resolve) => server!.once('exit', resolve));
      server.kill('SIGTERM');
      await exited;
    }
    ownCluster?.stop();
  };
}

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}
