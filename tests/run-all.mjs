// `npm test`: every suite against a throwaway PostgreSQL and Debian's Chromium, ending with one
// line `tests: N passed, N failed`. Plain Node, so it can install what the tests need first.
//
// Suites: lint (ESLint + Prettier), vitest (physics, API, integration), Angular component tests
// (ng test), the production web build, and the browser end-to-end tests (vitest + playwright-core).
import { execFileSync, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { destroyCluster, repoRoot, startCluster } from '../api/dev/pg-cluster.mjs';
import { buildServer, buildWebIfStale } from '../api/bin/build-steps.mjs';

const bin = (name) => path.join(repoRoot, 'node_modules', '.bin', name);
const reportDir = path.join(repoRoot, '.couplet', 'test-reports');
const clusterPort = Number(process.env.COUPLET_TEST_PG_PORT ?? 54339);
// Named after the port (as tests/support/global-setup.ts does), so runs on two ports never share
// a data folder.
const clusterName = clusterPort === 54339 ? 'test' : `test-${clusterPort}`;
const only = process.argv.slice(2); // e.g. `npm test -- vitest e2e`
const wanted = (suite) => only.length === 0 || only.includes(suite);
const results = [];

function say(message) {
  process.stdout.write(`\n[tests] ${message}\n`);
}

/** Chromium from Debian for the browser tests; never a browser download by a test tool. */
function ensureChromium() {
  if (fs.existsSync('/usr/bin/chromium')) return;
  if (process.getuid?.() !== 0) {
    throw new Error('Chromium is missing: install it with sudo apt-get install -y chromium');
  }
  say("installing Debian's chromium package (apt-get)…");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-q'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', '-q', 'chromium'], { stdio: 'inherit', env });
}

function runStep(name, command, args, env) {
  say(`${name}: ${path.basename(command)} ${args.join(' ')}`);
  const started = Date.now();
  const result = spawnSync(command, args, { cwd: repoRoot, stdio: 'inherit', env });
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  say(`${name}: exit ${result.status ?? result.signal} after ${seconds} s`);
  return result.status === 0;
}

/** A step that is one check (lint, build): counts as one passed or one failed. */
function checkStep(name, command, args, env) {
  const ok = runStep(name, command, args, env);
  results.push({ name, passed: ok ? 1 : 0, failed: ok ? 0 : 1 });
}

/** A vitest-based suite: counts its tests from the JSON report. */
function vitestStep(name, command, args, env, reportFile) {
  fs.rmSync(reportFile, { force: true });
  const ok = runStep(name, command, args, env);
  let passed = 0;
  let failed = 0;
  if (fs.existsSync(reportFile)) {
    const report = JSON.parse(fs.readFileSync(reportFile, 'utf8'));
    passed = report.numPassedTests ?? 0;
    failed = (report.numFailedTests ?? 0) + (report.numRuntimeErrorTestSuites ?? 0);
    // Files that failed to load count as failures too.
    for (const file of report.testResults ?? []) {
      if (file.status === 'failed' && (file.assertionResults ?? []).length === 0) failed += 1;
    }
  }
  if (!ok && failed === 0) failed = 1; // the runner failed without a test to blame
  results.push({ name, passed, failed });
}

async function main() {
  fs.mkdirSync(reportDir, { recursive: true });
  if (wanted('e2e')) ensureChromium();

  destroyCluster(clusterName); // a throwaway cluster: every run starts from nothing
  const cluster = await startCluster({
    name: clusterName,
    port: clusterPort,
    portVariable: 'COUPLET_TEST_PG_PORT',
    database: 'couplet_test',
    throwaway: true,
  });
  const env = {
    ...process.env,
    NODE_ENV: 'test',
    DATABASE_URL: cluster.url,
    // A fresh signing key per run: tests never depend on a known secret.
    JWT_SECRET: randomBytes(64).toString('hex'),
    NG_CLI_ANALYTICS: 'false',
    FORCE_COLOR: '0',
  };

  try {
    if (wanted('lint')) checkStep('lint', 'npm', ['run', '--silent', 'lint'], env);

    if (wanted('vitest')) {
      const report = path.join(reportDir, 'vitest.json');
      vitestStep(
        'vitest',
        bin('vitest'),
        ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`],
        env,
        report,
      );
    }

    if (wanted('web')) {
      const report = path.join(reportDir, 'ng-test.json');
      vitestStep(
        'web',
        bin('ng'),
        [
          'test',
          '--watch=false',
          '--reporters=json',
          '--reporters=default',
          `--output-file=${report}`,
        ],
        env,
        report,
      );
    }

    if (wanted('e2e') || wanted('build')) {
      let built = true;
      try {
        buildWebIfStale();
        buildServer();
      } catch (error) {
        say(`build: ${error.message}`);
        built = false;
      }
      results.push({ name: 'build', passed: built ? 1 : 0, failed: built ? 0 : 1 });
      if (built && wanted('e2e')) {
        const report = path.join(reportDir, 'e2e.json');
        vitestStep(
          'e2e',
          bin('vitest'),
          [
            'run',
            '--config',
            'tests/e2e/vitest.e2e.config.ts',
            '--reporter=default',
            '--reporter=json',
            `--outputFile.json=${report}`,
          ],
          env,
          report,
        );
      }
    }
  } finally {
    destroyCluster(clusterName);
  }

  say('summary');
  for (const r of results)
    process.stdout.write(`  ${r.name}: ${r.passed} passed, ${r.failed} failed\n`);
  const passed = results.reduce((sum, r) => sum + r.passed, 0);
  const failed = results.reduce((sum, r) => sum + r.failed, 0);
  process.stdout.write(`tests: ${passed} passed, ${failed} failed\n`);
  process.exit(failed === 0 && results.length > 0 ? 0 : 1);
}

main().catch((error) => {
  process.stderr.write(`[tests] could not run the tests: ${error.message}\n`);
  try {
    destroyCluster(clusterName);
  } catch {
    // The cluster may never have started; nothing to clean.
  }
  process.stdout.write('tests: 0 passed, 1 failed\n');
  process.exit(1);
});
