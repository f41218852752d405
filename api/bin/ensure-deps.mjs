// Installs npm dependencies when they are missing or stale. Plain Node: it runs as the pre-script
// of `npm start` and `npm test`, before any package is there.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const lockFile = path.join(root, 'package-lock.json');
const stamp = path.join(root, 'node_modules', '.couplet-lock-hash');

const lockHash = fs.existsSync(lockFile)
  ? createHash('sha256').update(fs.readFileSync(lockFile)).digest('hex')
  : 'no-lock';
const installed = fs.existsSync(stamp) ? fs.readFileSync(stamp, 'utf8').trim() : '';

if (installed !== lockHash) {
  const args = fs.existsSync(lockFile) ? ['ci', '--no-audit', '--no-fund'] : ['install'];
  process.stderr.write(`[setup] installing dependencies (npm ${args[0]})…\n`);
  const result = spawnSync('npm', args, { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) {
    process.stderr.write('[setup] npm could not install the dependencies (see above)\n');
    process.exit(result.status ?? 1);
  }
  fs.writeFileSync(stamp, `${lockHash}\n`);
}
