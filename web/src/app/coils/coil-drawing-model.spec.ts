import { coilDrawing, niceLength } from './coil-drawing-model';

describe('coilDrawing', () => {
  it('draws a ring to scale in millimetres with the wire as the stroke', () => {
    const drawing = coilDrawing({ kind: 'ring', radius: 0.02, wireRadius: 0.0005 });
    expect(drawing.top.circles).toEqual([{ cx: 0, cy: 0, r: 20 }]);
    expect(drawing.top.stroke).toBe(1);
    expect(drawing.side).toBeNull();
    // A 40 mm coil: the bar is the largest 1-2-5 step not above a quarter of it.
    expect(drawing.top.bar).toMatchObject({ length: 10, label: '10 mm' });
  });

  it('draws each layer of a two-layer spiral once from above, and shows the stack aside', () => {
    const drawing = coilDrawing({
      kind: 'circular-spiral',
      turns: 5,
      innerDiameter: 0.02,
      outerDiameter: 0.04,
      layers: 2,
      layerSpacing: 0.0016,
      conductor: { type: 'round', diameter: 0.0008 },
    });
    expect(drawing.top.circles.map((c) => c.r)).toEqual([10, 12.5, 15, 17.5, 20]);
    expect(drawing.side?.sections).toHaveLength(20);
    const heights = new Set(drawing.side?.sections.map((c) => c.cy));
    expect([...heights].sort()).toEqual([-1.6, 0]);
  });

  it('draws a solenoid from the side with its cross-sections and a rectangular spiral as paths', () => {
    const solenoid = coilDrawing({
      kind: 'solenoid',
      radius: 0.005,
      length: 0.01,
      turns: 5,
      conductor: { type: 'round', diameter: 0.0005 },
    });
    expect(solenoid.side?.sections).toHaveLength(10);
    expect(solenoid.side?.sections[0].r).toBeCloseTo(0.25, 12);

    const rectangle = coilDrawing({
      kind: 'rectangular-spiral',
      outerWidth: 0.03,
      outerHeight: 0.02,
      cornerRadius: 0,
      pitch: 0.001,
      turns: 3,
      conductor: { type: 'trace', width: 0.0005, thickness: 35e-6 },
    });
    expect(rectangle.top.paths).toHaveLength(3);
    expect(rectangle.top.paths[0]).toMatch(/^M.*Z$/);
    expect(rectangle.top.stroke).toBe(0.5);
  });

  it('shades the ferrite backing in the views', () => {
    const drawing = coilDrawing({
      kind: 'ring',
      radius: 0.02,
      wireRadius: 0.0005,
      backing: { mur: 1000, distance: 0.001 },
    });
    expect(drawing.top.ferrite).not.toBeNull();
  });

  it('picks scale bars of 1, 2 or 5 times a power of ten', () => {
    expect(niceLength(0.9)).toBeCloseTo(0.5, 12);
    expect(niceLength(3)).toBe(2);
    expect(niceLength(10)).toBe(10);
    expect(niceLength(74)).toBe(50);
  });
});
