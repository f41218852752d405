// The public surface, end to end: coils and poses parsed from JSON through the index, their
// mutual inductance against Maxwell's closed form for coaxial circles (J. C. Maxwell, Treatise on
// Electricity and Magnetism, 1873, art. 701) evaluated with the registry's @stdlib ellipk and
// ellipe — no code of the library in the reference.
import { describe, expect, it } from 'vitest';
import {
  couplingCoefficient,
  linkFigures,
  maxwellCoaxial,
  mutualInductance,
  parseCoil,
  parsePose,
  preparePair,
  runSweep,
  SweepCancelledError,
  toleranceEnvelope,
} from './index';
import { expectNear } from './testing/expect-near';
import { maxwellStdlib } from './testing/maxwell-stdlib';

// Demo geometry of our own: a 50 mm Tx ring of 1 mm wire and a 36 mm Rx ring of 0.8 mm wire.
const tx = parseCoil({ kind: 'ring', radius: 0.025, wireRadius: 5e-4 });
const rx = parseCoil({ kind: 'ring', radius: 0.018, wireRadius: 4e-4 });
const gaps = [0.002, 0.006, 0.02, 0.05];

describe('the index, end to end', () => {
  it('gives two coaxial rings Maxwell’s M (stdlib K and E) at gaps of 2–50 mm', () => {
    for (const z of gaps) {
      // k² ≥ 0.41 at these gaps, where the textbook form loses at most ~2 of 16 digits: 1e-12.
      const want = maxwellStdlib(0.025, 0.018, z);
      expectNear(mutualInductance(tx, rx, parsePose({ z })), want, 1e-12, `M at z = ${z} m`);
      expectNear(maxwellCoaxial(0.025, 0.018, z), want, 1e-12, `maxwellCoaxial at z = ${z} m`);
    }
  });

  it('prepares the pair once for a map, and turning the Rx over reverses M', () => {
    const pair = preparePair(tx, rx);
    const m = pair.mutualMany(gaps.flatMap((z) => [{ z }, { z, tiltX: 180 }]));
    gaps.forEach((z, i) => {
      const want = maxwellStdlib(0.025, 0.018, z);
      // Same tolerance and reason as above; the sign is the README's current convention.
      expectNear(m[2 * i], want, 1e-12, `map M at z = ${z} m`);
      expectNear(m[2 * i + 1], -want, 1e-12, `map M, Rx turned over, at z = ${z} m`);
    });
  });

  it('ties k in the link figures to Maxwell’s M and the Rosa–Grover ring inductances', () => {
    const f = linkFigures(tx, rx, { z: 0.006 }, { frequency: 110e3 });
    // Rosa & Grover, Bull. Bureau of Standards 8, 1912 (from memory): L = mu0 R (ln(8R/a) − 7/4),
    // written out here; the same closed forms on both sides, so 1e-12 only bounds rounding.
    const ringL = (R: number, a: number) => 4e-7 * Math.PI * R * (Math.log((8 * R) / a) - 1.75);
    const k =
      maxwellStdlib(0.025, 0.018, 0.006) / Math.sqrt(ringL(0.025, 5e-4) * ringL(0.018, 4e-4));
    expectNear(f.k, k, 1e-12, 'k at 6 mm');
    expectNear(couplingCoefficient(f.M, f.L1, f.L2), k, 1e-12, 'couplingCoefficient at 6 mm');
    expect(() => parseCoil({ kind: 'ring', radius: -0.01, wireRadius: 5e-4 })).toThrow(
      /^coil\.radius: .*allowed/,
    );
  });

  it('sweeps an offset map into a tolerance envelope, and cancels on request', async () => {
    const spec = {
      x: { from: -0.01, to: 0.01, steps: 5 },
      y: { from: -0.01, to: 0.01, steps: 5 },
      z: 0.006,
    };
    const r = await runSweep(preparePair(tx, rx), spec);
    const env = toleranceEnvelope({ xs: r.axes.x, ys: r.axes.y, values: r.k }, 0);
    // k > 0 over the whole ±10 mm map (the rings overlap in projection): the envelope is the map.
    expectNear(env.area, 0.02 * 0.02, 1e-12, 'area of a region that fills the map');
    const stop = new AbortController();
    stop.abort();
    await expect(runSweep(preparePair(tx, rx), spec, { signal: stop.signal })).rejects.toThrow(
      SweepCancelledError,
    );
  });
});
