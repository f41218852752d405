/**
 * What each field of the coil editor means, with a typical range, under the field. The ranges
 * are the trade's usual values for orientation (common practice, no source) unless a source is
 * named; they are not limits (the engine's limits are in COIL_LIMITS).
 */
export const coilFieldHints = {
  name: 'Shown in the library and in studies; 1 to 80 characters',
  operatingFrequencyHz:
    'R and Q are given here. Qi-type chargers about 110–205 kHz; vehicle pads 85 kHz ' +
    '(SAE J2954); resonant chargers 6.78 MHz. Empty: DC figures only',
  ratedCurrentA: 'For the stored energy and coil voltage; phones 1–3 A, vehicle pads tens of A',
  turns: 'Turns per layer; fractions allowed. Phone pads about 5–20',
  innerDiameter: 'Centre line of the innermost turn; often 30–50 % of the outer diameter',
  outerDiameter: 'Centre line of the outermost turn; phone pads 30–50 mm, vehicle pads 300–800 mm',
  innerRadius: 'Centre-line radius of the innermost turn',
  pitch: 'Centre to centre of neighbouring turns; at least the conductor width',
  outerWidth: 'Outer turn along x, centre line; turns step inward',
  outerHeight: 'Outer turn along y, centre line',
  cornerRadius: 'Of the outer turn; 0 (or empty) for sharp corners, at most half the shorter side',
  solenoidRadius: 'Centre-line radius of the turns of the inner layer',
  solenoidLength: 'Winding length along the axis; at least turns × conductor width',
  ringRadius: 'Centre-line radius of the turn',
  wireRadius: 'Half the copper diameter',
  layers: 'Layers in series, aiding; 1 for a single-layer winding',
  layerSpacing:
    'Centre to centre of neighbouring layers; at least the conductor thickness (on a PCB about ' +
    'the dielectric between copper layers, 0.1–1.6 mm)',
  wireDiameter: 'Copper diameter without enamel; about 0.2–2 mm for small pads',
  strands: 'Strands in the bundle; about 50–1000 for chargers',
  strandDiameter: 'Copper of one strand; about 0.05–0.2 mm (44–32 AWG)',
  bundleDiameter: 'Outer size of the bundle; empty: estimated with a packing factor of 0.6',
  traceWidth: 'Copper width across the turns',
  traceThickness: 'Copper thickness: 35 µm for 1 oz/ft², 70 µm for 2 oz/ft²',
  mur: 'Relative permeability; ferrite sheets about 100–3000 (above ~100 the image model barely changes)',
  backingDistance:
    "From the lowest layer's centre plane to the ferrite surface; at least half the conductor " +
    'thickness; phones often 0.5–2 mm',
  ringR: 'Centre-line radius',
  ringZ: 'Height along the axis',
} as const;
