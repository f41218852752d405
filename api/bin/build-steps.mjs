// Build steps shared by `npm start` and `npm test`: the Angular app (only when its sources are
// newer than the last build) and the server bundle (esbuild, a fraction of a second).
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { repoRoot } from '../dev/pg-cluster.mjs';

const bin = (name) => path.join(repoRoot, 'node_modules', '.bin', name);

function newestMtime(entries) {
  let newest = 0;
  const visit = (p) => {
    if (!fs.existsSync(p)) return;
    const stat = fs.statSync(p);
    if (stat.isDirectory()) {
      for (const child of fs.readdirSync(p)) visit(path.join(p, child));
    } else newest = Math.max(newest, stat.mtimeMs);
  };
  entries.forEach((entry) => visit(path.join(repoRoot, entry)));
  return newest;
}

/** Runs `ng build` (production) unless dist/web is newer than everything it is built from. */
export function buildWebIfStale({ force = false } = {}) {
  const index = path.join(repoRoot, 'dist', 'web', 'browser', 'index.html');
  const sources = ['web', 'angular.json', 'physics/src', 'api/src', 'package-lock.json'];
  if (!force && fs.existsSync(index) && fs.statSync(index).mtimeMs > newestMtime(sources)) {
    return false;
  }
  process.stdout.write(
    '[couplet] building the web app (ng build; about a minute the first time)…\n',
  );
  const result = spawnSync(bin('ng'), ['build', '--configuration', 'production'], {
    cwd: repoRoot,
    stdio: 'inherit',
    env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
  });
  if (result.status !== 0) throw new Error('ng build failed (see above)');
  return true;
}

/**
 * Bundles api/src/main.ts into dist/api/main.mjs, with two more entries beside it: worker.mjs (a
 * sweep worker on its own) and sweep-worker.mjs (the sweep threads, which the server finds next
 * to itself through import.meta.url). Packages stay external (node_modules).
 */
export function buildServer() {
  const outdir = path.join(repoRoot, 'dist', 'api');
  const result = spawnSync(
    bin('esbuild'),
    [
      'main=api/src/main.ts',
      'worker=api/src/jobs/worker-main.ts',
      'sweep-worker=api/src/jobs/sweep-thread.ts',
      '--bundle',
      '--platform=node',
      '--format=esm',
      '--target=node20',
      '--packages=external',
      '--sourcemap',
      `--outdir=${outdir}`,
      '--out-extension:.js=.mjs',
      '--log-level=warning',
    ],
    { cwd: repoRoot, stdio: 'inherit' },
  );
  if (result.status !== 0) throw new Error('bundling the server failed (see above)');
  return path.join(outdir, 'main.mjs');
}
