import { answerCoilFigures } from './coil-figures-request';

describe('answerCoilFigures', () => {
  it('gives the figures of a valid spec at the operating point', () => {
    const answer = answerCoilFigures({
      id: 7,
      spec: { kind: 'ring', radius: 0.02, wireRadius: 0.0005 },
      frequency: 85e3,
      current: 2,
    });
    if (!('figures' in answer)) throw new Error(answer.error);
    expect(answer.id).toBe(7);
    const f = answer.figures;
    // Stored energy W = ½ L I² and coil voltage ωLI: textbook relations, evaluated here.
    expect(f.storedEnergy).toBeCloseTo(0.5 * f.L * 4, 18);
    expect(f.coilVoltage).toBeCloseTo(2 * Math.PI * 85e3 * f.L * 2, 12);
    // Copper skin depth about 0.23 mm at 85 kHz (textbook; CHECK-VALUES, from memory).
    expect(f.skinDepth).toBeGreaterThan(0.21e-3);
    expect(f.skinDepth).toBeLessThan(0.25e-3);
    expect(f.Q).toBeCloseTo((2 * Math.PI * 85e3 * f.L) / (f.Rac as number), 9);
  });

  it('gives DC figures only without a frequency, per ampere without a current', () => {
    const answer = answerCoilFigures({
      id: 1,
      spec: { kind: 'ring', radius: 0.02, wireRadius: 0.0005 },
      frequency: null,
      current: null,
    });
    if (!('figures' in answer)) throw new Error(answer.error);
    expect(answer.figures.Q).toBeNull();
    expect(answer.figures.coilVoltage).toBeNull();
    expect(answer.figures.current).toBe(1);
  });

  it('answers an invalid spec with the engine’s message', () => {
    expect(
      answerCoilFigures({
        id: 2,
        spec: { kind: 'ring', radius: 0.001, wireRadius: 0.002 },
        frequency: null,
        current: null,
      }),
    ).toEqual({
      id: 2,
      error: expect.stringMatching(/^coil\.wireRadius: 2 mm is not below the radius 1 mm/),
    });
  });
});
