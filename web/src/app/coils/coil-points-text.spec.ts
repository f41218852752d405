import { parsePointsText, pointsText } from './coil-points-text';

describe('parsePointsText', () => {
  const points = (text: string) => {
    const result = parsePointsText(text);
    if ('error' in result) throw new Error(result.error);
    return result.points;
  };

  it('reads a table in millimetres, z optional, with a header and any separator', () => {
    const read = points('x y z\n0 0 0\n10,0\n10;10;2\n\n-5\t10\t0');
    expect(read).toHaveLength(4);
    expect(read[1]).toEqual({ x: 0.01, y: 0, z: 0 });
    expect(read[2].z).toBeCloseTo(0.002, 15);
    expect(read[3].x).toBeCloseTo(-0.005, 15);
  });

  it('reads JSON in metres as objects, triples or an object with points', () => {
    expect(points('[{"x": 0.01, "y": 0, "z": 0.001}]')).toEqual([{ x: 0.01, y: 0, z: 0.001 }]);
    expect(points('[[0.01, 0.02]]')).toEqual([{ x: 0.01, y: 0.02, z: 0 }]);
    expect(points('{"points": [[0, 0, 0]], "closed": true}')).toEqual([{ x: 0, y: 0, z: 0 }]);
  });

  it('names the line or entry it cannot read', () => {
    expect(parsePointsText('0 0\n1 2 3 4')).toEqual({
      error: 'Line 2: 4 numbers; expected x y or x y z (mm)',
    });
    expect(parsePointsText('0 0\nx y')).toEqual({
      error: 'Line 2: “x y” is not 2 or 3 numbers (x y z, mm)',
    });
    expect(parsePointsText('[{"x": 0, "y": "a"}]')).toEqual({
      error: 'Point 1: expected numbers x, y and z in metres',
    });
    expect(parsePointsText('[1, 2')).toEqual({
      error: 'Not valid JSON: expected [{"x": …, "y": …, "z": …}, …] in metres',
    });
    expect('error' in parsePointsText('  ')).toBe(true);
  });

  it('writes points back as the table it reads', () => {
    const original = [
      { x: -0.02, y: 0.0125, z: 0 },
      { x: 0.020001, y: -0.0125, z: 0.0016 },
    ];
    const text = pointsText(original);
    expect(text).toBe('-20 12.5 0\n20.001 -12.5 1.6');
    const back = points(text);
    back.forEach((p, i) => {
      expect(p.x).toBeCloseTo(original[i].x, 12);
      expect(p.y).toBeCloseTo(original[i].y, 12);
      expect(p.z).toBeCloseTo(original[i].z, 12);
    });
  });
});
