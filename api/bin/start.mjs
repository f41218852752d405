// `npm start`: PostgreSQL on loopback, the web app built, the server bundled and started with the
// demo workspace loaded. Ctrl-C stops the server and then the cluster; the cluster's data stays in
// .couplet/ (git-ignored), so the next start reuses it.
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { repoRoot, startCluster, stopCluster } from '../dev/pg-cluster.mjs';
import { buildServer, buildWebIfStale } from './build-steps.mjs';

const port = Number(process.env.COUPLET_PORT ?? 4300);
const pgPort = Number(process.env.COUPLET_PG_PORT ?? 54329);
const smtpPort = Number(process.env.COUPLET_SMTP_PORT ?? 2526);
const clusterName = 'start';

function say(message) {
  process.stdout.write(`[couplet] ${message}\n`);
}

/** One random signing secret per checkout, kept beside the cluster so sessions survive restarts. */
function jwtSecret() {
  const file = path.join(repoRoot, '.couplet', 'jwt-secret');
  if (!fs.existsSync(file)) {
    // 64 random bytes for HS256: more than the hash's block size, so no key-length weakness.
    fs.writeFileSync(file, randomBytes(64).toString('hex'), { mode: 0o600 });
  }
  return fs.readFileSync(file, 'utf8').trim();
}

async function main() {
  const cluster = await startCluster({ name: clusterName, port: pgPort, database: 'couplet' });
  buildWebIfStale();
  const serverEntry = buildServer();

  const appUrl = `http://127.0.0.1:${port}`;
  const server = spawn(process.execPath, ['--enable-source-maps', serverEntry], {
    cwd: repoRoot,
    stdio: 'inherit',
    env: {
      ...process.env,
      NODE_ENV: 'development',
      HOST: '127.0.0.1',
      PORT: String(port),
      APP_URL: appUrl,
      DATABASE_URL: cluster.url,
      JWT_SECRET: jwtSecret(),
      MAIL_CAPTURE: '1',
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtpPort),
      MAIL_FROM: 'Couplet <no-reply@couplet.example>',
      WEB_DIST: path.join(repoRoot, 'dist', 'web', 'browser'),
      LOAD_DEMO: '1',
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'info',
    },
  });

  let stopping = false;
  const stop = (signal) => {
    if (stopping) return;
    stopping = true;
    say(`stopping (${signal})…`);
    if (server.exitCode === null) server.kill('SIGTERM');
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));

  server.on('exit', (code, signal) => {
    stopCluster(clusterName);
    say('server and PostgreSQL stopped; data kept in .couplet/');
    process.exit(stopping ? 0 : (code ?? (signal ? 1 : 0)));
  });
}

main().catch((error) => {
  process.stderr.write(`[couplet] npm start failed: ${error.message}\n`);
  stopCluster(clusterName);
  process.exit(1);
});
