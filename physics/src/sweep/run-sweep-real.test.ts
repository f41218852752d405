import { describe, expect, it } from 'vitest';
import { parseCoil } from '../coils/parse-coil';
import { preparePair } from '../inductance/prepare-pair';
import { expectNear } from '../testing/expect-near';
import { maxwellStdlib } from '../testing/maxwell-stdlib';
import { runSweep } from './run-sweep';

describe('runSweep with the real preparePair', () => {
  it('matches Maxwell on the axis and keeps the map symmetric in x', async () => {
    const tx = parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 });
    const rx = parseCoil({ kind: 'ring', radius: 0.015, wireRadius: 4e-4 });
    const spec = { x: { from: -0.01, to: 0.01, steps: 5 }, z: { from: 0.002, to: 0.01, steps: 5 } };
    const r = await runSweep(preparePair(tx, rx), spec, { chunkSize: 8 });
    expect(r.count).toBe(25);
    for (let iz = 0; iz < 5; iz++) {
      const row = Array.from(r.M.subarray(iz * 5, iz * 5 + 5));
      // On the axis: Maxwell's closed form; the kernels promise 1e-6 relative, 4π·1e-7 vs CODATA
      // mu0 adds 5e-10.
      expectNear(
        row[2],
        maxwellStdlib(0.02, 0.015, r.axes.z[iz]),
        1e-6,
        `M at z = ${r.axes.z[iz]}`,
      );
      // Parallel rings depend on |x| only (rotation symmetry about the common axis).
      expectNear(row[0], row[4], 1e-12, 'M(−x) = M(x)');
      // M decays with gap at fixed offset.
      if (iz > 0) expect(row[2]).toBeLessThan(r.M[(iz - 1) * 5 + 2]);
    }
    for (const k of r.k) expect(Math.abs(k)).toBeLessThanOrEqual(1);
  });
});
