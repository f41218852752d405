import { parseCoil } from '../coils/parse-coil';
import { preparePair } from '../inductance/prepare-pair';
import { parseSweepSpec } from '../sweep/parse-sweep-spec';
import { runSweep } from '../sweep/run-sweep';
import { sweepPoseAt } from '../sweep/sweep-pose-at';
import { readObjectFields } from './read-object-fields';
import { withInputPath } from './with-input-path';

/** The CSV header of a coupling map, exactly as the CLI contract states it. */
export const SWEEP_CSV_HEADER = 'x_m,y_m,z_m,tiltX_deg,tiltY_deg,M_H,k';

export interface SweepCommandOptions {
  format: 'csv' | 'json';
  onProgress?: (progress: { done: number; total: number }) => void;
  signal?: AbortSignal;
}

/**
 * The `couplet sweep` command on parsed JSON: a coupling map as CSV or JSON text.
 *
 * Method: validate `{tx, rx, sweep}` (paths `tx.…`, `rx.…`, `sweep.…`; the grid bound is
 * checked before any work), preparePair(tx, rx), runSweep (poses x fastest, then y, z, tiltX,
 * tiltY; progress and cancellation passed through). CSV: the header `x_m,y_m,z_m,tiltX_deg,
 * tiltY_deg,M_H,k` and one row per pose, numbers in JavaScript's shortest round-trip form. JSON:
 * `{L1, L2, axes, points: [{x, y, z, tiltX, tiltY, M, k}]}`; L2 is the Rx alone (with a Tx
 * backing, k uses the Rx inductance at each pose).
 *
 * References: none beyond runSweep and preparePair.
 *
 * @param json parsed input
 * @param options format, onProgress, signal
 * @returns the output text (ends with a newline)
 * @example (await runSweepCommand(input, { format: 'csv' })).split('\n')[0]
 *   // 'x_m,y_m,z_m,tiltX_deg,tiltY_deg,M_H,k'
 */
export async function runSweepCommand(
  json: unknown,
  options: SweepCommandOptions,
): Promise<string> {
  const record = readObjectFields(json, 'input', ['tx', 'rx', 'sweep'], ['tx', 'rx', 'sweep']);
  const tx = parseCoil(record.tx, 'tx');
  const rx = parseCoil(record.rx, 'rx');
  const spec = parseSweepSpec(record.sweep, 'sweep');
  const pair = withInputPath('sweep', () => preparePair(tx, rx));
  let result;
  try {
    result = await runSweep(pair, spec, { onProgress: options.onProgress, signal: options.signal });
  } catch (e) {
    // Clearance errors name the pose; prefix with the part of the input that set it.
    if (e instanceof RangeError) throw new RangeError(`sweep: ${e.message}`);
    throw e;
  }
  const { axes, M, k } = result;
  if (options.format === 'json') {
    const points = Array.from({ length: result.count }, (_, i) => {
      const p = sweepPoseAt(axes, i);
      return { x: p.x, y: p.y, z: p.z, tiltX: p.tiltX, tiltY: p.tiltY, M: M[i], k: k[i] };
    });
    return `${JSON.stringify({ L1: result.L1, L2: result.L2, axes, points })}\n`;
  }
  const lines = [SWEEP_CSV_HEADER];
  for (let i = 0; i < result.count; i++) {
    const p = sweepPoseAt(axes, i);
    lines.push(`${p.x},${p.y},${p.z},${p.tiltX},${p.tiltY},${M[i]},${k[i]}`);
  }
  return `${lines.join('\n')}\n`;
}
