// The worker's engine with the real physics: its figures for two coaxial rings checked against
// Maxwell's formula evaluated with the registry's @stdlib elliptic integrals (J. C. Maxwell,
// Treatise, 1873, art. 701), the textbook resonance and tank-voltage relations, and the SP
// primary of C.-S. Wang, G. A. Covic, O. H. Stielau, IEEE Trans. Ind. Electron. 51(1), 2004.
import { maxwellStdlib } from '../../../../physics/src/testing/maxwell-stdlib';
import { LiveLinkEngine } from './live-link-engine';
import type { LiveLinkPoseRequest, LiveLinkResponse } from './live-link-messages';

const tx = { kind: 'ring', radius: 0.025, wireRadius: 5e-4 } as const;
const rx = { kind: 'ring', radius: 0.018, wireRadius: 4e-4 } as const;
const f = 140e3;
const w = 2 * Math.PI * f;

function pose(
  engine: LiveLinkEngine,
  changes: Partial<LiveLinkPoseRequest> = {},
): LiveLinkResponse {
  return engine.handle({
    type: 'pose',
    id: 1,
    setupId: 1,
    pose: { x: 0, y: 0, z: 0.006, tiltX: 0, tiltY: 0 },
    frequency: f,
    current: 2,
    compensation: 'series-series',
    ...changes,
  });
}

function figuresOf(response: LiveLinkResponse) {
  if (response.type !== 'figures')
    throw new Error(`expected figures, got ${JSON.stringify(response)}`);
  return response.figures;
}

/** |a − b| ≤ tol·|b|, with a message that prints both. */
function near(a: number, b: number, tol: number, what: string): void {
  expect(Math.abs(a - b) <= tol * Math.abs(b), `${what}: ${a} vs ${b} (tol ${tol})`).toBe(true);
}

describe('LiveLinkEngine', () => {
  it('prepares a pair and returns its filaments', () => {
    const engine = new LiveLinkEngine();
    const ready = engine.handle({ type: 'setup', setupId: 1, tx, rx });
    expect(ready.type).toBe('ready');
    if (ready.type !== 'ready') return;
    expect(ready.tx.rings[0].radius).toBe(0.025);
    expect(ready.rx.rings[0].radius).toBe(0.018);
    expect(ready.prepareMs).toBeGreaterThanOrEqual(0);
  });

  it('gives two coaxial rings Maxwell’s M and the Rosa–Grover k (stdlib K and E)', () => {
    const engine = new LiveLinkEngine();
    engine.handle({ type: 'setup', setupId: 1, tx, rx });
    const fig = figuresOf(pose(engine));
    // k² ≈ 0.97 at 6 mm, where the textbook form loses at most ~2 of 16 digits: 1e-12.
    const M = maxwellStdlib(0.025, 0.018, 0.006);
    near(fig.M, M, 1e-12, 'M at 6 mm');
    // Rosa & Grover, Bull. Bureau of Standards 8, 1912 (from memory): L = mu0 R (ln(8R/a) − 7/4).
    const ringL = (R: number, a: number) => 4e-7 * Math.PI * R * (Math.log((8 * R) / a) - 1.75);
    near(fig.k, M / Math.sqrt(ringL(0.025, 5e-4) * ringL(0.018, 4e-4)), 1e-12, 'k at 6 mm');
    // Turning the Rx over reverses the coupling.
    near(
      figuresOf(pose(engine, { pose: { x: 0, y: 0, z: 0.006, tiltX: 180, tiltY: 0 } })).k,
      -fig.k,
      1e-12,
      'k flipped',
    );
  });

  it('gives the textbook voltages and series–series capacitors', () => {
    const engine = new LiveLinkEngine();
    engine.handle({ type: 'setup', setupId: 1, tx, rx });
    const fig = figuresOf(pose(engine));
    // V2 = ωM·I1 and V_L1 = ωL1·I1 (textbook); C = 1/(ω²L) resonates each side at f.
    near(fig.inducedVoltage, w * fig.M * 2, 1e-12, 'V2');
    near(fig.resonantVoltageTx, w * fig.L1 * 2, 1e-12, 'V_L1');
    near(w * w * fig.C1 * fig.L1, 1, 1e-12, 'Tx tank');
    near(w * w * fig.C2 * fig.L2, 1, 1e-12, 'Rx tank');
    expect(fig.tx.Q).toBeCloseTo(fig.Q1, 10);
  });

  it('tunes the Tx to its leakage for a parallel Rx: ω²C1(L1 − M²/L2) = 1 (Wang et al. 2004)', () => {
    const engine = new LiveLinkEngine();
    engine.handle({ type: 'setup', setupId: 1, tx, rx });
    const fig = figuresOf(pose(engine, { compensation: 'series-parallel' }));
    near(w * w * fig.C1 * (fig.L1 - (fig.M * fig.M) / fig.L2), 1, 1e-12, 'SP primary');
    near(w * w * fig.C2 * fig.L2, 1, 1e-12, 'SP secondary');
    expect(fig.compensation).toBe('series-parallel');
  });

  it('reports a pose where the coils intersect, and an Rx backing it cannot model', () => {
    const engine = new LiveLinkEngine();
    engine.handle({ type: 'setup', setupId: 1, tx, rx: tx });
    const clash = pose(engine, { pose: { x: 0, y: 0, z: 0, tiltX: 0, tiltY: 0 } });
    expect(clash.type).toBe('error');
    expect(clash.type === 'error' && clash.id).toBe(1);

    const backed = engine.handle({
      type: 'setup',
      setupId: 2,
      tx,
      rx: { ...rx, backing: { mur: 2000, distance: 0.001 } },
    });
    expect(backed).toMatchObject({ type: 'error', id: null, setupId: 2 });
    expect(backed.type === 'error' && backed.message).toMatch(/rx\.backing/);
    // A pose for a pair that did not prepare is refused, not computed on the old pair.
    expect(pose(engine, { setupId: 2 }).type).toBe('error');
  });
});
