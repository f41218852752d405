import { readFile } from 'node:fs/promises';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { parseCoil } from '../coils/parse-coil';
import { preparePair } from '../inductance/prepare-pair';
import { coilFigures } from '../link/coil-figures';
import { expectNear } from '../testing/expect-near';
import { parseCliArgs } from './parse-cli-args';
import { runCli, type CliIo } from './run-cli';

const example = (name: string) => fileURLToPath(new URL(`./examples/${name}`, import.meta.url));

/** An in-memory outside world: files by name, captured output. */
function fakeIo(files: Record<string, string> = {}, stdin = '') {
  const out: string[] = [];
  const err: string[] = [];
  const written: Record<string, string> = {};
  const io: CliIo = {
    readFile: async (path) => {
      if (path in files) return files[path];
      return readFile(path, 'utf8');
    },
    readStdin: async () => stdin,
    writeFile: async (path, text) => void (written[path] = text),
    stdout: (t) => void out.push(t),
    stderr: (t) => void err.push(t),
    stderrIsTTY: false,
  };
  return { io, out: () => out.join(''), err: () => err.join(''), written };
}

async function run(argv: string[], files: Record<string, string> = {}, stdin = '') {
  const f = fakeIo(files, stdin);
  const code = await runCli(argv, f.io);
  return { code, out: f.out(), err: f.err(), written: f.written };
}

const ring = { kind: 'ring', radius: 0.02, wireRadius: 5e-4 };

describe('parseCliArgs', () => {
  it('reads command, file and options', () => {
    expect(parseCliArgs(['sweep', 'a.json', '--out', 'm.csv', '--format=json'])).toEqual({
      kind: 'run',
      command: 'sweep',
      file: 'a.json',
      out: 'm.csv',
      format: 'json',
    });
    expect(parseCliArgs(['mutual', '-'])).toMatchObject({ file: '-', format: 'csv' });
    expect(parseCliArgs([])).toEqual({ kind: 'help' });
    expect(parseCliArgs(['sweep', '--help'])).toEqual({ kind: 'help' });
  });

  it('names what is wrong', () => {
    expect(() => parseCliArgs(['couple', 'a'])).toThrow(/unknown command 'couple'/);
    expect(() => parseCliArgs(['mutual'])).toThrow(/mutual: needs a FILE/);
    expect(() => parseCliArgs(['mutual', 'a', 'b'])).toThrow(/takes one FILE/);
    expect(() => parseCliArgs(['sweep', 'a', '--format', 'xml'])).toThrow(
      /--format: must be csv or json/,
    );
    expect(() => parseCliArgs(['mutual', 'a', '--format', 'json'])).toThrow(/only the sweep/);
    expect(() => parseCliArgs(['sweep', 'a', '--out'])).toThrow(/--out: needs a value/);
    expect(() => parseCliArgs(['sweep', 'a', '-v'])).toThrow(/unknown option '-v'/);
  });
});

describe('couplet mutual', () => {
  it('prints {M, L1, L2, k} per pair of the example file, in order and shape', async () => {
    const r = await run(['mutual', example('earbud-case-pairs.json')]);
    expect(r.code, r.err).toBe(0);
    const out = JSON.parse(r.out);
    expect(out).toHaveLength(2);
    const input = JSON.parse(await readFile(example('earbud-case-pairs.json'), 'utf8'));
    input.forEach((p: { tx: unknown; rx: unknown; pose: object }, i: number) => {
      expect(Object.keys(out[i])).toEqual(['M', 'L1', 'L2', 'k']);
      const pair = preparePair(parseCoil(p.tx), parseCoil(p.rx));
      expect(out[i].M).toBe(pair.mutual(p.pose));
      expect(out[i].L1).toBe(pair.L1);
      expect(out[i].L2).toBe(pair.L2At(p.pose));
      // k = M / sqrt(L1 L2): a few roundings.
      expectNear(out[i].k, out[i].M / Math.sqrt(out[i].L1 * out[i].L2), 1e-15, `k[${i}]`);
    });
  });

  it('answers one object for one pair, from stdin', async () => {
    const pair = JSON.stringify({ tx: ring, rx: ring, pose: { z: 0.003 } });
    const r = await run(['mutual', '-'], {}, pair);
    expect(r.code, r.err).toBe(0);
    const out = JSON.parse(r.out);
    expect(Array.isArray(out)).toBe(false);
    expect(out.k).toBeGreaterThan(0);
    expect(out.k).toBeLessThan(1);
  });

  it('exits 2 with one line naming the field', async () => {
    const bad = [
      { tx: ring, rx: ring, pose: { z: 0.003 } },
      {
        tx: ring,
        rx: {
          kind: 'circular-spiral',
          turns: -3,
          innerDiameter: 0.01,
          outerDiameter: 0.03,
          conductor: { type: 'round', diameter: 5e-4 },
        },
        pose: { z: 0.003 },
      },
    ];
    const r = await run(['mutual', 'in.json'], { 'in.json': JSON.stringify(bad) });
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^couplet: pairs\[1\]\.rx\.turns: -3 is out of range; allowed: > 0/);
    expect(r.err.trim().split('\n')).toHaveLength(1);
    expect(r.out).toBe('');
  });

  it.each([
    [{ tx: ring, rx: ring, pose: { z: 0 } }, /^couplet: pair\.pose: the coils intersect/],
    [{ tx: ring, rx: ring }, /^couplet: pair\.pose: required$/],
    [
      { tx: ring, rx: ring, pose: {}, freq: 1 },
      /^couplet: pair\.freq: unknown field; allowed fields: tx, rx, pose, frequency$/,
    ],
    [
      { tx: ring, rx: ring, pose: { z: 0.01 }, frequency: -5 },
      /^couplet: pair\.frequency: -5 is out of range/,
    ],
    [{ tx: ring, rx: ring, pose: { z: 'far' } }, /^couplet: pair\.pose\.z: /],
    [[], /^couplet: pairs: the array is empty$/],
  ])('refuses %j', async (input, message) => {
    const r = await run(['mutual', 'in.json'], { 'in.json': JSON.stringify(input) });
    expect(r.code).toBe(2);
    expect(r.err.trimEnd()).toMatch(message);
    expect(r.err).not.toMatch(/\n.+/); // one line
  });

  it('reports unreadable files and invalid JSON on one line', async () => {
    const missing = await run(['mutual', '/no/such/file.json']);
    expect(missing).toMatchObject({
      code: 2,
      err: 'couplet: /no/such/file.json: cannot read (no such file)\n',
    });
    const broken = await run(['mutual', 'in.json'], { 'in.json': '{"tx": ' });
    expect(broken.code).toBe(2);
    expect(broken.err).toMatch(/^couplet: in\.json: invalid JSON: /);
  });
});

describe('couplet inductance', () => {
  it('prints the coil figures of the example file, operating keys stripped', async () => {
    const r = await run(['inductance', example('earbud-case-coils.json')]);
    expect(r.code, r.err).toBe(0);
    const out = JSON.parse(r.out);
    const input = JSON.parse(await readFile(example('earbud-case-coils.json'), 'utf8'));
    expect(out).toHaveLength(input.length);
    input.forEach((item: Record<string, unknown>, i: number) => {
      const { frequency, current, temperature, ...coil } = item as {
        frequency: number;
        current: number;
        temperature?: number;
      };
      const f = coilFigures(parseCoil(coil), { frequency, current, temperature });
      expect(out[i]).toEqual({ ...f, frequency, current });
      expect(Object.keys(out[i]).slice(0, 4)).toEqual(['L', 'Rdc', 'Rac', 'Q']);
    });
  });

  it('gives nulls for frequency figures without a frequency, and names bad fields', async () => {
    const ok = await run(['inductance', 'c.json'], { 'c.json': JSON.stringify(ring) });
    expect(JSON.parse(ok.out)).toMatchObject({ Rac: null, Q: null, skinDepth: null, current: 1 });
    const bad = await run(['inductance', 'c.json'], {
      'c.json': JSON.stringify([ring, { ...ring, current: -2 }]),
    });
    expect(bad.code).toBe(2);
    expect(bad.err).toMatch(/^couplet: coils\[1\]\.current: -2 is out of range; allowed: ≥ 0/);
    const badCoil = await run(['inductance', 'c.json'], {
      'c.json': JSON.stringify({ ...ring, radius: 0 }),
    });
    expect(badCoil.err).toMatch(/^couplet: coil\.radius: /);
  });
});

describe('couplet sweep', () => {
  it('writes the CSV map in grid order with the contract header', async () => {
    const r = await run(['sweep', example('earbud-case-sweep.json'), '--out', 'map.csv']);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toBe('');
    const lines = r.written['map.csv'].trimEnd().split('\n');
    expect(lines[0]).toBe('x_m,y_m,z_m,tiltX_deg,tiltY_deg,M_H,k');
    expect(lines).toHaveLength(1 + 5 * 3 * 2);
    expect(lines[1].split(',').slice(0, 5)).toEqual(['-0.01', '-0.01', '0.003', '0', '0']);
    expect(lines[2].split(',')[0]).toBe('-0.005');
    const rows = lines.slice(1).map((l) => l.split(',').map(Number));
    // Symmetry of two coaxial circular coils: M(x, y) = M(−x, −y) = M(y, x) exactly (same ρ²).
    expect(rows[0][5]).toBe(rows[14][5]);
    // The aligned pose couples best at each gap, and the larger gap couples less.
    const centre3 = rows[7];
    const centre5 = rows[22];
    expect(centre3.slice(0, 3)).toEqual([0, 0, 0.003]);
    expect(Math.max(...rows.slice(0, 15).map((r) => r[6]))).toBe(centre3[6]);
    expect(centre5[6]).toBeLessThan(centre3[6]);
    expect(r.written['map.csv']).not.toMatch(/NaN|Infinity/);
  });

  it('prints JSON with --format json, matching the CSV', async () => {
    const csv = await run(['sweep', example('earbud-case-sweep.json')]);
    const json = await run(['sweep', example('earbud-case-sweep.json'), '--format', 'json']);
    const out = JSON.parse(json.out);
    expect(out.points).toHaveLength(30);
    const row = csv.out.split('\n')[8].split(',').map(Number);
    expect([out.points[7].x, out.points[7].y, out.points[7].M, out.points[7].k]).toEqual([
      row[0],
      row[1],
      row[5],
      row[6],
    ]);
    expect(out.axes.x).toEqual([-0.01, -0.005, 0, 0.005, 0.01]);
  });

  it('refuses a grid too large and intersecting poses with exit code 2', async () => {
    const input = JSON.parse(await readFile(example('earbud-case-sweep.json'), 'utf8'));
    const big = {
      ...input,
      sweep: { x: { from: 0, to: 1, steps: 2000 }, y: { from: 0, to: 1, steps: 1000 }, z: 0.003 },
    };
    const r = await run(['sweep', 'in.json'], { 'in.json': JSON.stringify(big) });
    expect(r.code).toBe(2);
    expect(r.err).toBe('couplet: sweep: grid too large: 2000000 poses; allowed: at most 1000000\n');
    const touching = { ...input, sweep: { z: { from: 0, to: 0.002, steps: 3 } } };
    const t = await run(['sweep', 'in.json'], { 'in.json': JSON.stringify(touching) });
    expect(t.code).toBe(2);
    expect(t.err).toMatch(/^couplet: sweep: pose: the coils intersect .*\(at x=0 m, y=0 m, z=0 m/);
    const typo = await run(['sweep', 'in.json'], {
      'in.json': JSON.stringify({ ...input, sweep: { z: 0.003, xx: 1 } }),
    });
    expect(typo.err).toMatch(/^couplet: sweep\.xx: unknown field/);
  });

  it('shows progress on a terminal and exits 130 when cancelled', async () => {
    const f = fakeIo();
    f.io.stderrIsTTY = true;
    expect(await runCli(['sweep', example('earbud-case-sweep.json')], f.io)).toBe(0);
    expect(f.err()).toMatch(/\rcouplet: sweep 100% \(30\/30 poses\)\n$/);
    const g = fakeIo();
    g.io.signal = AbortSignal.abort();
    expect(await runCli(['sweep', example('earbud-case-sweep.json')], g.io)).toBe(130);
    expect(g.err()).toBe('couplet: sweep cancelled after 0 of 30 poses\n');
  });
});

describe('couplet --help', () => {
  it('prints usage with every command', async () => {
    const r = await run(['--help']);
    expect(r.code).toBe(0);
    for (const word of ['mutual FILE', 'inductance FILE', 'sweep FILE', '--out', '--format']) {
      expect(r.out).toContain(word);
    }
  });
});
