import { couplingCoefficient } from '../link/coupling-coefficient';
import { parseSweepSpec } from './parse-sweep-spec';
import { sweepAxes, type SweepAxes } from './sweep-axes';
import { SweepCancelledError } from './sweep-cancelled-error';
import type { SweepPair } from './sweep-pair';
import type { SweepPose } from './sweep-pose';
import { sweepPoseAt } from './sweep-pose-at';
import type { SweepSpec } from './sweep-spec-schema';

/** One computed slice of a sweep: poses start … start + M.length − 1 in grid order. */
export interface SweepChunk {
  axes: SweepAxes;
  start: number;
  /** Mutual inductance per pose, H. */
  M: Float64Array;
  /** Coupling coefficient per pose. */
  k: Float64Array;
  /** Poses finished so far, including this chunk. */
  done: number;
  total: number;
}

export interface SweepChunkOptions {
  signal?: AbortSignal;
  /** Poses per call to mutualMany (default 1024). */
  chunkSize?: number;
}

/**
 * Default chunk: large enough that the per-chunk overhead (an event-loop turn, a progress
 * message) stays below 1 % for the cheapest kernels, small enough that progress arrives several
 * times a second and a cancel is honoured within one chunk.
 */
export const DEFAULT_SWEEP_CHUNK = 1024;

/**
 * Run a sweep as an async iterator of chunks, for callers that stream progress (worker threads,
 * server-sent events) or keep only part of the result.
 *
 * Method: validate the spec (grid bound first), then for each chunk of poses in grid order
 * (x fastest, then y, z, tiltX, tiltY) call pair.mutualMany once and form k = M / sqrt(L1 L2)
 * (couplingCoefficient, which rejects |k| > 1; L2 = pair.L2At(pose) when the pair has it). If
 * the kernels reject a chunk with a RangeError (coils intersecting at some pose), its poses are
 * retried one by one so the message can name the first offending pose. Between chunks the
 * iterator yields to the event loop, so an AbortSignal fired meanwhile is seen before the next
 * chunk and ends the iteration with SweepCancelledError. Results depend only on the pair and the
 * spec, never on the chunk size: each pose is computed by the same kernel in the same order.
 *
 * References: none (orchestration; the physics is in the pair's kernels).
 *
 * @param pair a prepared pair (L1, L2 in H; mutualMany(poses) → H)
 * @param spec the sweep spec
 * @param options signal and chunkSize
 * @returns an async iterator of chunks
 * @example for await (const c of sweepChunks(pair, { z: 0.003 })) console.log(c.k[0]) // ≈ 0.5
 */
export async function* sweepChunks(
  pair: SweepPair,
  spec: SweepSpec,
  options: SweepChunkOptions = {},
): AsyncGenerator<SweepChunk, void, undefined> {
  const axes = sweepAxes(parseSweepSpec(spec));
  const total =
    axes.x.length * axes.y.length * axes.z.length * axes.tiltX.length * axes.tiltY.length;
  const size = options.chunkSize ?? DEFAULT_SWEEP_CHUNK;
  if (!Number.isInteger(size) || size < 1 || size > MAX_CHUNK) {
    throw new RangeError(`chunkSize: must be an integer from 1 to ${MAX_CHUNK} (got ${size})`);
  }
  const { signal } = options;
  for (let start = 0; start < total; start += size) {
    if (signal?.aborted) throw new SweepCancelledError(start, total);
    const end = Math.min(total, start + size);
    const poses: SweepPose[] = [];
    for (let i = start; i < end; i++) poses.push(sweepPoseAt(axes, i));
    const M = mutualOrLocate(pair, poses);
    if (M.length !== poses.length) {
      throw new Error(`mutualMany returned ${M.length} values for ${poses.length} poses`);
    }
    const k = new Float64Array(M.length);
    for (let j = 0; j < M.length; j++) {
      if (!Number.isFinite(M[j])) {
        throw new RangeError(`M: not finite at pose ${describe(poses[j])}`);
      }
      k[j] = couplingCoefficient(M[j], pair.L1, pair.L2At ? pair.L2At(poses[j]) : pair.L2);
    }
    yield { axes, start, M, k, done: end, total };
    await nextTurn();
  }
}

/** Chunks above the whole grid bound make no sense; 1e6 matches MAX_SWEEP_POSES. */
const MAX_CHUNK = 1_000_000;

/** mutualMany, and on a RangeError the first pose that causes it, named in the message. */
function mutualOrLocate(pair: SweepPair, poses: SweepPose[]): Float64Array {
  try {
    return pair.mutualMany(poses);
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
    for (const p of poses) {
      try {
        pair.mutualMany([p]);
      } catch (one) {
        if (one instanceof RangeError) throw new RangeError(`${one.message} (at ${describe(p)})`);
        throw one;
      }
    }
    throw e;
  }
}

function describe(p: SweepPose): string {
  return `x=${p.x} m, y=${p.y} m, z=${p.z} m, tiltX=${p.tiltX}°, tiltY=${p.tiltY}°`;
}

/** One macrotask turn (setImmediate in Node, setTimeout in a browser worker). */
function nextTurn(): Promise<void> {
  const immediate = (globalThis as { setImmediate?: (f: () => void) => unknown }).setImmediate;
  return new Promise((resolve) => (immediate ? immediate(resolve) : setTimeout(resolve, 0)));
}
