import { createCoilForm, ringRow } from './coil-form';
import { coilFormIssues } from './coil-form-issues';
import { coilIssueControl } from './coil-issue-control';
import { coilSpecFromForm } from './coil-spec-from-form';
import { fillCoilForm } from './fill-coil-form';
import { dockTx, handsetRx, probeSolenoid } from './testing/coil-test-data';

describe('coilSpecFromForm and coilFormIssues', () => {
  const form = () => createCoilForm();

  it('builds the engine spec of the chosen kind only, conductor and backing included', () => {
    const f = form();
    f.patchValue({
      kind: 'circular-spiral',
      turns: 8,
      sizing: 'pitch',
      innerRadius: 0.01,
      pitch: 0.0012,
      innerDiameter: 0.02, // of the other sizing: left out
      outerWidth: 0.05, // of another kind: left out
      layers: 2,
      layerSpacing: 0.0016,
      spiralModel: 'spiral',
      conductorType: 'round',
      wireDiameter: 0.0008,
      hasBacking: true,
      mur: 1500,
      backingDistance: 0.001,
    });
    expect(coilSpecFromForm(f.getRawValue())).toEqual({
      spec: {
        kind: 'circular-spiral',
        turns: 8,
        innerRadius: 0.01,
        pitch: 0.0012,
        layers: 2,
        layerSpacing: 0.0016,
        model: 'spiral',
        conductor: { type: 'round', diameter: 0.0008 },
        backing: { mur: 1500, distance: 0.001 },
      },
      problems: [],
    });
  });

  it('leaves the layer spacing out for a single layer and empty corners sharp', () => {
    const f = form();
    f.patchValue({
      kind: 'rectangular-spiral',
      outerWidth: 0.03,
      outerHeight: 0.02,
      pitch: 0.001,
      turns: 4,
      layers: 1,
      layerSpacing: 0.5,
      conductorType: 'trace',
      traceWidth: 0.0005,
      traceThickness: 35e-6,
    });
    const { spec } = coilSpecFromForm(f.getRawValue());
    expect(spec['cornerRadius']).toBe(0);
    expect(spec['layerSpacing']).toBeUndefined();
    expect(coilFormIssues(f.getRawValue()).coil).not.toBeNull();
  });

  it('maps the engine’s cross-field issues to the controls that show them', () => {
    const f = form();
    f.patchValue({
      kind: 'circular-spiral',
      turns: 10,
      innerDiameter: 0.04,
      outerDiameter: 0.03,
      conductorType: 'round',
      wireDiameter: 0.0005,
    });
    const check = coilFormIssues(f.getRawValue());
    expect(check.coil).toBeNull();
    expect(check.issues).toEqual([
      {
        control: 'outerDiameter',
        message: '30 mm is not above innerDiameter 40 mm; allowed: outerDiameter > innerDiameter',
        missing: false,
      },
    ]);
  });

  it('says “Required” with the allowed range for a missing value', () => {
    const f = form();
    f.patchValue({ kind: 'solenoid', radius: 0.005, turns: 10, wireDiameter: 0.0005 });
    const check = coilFormIssues(f.getRawValue());
    expect(check.issues).toEqual([
      { control: 'length', message: 'Required (allowed: ≥ 100 µm and ≤ 10 m)', missing: true },
    ]);
  });

  it('reports unreadable pasted points at the points field, once', () => {
    const f = form();
    f.patchValue({ kind: 'path', points: '0 0 0\n10 zero 0', wireDiameter: 0.0005 });
    const check = coilFormIssues(f.getRawValue());
    expect(check.issues).toEqual([
      {
        control: 'points',
        message: 'Line 2: “10 zero 0” is not 2 or 3 numbers (x y z, mm)',
        missing: false,
      },
    ]);
  });

  it('points a ring-list issue at the ring’s own radius field', () => {
    const f = form();
    f.patchValue({ kind: 'rings', wireRadius: 0.0005 });
    f.controls.rings.push(ringRow(0.01, 0));
    f.controls.rings.push(ringRow(0.0004, 0));
    const check = coilFormIssues(f.getRawValue());
    expect(check.issues.map((issue) => issue.control)).toEqual(['rings.1.r']);
  });

  it.each([dockTx, handsetRx, probeSolenoid])(
    'fills the form from a stored $kind and builds the same spec back',
    (coil) => {
      const f = form();
      fillCoilForm(f, coil);
      expect(f.pristine).toBe(true);
      const check = coilFormIssues(f.getRawValue());
      expect(check.issues).toEqual([]);
      // The form always names the solenoid's model; 'rings' is the engine's default.
      expect(check.coil).toEqual(
        coil.spec.kind === 'solenoid' ? { model: 'rings', ...coil.spec } : coil.spec,
      );
    },
  );
});

describe('coilIssueControl', () => {
  it.each([
    [['pitch'], 'pitch'],
    [['conductor', 'diameter'], 'wireDiameter'],
    [['conductor', 'width'], 'traceWidth'],
    [['conductor', 'bundleDiameter'], 'bundleDiameter'],
    [['backing', 'distance'], 'backingDistance'],
    [['rings', 3, 'z'], 'rings.3.z'],
    [['rings', 2], 'rings.2.r'],
    [['rings'], 'rings'],
    [['points', 7], 'points'],
    [['model'], 'spiralModel'],
    [[], null],
  ] as [PropertyKey[], string | null][])('maps %j to %s', (path, control) => {
    expect(coilIssueControl('circular-spiral', path)).toBe(control);
  });

  it('maps a solenoid’s model to its own control', () => {
    expect(coilIssueControl('solenoid', ['model'])).toBe('solenoidModel');
  });
});
