import { describe, expect, it } from 'vitest';
import { parseCoil } from '../coils/parse-coil';
import { preparePair } from '../inductance/prepare-pair';
import { expectNear } from '../testing/expect-near';
import { maxwellStdlib } from '../testing/maxwell-stdlib';
import { couplingCoefficient } from './coupling-coefficient';
import { linkFigures } from './link-figures';
import { maxLinkEfficiency } from './max-link-efficiency';

const MU0 = 4e-7 * Math.PI;

describe('linkFigures', () => {
  const tx = parseCoil({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 });
  const rx = parseCoil({ kind: 'ring', radius: 0.015, wireRadius: 4e-4 });

  it('uses Maxwell’s M for coaxial rings and ties every figure to its formula', () => {
    const f = 150e3;
    const w = 2 * Math.PI * f;
    const fig = linkFigures(tx, rx, { z: 0.005 }, { frequency: f, current: 2 });
    // Maxwell via @stdlib elliptic integrals; 4π·1e-7 vs CODATA mu0 and quadrature: 1e-8.
    expectNear(fig.M, maxwellStdlib(0.02, 0.015, 0.005), 1e-8, 'M coaxial');
    // Ring self terms, Rosa & Grover 1912 (from memory): 1e-8.
    expectNear(fig.L1, MU0 * 0.02 * (Math.log(0.16 / 5e-4) - 1.75), 1e-8, 'L1');
    expectNear(fig.L2, MU0 * 0.015 * (Math.log(0.12 / 4e-4) - 1.75), 1e-8, 'L2');
    // The rest are the closed forms of the link functions: arithmetic, 1e-12.
    expectNear(fig.k, couplingCoefficient(fig.M, fig.L1, fig.L2), 1e-12, 'k');
    expectNear(fig.Q1, (w * fig.L1) / fig.R1, 1e-12, 'Q1');
    expectNear(fig.etaMax, maxLinkEfficiency(fig.k, fig.Q1, fig.Q2), 1e-12, 'eta');
    const x = fig.k ** 2 * fig.Q1 * fig.Q2;
    expectNear(fig.optimalLoad, fig.R2 * Math.sqrt(1 + x), 1e-12, 'R_L,opt');
    expectNear(fig.inducedVoltage, w * fig.M * 2, 1e-12, 'V2');
    expectNear(fig.resonantVoltageTx, w * fig.L1 * 2, 1e-12, 'V_L1');
    expectNear(1 / (w * w * fig.C2), fig.L2, 1e-12, 'C2 resonates L2');
    for (const [key, value] of Object.entries(fig)) expect(Number.isFinite(value), key).toBe(true);
  });

  it('counts a Tx ferrite backing in L1, M and the Rx inductance at the pose', () => {
    const backed = parseCoil({ ...tx, backing: { mur: 2000, distance: 0.001 } });
    const plain = linkFigures(tx, rx, { z: 0.005 }, { frequency: 150e3 });
    const pair = preparePair(backed, rx);
    const withPlate = linkFigures(backed, rx, { z: 0.005 }, { frequency: 150e3, pair });
    // A permeable plate behind the Tx raises L1, M and the Rx inductance near it (images of
    // weight (mur − 1)/(mur + 1) > 0; Jackson problem 5.17).
    expect(withPlate.L1).toBeGreaterThan(plain.L1);
    expect(withPlate.M).toBeGreaterThan(plain.M);
    expect(withPlate.L2).toBeGreaterThan(plain.L2);
    expect(withPlate.L2).toBe(pair.L2At({ z: 0.005 }));
  });

  it('rejects a missing frequency and intersecting coils', () => {
    expect(() => linkFigures(tx, rx, { z: 0.005 }, { frequency: 0 })).toThrow(
      /frequency: must be a finite number > 0/,
    );
    expect(() => linkFigures(tx, tx, { z: 0 }, { frequency: 1e5 })).toThrow(/intersect/);
  });
});
