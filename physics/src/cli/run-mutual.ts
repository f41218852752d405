import { parseCoil } from '../coils/parse-coil';
import { preparePair } from '../inductance/prepare-pair';
import { couplingCoefficient } from '../link/coupling-coefficient';
import { parsePose } from '../pose/parse-pose';
import { CliInputError } from './cli-input-error';
import { FREQUENCY_RANGE, readOptionalNumber } from './read-optional-number';
import { readObjectFields } from './read-object-fields';
import { requireFiniteOutput } from './require-finite-output';
import { withInputPath } from './with-input-path';

type MutualOutput = { M: number; L1: number; L2: number; k: number };

/**
 * The `couplet mutual` command on parsed JSON: M, L1, L2 and k for one pair or an array of pairs.
 *
 * Method: each pair `{tx, rx, pose, frequency?}` is validated field by field (paths `pair.…` or
 * `pairs[i].…`), then preparePair(tx, rx): M at the pose (clearance checked: intersecting coils
 * are an error), L1 the Tx self-inductance and L2 the Rx self-inductance at the pose (both
 * low-frequency; a Tx backing acts on both), k = M/sqrt(L1 L2). `frequency` is validated but
 * does not change these quasi-static figures. The output has the input's shape.
 *
 * References: see preparePair and couplingCoefficient.
 *
 * @param json parsed input
 * @returns `{M, L1, L2, k}` (H, H, H, 1) or an array of them, in input order
 * @example runMutual({ tx: ring, rx: ring, pose: { z: 0.003 } }).k // ≈ 0.5
 */
export function runMutual(json: unknown): MutualOutput | MutualOutput[] {
  if (Array.isArray(json)) {
    if (json.length === 0) throw new CliInputError('pairs: the array is empty');
    return json.map((item, i) => onePair(item, `pairs[${i}]`));
  }
  return onePair(json, 'pair');
}

function onePair(item: unknown, path: string): MutualOutput {
  const record = readObjectFields(
    item,
    path,
    ['tx', 'rx', 'pose', 'frequency'],
    ['tx', 'rx', 'pose'],
  );
  readOptionalNumber(record, 'frequency', path, FREQUENCY_RANGE);
  const tx = parseCoil(record.tx, `${path}.tx`);
  const rx = parseCoil(record.rx, `${path}.rx`);
  const pose = parsePose(record.pose, `${path}.pose`);
  return withInputPath(path, () => {
    const pair = preparePair(tx, rx);
    const M = pair.mutual(pose);
    const L2 = pair.L2At(pose);
    const out = { M, L1: pair.L1, L2, k: couplingCoefficient(M, pair.L1, L2) };
    return requireFiniteOutput(out, path);
  });
}
