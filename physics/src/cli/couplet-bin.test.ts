import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const bin = fileURLToPath(new URL('../../bin/couplet.mjs', import.meta.url));
const example = fileURLToPath(new URL('./examples/earbud-case-pairs.json', import.meta.url));

/** The real command as a user runs it: `node physics/bin/couplet.mjs …` (no build step). */
function couplet(args: string[], input?: string) {
  return spawnSync(process.execPath, [bin, ...args], { input, encoding: 'utf8', timeout: 20_000 });
}

describe('physics/bin/couplet.mjs', () => {
  it('runs the example and exits 0', () => {
    const r = couplet(['mutual', example]);
    expect(r.status, r.stderr).toBe(0);
    expect(JSON.parse(r.stdout)).toHaveLength(2);
  });

  it('exits 2 with one line and no stack trace on bad input', () => {
    const ring = { kind: 'ring', radius: 0.02, wireRadius: 0.001 };
    const pair = { tx: { ...ring, radius: -1 }, rx: ring, pose: { z: 0.01 } };
    const r = couplet(['mutual', '-'], JSON.stringify(pair));
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toMatch(/^couplet: pair\.tx\.radius: .+\n$/);
    expect(r.stderr).not.toMatch(/\n\s+at /);
  });
});
