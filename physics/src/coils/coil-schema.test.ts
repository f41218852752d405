// Validation of coil JSON. The references here are the documented coil rules and plain geometry
// (turns overlap when centre lines are closer than the conductor width), no outside numbers.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { coilSchema } from './coil-schema';
import { parseCoil } from './parse-coil';

const round = { type: 'round', diameter: 0.0008 };
const good: Record<string, unknown> = {
  ring: { kind: 'ring', radius: 0.02, wireRadius: 0.0005 },
  rings: {
    kind: 'rings',
    wireRadius: 0.0004,
    rings: [
      { r: 0.01, z: 0 },
      { r: 0.011, z: 0 },
    ],
  },
  spiralByDiameter: {
    kind: 'circular-spiral',
    name: 'Tx pad A',
    turns: 20,
    innerDiameter: 0.01,
    outerDiameter: 0.049,
    conductor: { type: 'litz', strands: 60, strandDiameter: 0.00008 },
    backing: { mur: 2000, distance: 0.0008 },
  },
  spiralByPitch: {
    kind: 'circular-spiral',
    turns: 7.5,
    innerRadius: 0.004,
    pitch: 0.0006,
    layers: 2,
    layerSpacing: 0.0016,
    model: 'spiral',
    conductor: { type: 'trace', width: 0.0004, thickness: 0.000035 },
  },
  rectangular: {
    kind: 'rectangular-spiral',
    outerWidth: 0.07,
    outerHeight: 0.05,
    cornerRadius: 0.005,
    pitch: 0.0015,
    turns: 15,
    conductor: round,
  },
  solenoid: {
    kind: 'solenoid',
    radius: 0.01,
    length: 0.03,
    turns: 30,
    model: 'helix',
    conductor: round,
  },
  path: {
    kind: 'path',
    closed: true,
    conductor: { type: 'round', diameter: 0.001 },
    points: [
      { x: 0, y: 0, z: 0 },
      { x: 0.03, y: 0, z: 0 },
      { x: 0.03, y: 0.02, z: 0 },
    ],
  },
};

/** Asserts that parseCoil rejects `json` with a RangeError whose message starts with `field`. */
function expectRejected(json: unknown, field: string, mentions?: RegExp): void {
  let message = '';
  try {
    parseCoil(json);
  } catch (error) {
    expect(error, `input ${JSON.stringify(json)}: expected a RangeError`).toBeInstanceOf(
      RangeError,
    );
    message = (error as Error).message;
  }
  expect(message, `input ${JSON.stringify(json)}: expected an error naming ${field}`).toMatch(
    new RegExp(`^${field.replace(/[.[\]]/g, '\\$&')}: `),
  );
  expect(message, `message "${message}" must state what is allowed`).toMatch(/allowed/);
  if (mentions) expect(message).toMatch(mentions);
}

const withField = (name: string, field: string, value: unknown) => ({
  ...(good[name] as object),
  [field]: value,
});

describe('coil schema: good examples (the README examples)', () => {
  for (const [name, json] of Object.entries(good)) {
    it(`accepts ${name}`, () => {
      expect(parseCoil(json)).toEqual(json);
      expect(coilSchema.safeParse(json).success).toBe(true);
    });
  }
});

describe('coil schema: bad numbers name the field and its range', () => {
  const cases: [string, string, string][] = [
    ['ring', 'radius', 'coil.radius'],
    ['ring', 'wireRadius', 'coil.wireRadius'],
    ['rectangular', 'pitch', 'coil.pitch'],
    ['rectangular', 'outerWidth', 'coil.outerWidth'],
    ['solenoid', 'length', 'coil.length'],
    ['spiralByPitch', 'turns', 'coil.turns'],
  ];
  for (const [name, field, path] of cases) {
    for (const value of [0, -0.01, Number.NaN, Number.POSITIVE_INFINITY, 1e6, '5 mm', null]) {
      it(`${name}.${field} = ${String(value)}`, () => {
        expectRejected(withField(name, field, value), path);
      });
    }
  }
  it('names the range in the message', () => {
    expectRejected(withField('ring', 'radius', 0), 'coil.radius', /100 µm and ≤ 10 m/);
    expectRejected(withField('rectangular', 'turns', 1001), 'coil.turns', /> 0 and ≤ 1000/);
  });
  it('rejects fractional layers, zero strands, mur below 1', () => {
    expectRejected(withField('rectangular', 'layers', 1.5), 'coil.layers', /integer/);
    expectRejected(
      withField('spiralByDiameter', 'conductor', {
        type: 'litz',
        strands: 0,
        strandDiameter: 1e-4,
      }),
      'coil.conductor.strands',
    );
    expectRejected(
      withField('spiralByDiameter', 'backing', { mur: 0.5, distance: 0.001 }),
      'coil.backing.mur',
    );
    expectRejected(
      withField('spiralByDiameter', 'backing', { mur: 100, distance: 0 }),
      'coil.backing.distance',
    );
  });
  it('rejects a bad ring entry by index', () => {
    const json = {
      kind: 'rings',
      wireRadius: 0.0004,
      rings: [
        { r: 0.01, z: 0 },
        { r: -1, z: 0 },
      ],
    };
    expectRejected(json, 'coil.rings[1].r');
  });
  it('rejects unknown fields, kinds and conductor types', () => {
    expectRejected(withField('ring', 'radiuss', 0.02), 'coil.radiuss', /radius, wireRadius/);
    expectRejected({ kind: 'toroid', radius: 0.02 }, 'coil.kind', /circular-spiral/);
    expectRejected(
      withField('rectangular', 'conductor', { type: 'wire', diameter: 1e-3 }),
      'coil.conductor.type',
    );
  });
  it('uses the path given by the caller', () => {
    expect(() => parseCoil(withField('ring', 'radius', 0), 'pairs[2].tx')).toThrow(
      /^pairs\[2\]\.tx\.radius: /,
    );
  });
});

describe('coil schema: cross-field rules', () => {
  it('rejects overlapping turns (pitch below the conductor width)', () => {
    expectRejected(
      { ...(good.spiralByPitch as object), pitch: 0.0003 },
      'coil.pitch',
      new RegExp(
        '300 µm is below the conductor width 400 µm \\(turns would overlap\\); ' +
          'allowed: pitch ≥ conductor width',
      ),
    );
    expectRejected(withField('rectangular', 'pitch', 0.0004), 'coil.pitch', /turns would overlap/);
    // 20 turns of 0.8 mm wire need 19 × 0.8 mm = 15.2 mm of radial build; 14 mm is too little.
    expectRejected(
      {
        kind: 'circular-spiral',
        turns: 20,
        innerDiameter: 0.01,
        outerDiameter: 0.038,
        conductor: round,
      },
      'coil.outerDiameter',
      /turns would overlap/,
    );
    expectRejected(withField('solenoid', 'length', 0.02), 'coil.length', /turns would overlap/);
  });
  it('rejects inner ≥ outer', () => {
    const spiral = {
      ...(good.spiralByDiameter as object),
      innerDiameter: 0.05,
      outerDiameter: 0.04,
    };
    expectRejected(spiral, 'coil.outerDiameter', /not above innerDiameter/);
    expectRejected(withField('ring', 'wireRadius', 0.03), 'coil.wireRadius', /wireRadius < radius/);
  });
  it('rejects both and neither spiral forms', () => {
    const both = { ...(good.spiralByDiameter as object), innerRadius: 0.005, pitch: 0.001 };
    expectRejected(both, 'coil.innerRadius', /not both/);
    const neither = { kind: 'circular-spiral', turns: 5, conductor: round };
    expectRejected(
      neither,
      'coil.innerDiameter',
      /either innerDiameter \+ outerDiameter or innerRadius \+ pitch/,
    );
    const half = { kind: 'circular-spiral', turns: 5, innerRadius: 0.005, conductor: round };
    expectRejected(half, 'coil.pitch', /missing/);
  });
  it('rejects a spiral that does not fit and a corner radius above half the side', () => {
    expectRejected(withField('rectangular', 'turns', 20), 'coil.turns', /do not fit/);
    expectRejected(withField('rectangular', 'cornerRadius', 0.026), 'coil.cornerRadius', /half/);
    const tight = {
      kind: 'circular-spiral',
      turns: 3,
      innerRadius: 0.0003,
      pitch: 0.001,
      conductor: round,
    };
    expectRejected(tight, 'coil.innerRadius', /across the axis/);
  });
  it('rejects layers without or below spacing, and a backing cutting the winding', () => {
    expectRejected(withField('rectangular', 'layers', 2), 'coil.layerSpacing', /missing/);
    expectRejected(
      { ...(good.rectangular as object), layers: 2, layerSpacing: 0.0005 },
      'coil.layerSpacing',
      /below the conductor thickness/,
    );
    expectRejected(
      { ...(good.rectangular as object), layers: 100, layerSpacing: 0.9 },
      'coil.layerSpacing',
      /stack/,
    );
    expectRejected(
      withField('spiralByDiameter', 'backing', { mur: 2000, distance: 0.0001 }),
      'coil.backing.distance',
      /inside the winding/,
    );
  });
  it('rejects touching explicit rings and a self-crossing path', () => {
    const rings = {
      kind: 'rings',
      wireRadius: 0.0005,
      rings: [
        { r: 0.01, z: 0 },
        { r: 0.0109, z: 0 },
      ],
    };
    expectRejected(rings, 'coil.rings[1]', /overlap/);
    const bowtie = {
      kind: 'path',
      closed: true,
      conductor: { type: 'round', diameter: 0.001 },
      points: [
        { x: 0, y: 0, z: 0 },
        { x: 0.03, y: 0.03, z: 0 },
        { x: 0.03, y: 0, z: 0 },
        { x: 0, y: 0.03, z: 0 },
      ],
    };
    expectRejected(bowtie, 'coil.points[2]', /overlap itself/);
    const repeated = {
      ...(good.path as object),
      closed: false,
      points: [
        { x: 0, y: 0, z: 0 },
        { x: 0, y: 0, z: 0 },
      ],
    };
    expectRejected(repeated, 'coil.points[1]', /coincides/);
  });
  it('accepts a tight but legal winding: pitch equal to the wire diameter', () => {
    expect(() => parseCoil(withField('rectangular', 'pitch', 0.0008))).not.toThrow();
  });
});

describe('coil schema: properties (fast-check, seed 42)', () => {
  it('a ring with 0 < wireRadius < radius parses; with the radius negated it fails', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 5, noNaN: true }),
        fc.double({ min: 0.01, max: 0.9, noNaN: true }),
        (radius, share) => {
          const json = { kind: 'ring', radius, wireRadius: Math.min(0.1, radius * share) };
          expect(parseCoil(json).kind).toBe('ring');
          expect(() => parseCoil({ ...json, radius: -radius })).toThrow(/^coil\.radius: /);
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
  it('a circular spiral parses exactly when its pitch is at least the wire diameter', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2e-4, max: 2e-3, noNaN: true }),
        fc.double({ min: 2e-4, max: 2e-3, noNaN: true }),
        fc.integer({ min: 2, max: 40 }),
        (pitch, diameter, turns) => {
          const json = {
            kind: 'circular-spiral',
            turns,
            innerRadius: 0.01,
            pitch,
            conductor: { type: 'round', diameter },
          };
          if (pitch >= diameter) expect(parseCoil(json).kind).toBe('circular-spiral');
          else expect(() => parseCoil(json)).toThrow(/^coil\.pitch: .*turns would overlap/);
        },
      ),
      { seed: 42, numRuns: 200 },
    );
  });
});
