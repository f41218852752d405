import type { SweepAxes } from './sweep-axes';
import { sweepChunks } from './sweep-chunks';
import type { SweepPair } from './sweep-pair';
import type { SweepSpec } from './sweep-spec-schema';

/** The full result of a sweep: M and k per pose in grid order (x fastest … tiltY slowest). */
export interface SweepResult {
  axes: SweepAxes;
  count: number;
  /** Self-inductances of Tx and Rx, H. */
  L1: number;
  L2: number;
  /** Mutual inductance per pose, H. */
  M: Float64Array;
  /** Coupling coefficient per pose. */
  k: Float64Array;
}

export interface RunSweepOptions {
  /** Called after each chunk with the poses finished so far. */
  onProgress?: (progress: { done: number; total: number }) => void;
  signal?: AbortSignal;
  chunkSize?: number;
}

/**
 * Compute a coupling map: M and k at every pose of a sweep.
 *
 * Method: sweepChunks (validation and grid bound first, then one mutualMany call per chunk,
 * k = M/sqrt(L1 L2)), copying each chunk into the result arrays and reporting progress after
 * it. Cancellation through `signal` rejects with SweepCancelledError (name 'AbortError'); an
 * error from the kernels (for example coils that intersect at some pose) rejects with it.
 * Deterministic: the same pair and spec give bit-identical arrays whatever the chunk size.
 *
 * References: none (orchestration).
 *
 * @param pair a prepared pair (L1, L2 in H; mutualMany(poses) → H)
 * @param spec the sweep spec (m, degrees)
 * @param options onProgress, signal, chunkSize
 * @returns the coupling map
 * @example (await runSweep(pair, { x: { from: -0.02, to: 0.02, steps: 41 }, z: 0.003 })).k.length
 *   // 41
 */
export async function runSweep(
  pair: SweepPair,
  spec: SweepSpec,
  options: RunSweepOptions = {},
): Promise<SweepResult> {
  let result: SweepResult | undefined;
  const iterator = sweepChunks(pair, spec, {
    signal: options.signal,
    chunkSize: options.chunkSize,
  });
  for await (const chunk of iterator) {
    result ??= {
      axes: chunk.axes,
      count: chunk.total,
      L1: pair.L1,
      L2: pair.L2,
      M: new Float64Array(chunk.total),
      k: new Float64Array(chunk.total),
    };
    result.M.set(chunk.M, chunk.start);
    result.k.set(chunk.k, chunk.start);
    options.onProgress?.({ done: chunk.done, total: chunk.total });
  }
  if (!result) throw new Error('sweep produced no poses'); // the schema forbids empty axes
  return result;
}
