import { coilRows } from './coil-rows';
import { coilSummary } from './coil-summary';
import { dockTx, handsetRx, libraryCoils, probeSolenoid } from './testing/coil-test-data';

describe('coilRows', () => {
  const none = { text: '', kind: null };
  const names = (rows: ReturnType<typeof coilRows>) => rows.map((row) => row.coil.name);

  it('puts the newest change first unless a column is chosen', () => {
    expect(names(coilRows(libraryCoils, none, { active: '', direction: '' }))).toEqual([
      dockTx.name,
      handsetRx.name,
      probeSolenoid.name,
    ]);
  });

  it('filters by any part of the name or description, in any case, and by kind', () => {
    expect(
      names(coilRows(libraryCoils, { text: 'FLEX', kind: null }, { active: '', direction: '' })),
    ).toEqual([handsetRx.name]);
    expect(
      names(
        coilRows(
          libraryCoils,
          { text: 'under the dock', kind: null },
          {
            active: '',
            direction: '',
          },
        ),
      ),
    ).toEqual([dockTx.name]);
    expect(
      names(coilRows(libraryCoils, { text: '', kind: 'solenoid' }, { active: '', direction: '' })),
    ).toEqual([probeSolenoid.name]);
  });

  it('sorts numbers as numbers and keeps missing values last both ways', () => {
    const up = coilRows(libraryCoils, none, { active: 'Q', direction: 'asc' });
    const down = coilRows(libraryCoils, none, { active: 'Q', direction: 'desc' });
    expect(names(up)).toEqual([probeSolenoid.name, dockTx.name, handsetRx.name]);
    expect(names(down)).toEqual([dockTx.name, probeSolenoid.name, handsetRx.name]);
    expect(names(coilRows(libraryCoils, none, { active: 'turns', direction: 'asc' }))).toEqual([
      handsetRx.name,
      dockTx.name,
      probeSolenoid.name,
    ]);
  });
});

describe('coilSummary', () => {
  it('names a coil by its key size, turns and conductor', () => {
    expect(coilSummary(dockTx.spec)).toEqual({
      size: 'Ø 43.0 mm',
      sizeValue: 0.043,
      turns: '10',
      turnsValue: 10,
      conductor: 'Litz 105 × 80.0 µm',
    });
    expect(
      coilSummary({
        kind: 'circular-spiral',
        turns: 6,
        innerRadius: 0.01,
        pitch: 0.002,
        layers: 2,
        layerSpacing: 0.0016,
        conductor: { type: 'round', diameter: 0.001 },
      }),
    ).toMatchObject({ size: 'Ø 40.0 mm', turns: '6 × 2 layers', turnsValue: 12 });
    expect(
      coilSummary({
        kind: 'path',
        points: [
          { x: 0, y: 0, z: 0 },
          { x: 1.2, y: 0.4, z: 0 },
        ],
        conductor: { type: 'round', diameter: 0.001 },
      }).size,
    ).toBe('1.20 m × 400 mm');
  });
});
