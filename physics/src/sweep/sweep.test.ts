import { describe, expect, it } from 'vitest';
import { expectNear } from '../testing/expect-near';
import { parseSweepSpec } from './parse-sweep-spec';
import { runSweep } from './run-sweep';
import { sweepChunks } from './sweep-chunks';
import { sweepGrid } from './sweep-grid';
import type { SweepPair } from './sweep-pair';
import type { SweepPose } from './sweep-pose';
import { MAX_SWEEP_POSES, type SweepSpec } from './sweep-spec-schema';

const L = 10e-6;
const DEG = Math.PI / 180;

/** A made-up analytic M(pose), k = 0.5 at the origin: a known function to test order with. */
function fakeM(p: SweepPose): number {
  const r2 = p.x * p.x + p.y * p.y;
  return (
    (0.5 * L * Math.exp(-p.z / 0.01) * Math.cos(p.tiltX * DEG) * Math.cos(p.tiltY * DEG)) /
    (1 + r2 / 1e-4)
  );
}

function fakePair(): SweepPair & { calls: number[] } {
  const calls: number[] = [];
  return {
    L1: L,
    L2: L,
    calls,
    mutualMany(poses) {
      calls.push(poses.length);
      return Float64Array.from(poses, fakeM);
    },
  };
}

const spec: SweepSpec = {
  x: { from: -0.01, to: 0.01, steps: 5 },
  y: { from: 0, to: 0.02, steps: 3 },
  z: { from: 0.002, to: 0.004, steps: 2 },
  tiltX: 5,
  tiltY: { from: 0, to: 10, steps: 2 },
};

describe('sweepGrid', () => {
  it('orders poses x fastest, then y, z, tiltX, tiltY; ends exact; missing axes are 0', () => {
    const g = sweepGrid(spec);
    expect(g.count).toBe(5 * 3 * 2 * 1 * 2);
    // Values are rounded to 15 significant digits, so the decimal grid comes out exact.
    expect(g.axes.x).toEqual([-0.01, -0.005, 0, 0.005, 0.01]);
    expect(sweepGrid({ z: { from: 0.001, to: 0.002, steps: 11 } }).axes.z[3]).toBe(0.0013);
    expect(g.axes.tiltX).toEqual([5]);
    expect(g.poses[0]).toEqual({ x: -0.01, y: 0, z: 0.002, tiltX: 5, tiltY: 0, yaw: 0 });
    expect(g.poses[1].x).toBe(g.axes.x[1]);
    expect(g.poses[5]).toMatchObject({ x: -0.01, y: 0.01 });
    expect(g.poses[15]).toMatchObject({ x: -0.01, y: 0, z: 0.004, tiltY: 0 });
    expect(g.poses[30]).toMatchObject({ x: -0.01, y: 0, z: 0.002, tiltY: 10 });
    expect(g.poses[59]).toEqual({ x: 0.01, y: 0.02, z: 0.004, tiltX: 5, tiltY: 10, yaw: 0 });
    expect(sweepGrid({ z: 0.003 }).poses).toEqual([
      { x: 0, y: 0, z: 0.003, tiltX: 0, tiltY: 0, yaw: 0 },
    ]);
  });
});

describe('parseSweepSpec', () => {
  it('names the bad field and its allowed range', () => {
    expect(() => parseSweepSpec({ x: { from: 0, to: 1, steps: 2.5 }, z: 0 })).toThrow(
      /^sweep\.x\.steps: must be an integer from 1 to 1000000 \(got 2\.5\)$/,
    );
    expect(() => parseSweepSpec({ x: { from: 1, to: 0, steps: 3 }, z: 0 })).toThrow(
      /sweep\.x\.to: must be ≥ from/,
    );
    expect(() => parseSweepSpec({ x: 0 })).toThrow(
      /^sweep\.z: expected a number or \{from, to, steps\}/,
    );
    expect(() => parseSweepSpec({ z: 0, gap: 1 })).toThrow(
      /unknown field; allowed fields: x, y, z/,
    );
    expect(() => parseSweepSpec({ z: NaN })).toThrow(/sweep\.z/);
    expect(() => parseSweepSpec({ z: 0, tiltX: 400 })).toThrow(/sweep\.tiltX: 400 is out of range/);
    expect(() => parseSweepSpec({ z: { from: 0, to: 1, steps: 1 } })).toThrow(
      /sweep\.z\.steps: must be ≥ 2/,
    );
    expect(() => parseSweepSpec({ z: { from: 0, to: 1, steps: 3, step: 1 } })).toThrow(
      /sweep\.z\.step: unknown field; allowed fields: from, to, steps/,
    );
    expect(() => parseSweepSpec('z')).toThrow(/^sweep: /);
  });

  it('rejects a grid above the bound before any work', async () => {
    const big = { x: { from: 0, to: 1, steps: 1001 }, y: { from: 0, to: 1, steps: 1000 }, z: 0 };
    expect(() => parseSweepSpec(big)).toThrow(
      /grid too large: 1001000 poses; allowed: at most 1000000/,
    );
    expect(() => parseSweepSpec({ ...big, x: { from: 0, to: 1, steps: 1000 } })).not.toThrow();
    const pair = fakePair();
    await expect(runSweep(pair, big as SweepSpec)).rejects.toThrow(/grid too large/);
    expect(pair.calls).toEqual([]);
    expect(MAX_SWEEP_POSES).toBe(1_000_000);
  });
});

describe('runSweep', () => {
  it('computes M and k per pose in grid order, with progress after each chunk', async () => {
    const pair = fakePair();
    const progress: { done: number; total: number }[] = [];
    const r = await runSweep(pair, spec, { chunkSize: 7, onProgress: (p) => progress.push(p) });
    const g = sweepGrid(spec);
    expect(r.count).toBe(60);
    g.poses.forEach((p, i) => {
      expect(r.M[i]).toBe(fakeM(p));
      // k = M / sqrt(L1 L2) = M / L here; one division, 1e-15 relative.
      expectNear(r.k[i], fakeM(p) / L, 1e-15, `k at ${i}`);
    });
    expect(pair.calls).toEqual([7, 7, 7, 7, 7, 7, 7, 7, 4]);
    expect(progress.map((p) => p.done)).toEqual([7, 14, 21, 28, 35, 42, 49, 56, 60]);
    expect(progress.every((p) => p.total === 60)).toBe(true);
  });

  it('is deterministic whatever the chunk size', async () => {
    const a = await runSweep(fakePair(), spec, { chunkSize: 1 });
    const b = await runSweep(fakePair(), spec, { chunkSize: 1000 });
    expect(Array.from(a.M)).toEqual(Array.from(b.M));
    expect(Array.from(a.k)).toEqual(Array.from(b.k));
  });

  it('stops at the next chunk when cancelled and says so', async () => {
    const pair = fakePair();
    const controller = new AbortController();
    const run = runSweep(pair, spec, {
      chunkSize: 10,
      signal: controller.signal,
      onProgress: (p) => p.done === 20 && controller.abort(),
    });
    await expect(run).rejects.toMatchObject({
      name: 'AbortError',
      message: 'sweep cancelled after 20 of 60 poses',
    });
    expect(pair.calls).toEqual([10, 10]);
  });

  it('does no work when the signal has already fired', async () => {
    const pair = fakePair();
    await expect(runSweep(pair, spec, { signal: AbortSignal.abort() })).rejects.toThrow(
      /cancelled/,
    );
    expect(pair.calls).toEqual([]);
  });

  it('passes on kernel errors and refuses non-finite or inconsistent results', async () => {
    // Fails, as the kernels' clearance check does, at every pose closer than 3 mm with y = 0.02.
    const failing: SweepPair = {
      L1: L,
      L2: L,
      mutualMany: (poses) => {
        if (poses.some((p) => p.z < 0.003 && p.y === 0.02)) {
          throw new RangeError('pose: the coils intersect');
        }
        return Float64Array.from(poses, fakeM);
      },
    };
    await expect(runSweep(failing, spec, { chunkSize: 64 })).rejects.toThrow(
      /^pose: the coils intersect \(at x=-0\.01 m, y=0\.02 m, z=0\.002 m, tiltX=5°, tiltY=0°\)$/,
    );
    const nan: SweepPair = {
      L1: L,
      L2: L,
      mutualMany: (p) => new Float64Array(p.length).fill(NaN),
    };
    await expect(runSweep(nan, { z: 0.001 })).rejects.toThrow(/M: not finite at pose x=0 m/);
    const big: SweepPair = {
      L1: L,
      L2: L,
      mutualMany: (p) => new Float64Array(p.length).fill(2 * L),
    };
    await expect(runSweep(big, { z: 0.001 })).rejects.toThrow(/exceeds 1/);
    await expect(runSweep(fakePair(), spec, { chunkSize: 0 })).rejects.toThrow(/chunkSize/);
  });
});

describe('pose-dependent L2', () => {
  it('uses L2At(pose) for k when the pair has it (Tx ferrite raising the Rx L)', async () => {
    const pair = { ...fakePair(), L2At: (p: SweepPose) => L * (1 + 0.01 / (p.z + 0.01)) };
    const r = await runSweep(pair, spec);
    sweepGrid(spec).poses.forEach((p, i) => {
      // k = M / sqrt(L1 L2(pose)): a few roundings, 1e-15.
      expectNear(r.k[i], fakeM(p) / Math.sqrt(L * pair.L2At(p)), 1e-15, `k at ${i}`);
    });
  });
});

describe('sweepChunks', () => {
  it('yields partial results that tile the grid', async () => {
    const seen: number[] = [];
    let last = 0;
    for await (const c of sweepChunks(fakePair(), spec, { chunkSize: 16 })) {
      expect(c.start).toBe(last);
      last = c.done;
      seen.push(c.M.length);
      expect(c.k.length).toBe(c.M.length);
    }
    expect(seen).toEqual([16, 16, 16, 12]);
  });
});
