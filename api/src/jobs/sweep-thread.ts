import type { MessagePort } from 'node:worker_threads';
import {
  parseSweepSpec,
  preparePair,
  sweepAxes,
  sweepPoseAt,
  type Coil,
  type SweepAxes,
  type SweepSpec,
} from '../../../physics/src/index';
import { computeSweepResult } from '../sweeps/compute-sweep';
import type { FrozenSweepSpec, SweepResultBody } from '../sweeps/sweeps-dto';

// The code that runs inside a worker thread of the sweep pool (piscina). One default export
// taking a task and returning its outcome; everything crosses the thread boundary by structured
// clone, so errors come back as plain messages rather than thrown objects.

/** Main thread → task: 'abort' stops a compute at its next chunk. */
export type SweepThreadControl = 'abort';

/** Task → main thread, after every chunk of a compute. */
export interface SweepThreadProgress {
  done: number;
  total: number;
}

export interface ComputeTask {
  type: 'compute';
  spec: FrozenSweepSpec;
  /** Progress goes out, 'abort' comes in. */
  port: MessagePort;
  chunkSize?: number;
}

export interface EstimateTask {
  type: 'estimate';
  tx: Coil;
  rx: Coil;
  grid: SweepSpec;
  /** Poses to time (spread evenly over the grid). */
  sample: number;
}

export type ComputeOutcome =
  | { type: 'succeeded'; result: SweepResultBody; computeTimeS: number }
  | { type: 'aborted'; done: number; computeTimeS: number }
  | { type: 'failed'; error: string; computeTimeS: number };

export interface EstimateOutcome {
  poses: number;
  prepareSeconds: number;
  perPoseMicroseconds: number;
}

export default async function sweepThread(
  task: ComputeTask | EstimateTask,
): Promise<ComputeOutcome | EstimateOutcome> {
  return task.type === 'compute' ? compute(task) : estimate(task);
}

async function compute(task: ComputeTask): Promise<ComputeOutcome> {
  const controller = new AbortController();
  const started = performance.now();
  const elapsed = () => (performance.now() - started) / 1000;
  let done = 0;
  task.port.on('message', (message: SweepThreadControl) => {
    if (message === 'abort') controller.abort();
  });
  try {
    const result = await computeSweepResult(task.spec, {
      signal: controller.signal,
      chunkSize: task.chunkSize,
      onProgress: (p) => {
        done = p.done;
        task.port.postMessage({ done: p.done, total: p.total } satisfies SweepThreadProgress);
      },
    });
    return { type: 'succeeded', result, computeTimeS: elapsed() };
  } catch (error) {
    if (controller.signal.aborted) return { type: 'aborted', done, computeTimeS: elapsed() };
    const message = error instanceof Error ? error.message : String(error);
    return { type: 'failed', error: message, computeTimeS: elapsed() };
  } finally {
    task.port.close();
  }
}

/**
 * Measured, not modelled: the pair is prepared once (filaments, self-inductances, tables), then a
 * sub-grid of about `sample` poses is timed in one batch, as a run computes its chunks. The
 * sub-grid takes evenly spaced values of each swept axis, ends included, so a symmetric grid
 * keeps its symmetry and the engine's reuse of equal offsets (±x, ±y, x <-> y) shows in the
 * sample as in the run. The batch is run once untimed at a slightly larger gap first, so the
 * timing sees compiled code rather than the JIT's first pass (10–40× slower here). The sample
 * is timed with the timed poses only: the run's own per-chunk and per-pose bookkeeping (L2, η,
 * envelopes) is small beside it.
 */
function estimate(task: EstimateTask): EstimateOutcome {
  const spec = parseSweepSpec(task.grid);
  const axes = sweepAxes(spec);
  const poses =
    axes.x.length * axes.y.length * axes.z.length * axes.tiltX.length * axes.tiltY.length;
  const t0 = performance.now();
  const pair = preparePair(task.tx, task.rx);
  void pair.L1;
  void pair.L2;
  const t1 = performance.now();
  const sample = subGrid(axes, task.sample);
  const size =
    sample.x.length * sample.y.length * sample.z.length * sample.tiltX.length * sample.tiltY.length;
  const posesOf = (dz: number) =>
    Array.from({ length: size }, (_, i) => {
      const p = sweepPoseAt(sample, i);
      return { ...p, z: p.z + dz };
    });
  try {
    // 0.2 mm farther: not an offset the timed batch finds cached.
    pair.mutualMany(posesOf(2e-4));
  } catch {
    // A warm-up pose the grid does not contain may touch (a coil reaching up): time cold then.
  }
  // The fastest of three timings (the later ones 0.1 and 0.2 µm farther, so nothing is cached):
  // a sample takes milliseconds, which one garbage collection or a busy core can double.
  let best = Infinity;
  for (const dz of [0, 1e-7, 2e-7]) {
    const timed = posesOf(dz);
    const t2 = performance.now();
    pair.mutualMany(timed);
    best = Math.min(best, performance.now() - t2);
  }
  return {
    poses,
    prepareSeconds: (t1 - t0) / 1000,
    perPoseMicroseconds: (best * 1000) / size,
  };
}

/** About `target` poses: evenly spaced values (ends included) of every swept axis. */
function subGrid(axes: SweepAxes, target: number): SweepAxes {
  const swept = (Object.keys(axes) as (keyof SweepAxes)[]).filter((k) => axes[k].length > 1);
  // The epsilon keeps 64^(1/3) = 3.999… at 4.
  const per = Math.max(2, Math.floor(target ** (1 / Math.max(1, swept.length)) + 1e-9));
  const pick = (values: number[]) => {
    if (values.length <= per) return values;
    return Array.from(
      { length: per },
      (_, i) => values[Math.round((i * (values.length - 1)) / (per - 1))]!,
    );
  };
  return {
    x: pick(axes.x),
    y: pick(axes.y),
    z: pick(axes.z),
    tiltX: pick(axes.tiltX),
    tiltY: pick(axes.tiltY),
  };
}
