import { sweepDefaults } from './sweep-defaults';
import { maxStoredSweepPoses, sweepRequest, type SweepSetupValue } from './sweep-request';
import { testStudy } from './sweep-test-data';

const nominal = testStudy.nominalPose;

describe('sweepDefaults', () => {
  it('sizes the ranges by the larger coil and centres them on the nominal pose', () => {
    // Tx 40 mm across, Rx 30 mm: ± 20 mm; nominal gap 4 mm.
    const d = sweepDefaults(testStudy);
    expect(d.map).toEqual({
      x: { from: -0.02, to: 0.02, steps: 41 },
      y: { from: -0.02, to: 0.02, steps: 41 },
      gap: 0.004,
    });
    // Half to twice the gap, or the gap plus the half size when that is further (24 mm).
    expect(d.gap.gaps).toEqual({ from: 0.002, to: 0.024, steps: 31 });
    expect(d.tilt).toEqual({ axis: 'tiltX', tilt: { from: -30, to: 30, steps: 31 }, gap: 0.004 });
    expect(d.stack.gaps).toEqual({ from: 0.002, to: 0.006, steps: 5 });

    const offset = sweepDefaults({
      ...testStudy,
      nominalPose: { ...nominal, x: 0.003, y: -0.0015 },
    });
    expect(offset.map.x).toEqual({ from: -0.017, to: 0.023, steps: 41 });
    expect(offset.map.y).toEqual({ from: -0.0215, to: 0.0185, steps: 41 });
  });

  it('takes a rectangular coil’s width and height separately', () => {
    const rect = {
      ...testStudy.txCoil,
      spec: {
        kind: 'rectangular-spiral' as const,
        outerWidth: 0.06,
        outerHeight: 0.02,
        cornerRadius: 0.002,
        pitch: 0.001,
        turns: 5,
        conductor: { type: 'round' as const, diameter: 5e-4 },
      },
    };
    const d = sweepDefaults({ ...testStudy, txCoil: rect });
    expect(d.map.x).toMatchObject({ from: -0.03, to: 0.03 });
    // The Rx (15 mm radius) is the larger in y.
    expect(d.map.y).toMatchObject({ from: -0.015, to: 0.015 });
  });
});

describe('sweepRequest', () => {
  const defaults = (): SweepSetupValue => sweepDefaults(testStudy);

  it('builds each kind as the API’s shape rules ask', () => {
    const value = defaults();
    expect(sweepRequest(value, nominal)).toEqual({
      request: {
        kind: 'xy-map',
        grid: {
          x: { from: -0.02, to: 0.02, steps: 41 },
          y: { from: -0.02, to: 0.02, steps: 41 },
          z: 0.004,
        },
      },
      poses: 1681,
    });
    expect(sweepRequest({ ...value, kind: 'gap' }, nominal)).toEqual({
      request: { kind: 'gap', grid: { z: { from: 0.002, to: 0.024, steps: 31 } } },
      poses: 31,
    });
    const tilted = { ...nominal, x: 0.002, tiltX: 5 };
    expect(
      sweepRequest({ ...value, kind: 'tilt', tilt: { ...value.tilt, axis: 'tiltY' } }, tilted),
    ).toEqual({
      request: {
        kind: 'tilt',
        // The other tilt and the offset stay at the nominal pose.
        grid: { x: 0.002, z: 0.004, tiltY: { from: -30, to: 30, steps: 31 }, tiltX: 5 },
      },
      poses: 31,
    });
    expect(sweepRequest({ ...value, kind: 'xy-stack' }, nominal)).toMatchObject({
      request: { kind: 'xy-stack', grid: { z: { from: 0.002, to: 0.006, steps: 5 } } },
      poses: 31 * 31 * 5,
    });
  });

  it('refuses more poses than a run may store, saying why and how many', () => {
    const value = defaults();
    const big = {
      ...value,
      map: {
        ...value.map,
        x: { ...value.map.x, steps: 501 },
        y: { ...value.map.y, steps: 500 },
      },
    };
    const result = sweepRequest(big, nominal);
    expect(result.poses).toBe(250_500);
    expect('problem' in result && result.problem).toMatch(
      /^250,500 poses is more than one run may store \(250,000\)/,
    );
    // Exactly at the cap is allowed.
    const atCap = { ...big, map: { ...big.map, x: { ...big.map.x, steps: 500 } } };
    expect(sweepRequest(atCap, nominal)).toMatchObject({ poses: maxStoredSweepPoses });
  });

  it('says what is wrong with a range', () => {
    const value = defaults();
    const withX = (x: SweepSetupValue['map']['x']) => ({ ...value, map: { ...value.map, x } });
    const problem = (v: SweepSetupValue) => {
      const r = sweepRequest(v, nominal);
      return 'problem' in r ? r.problem : null;
    };
    expect(problem(withX({ from: null, to: 0.01, steps: 3 }))).toBe(
      'Enter the x range: from, to and steps.',
    );
    expect(problem(withX({ from: 0.01, to: -0.01, steps: 3 }))).toBe(
      'The x range must end above where it starts.',
    );
    expect(problem(withX({ from: -0.01, to: 0.01, steps: 1 }))).toBe(
      'Steps of x: a whole number, at least 2.',
    );
    expect(problem(withX({ from: -0.01, to: 0.01, steps: 2.5 }))).toBe(
      'Steps of x: a whole number, at least 2.',
    );
    expect(problem({ ...value, map: { ...value.map, gap: null } })).toBe('Enter the gap.');
    expect(problem({ ...value, map: { ...value.map, gap: -0.001 } })).toBe(
      'The gap must be at least 0 mm.',
    );
    const stack = { ...value, kind: 'xy-stack' as const };
    expect(
      problem({ ...stack, stack: { ...stack.stack, gaps: { from: 0.002, to: 0.01, steps: 13 } } }),
    ).toBe('Steps of gap: a whole number, 2 to 12.');
  });
});
