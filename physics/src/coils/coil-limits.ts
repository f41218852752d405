/**
 * Allowed ranges of every coil input, SI units (metres unless stated). They keep numbers finite,
 * physical and within what the filament models are meant for; they are not design advice.
 * A coil between 0.1 mm and 10 m covers an implant's micro coil and a bus charging pad.
 */
export const COIL_LIMITS = {
  /** Radii, diameters, widths, heights and solenoid lengths of a winding. */
  coilSize: { min: 1e-4, max: 10 },
  /** Conductor sizes: wire and Litz diameters, trace width and thickness, wire radii. */
  conductorSize: { min: 1e-6, max: 0.1 },
  /** Distance between neighbouring turns, centre to centre. */
  pitch: { min: 1e-6, max: 10 },
  /** Corner radius of a rectangular spiral's outer turn; 0 means sharp corners. */
  cornerRadius: { min: 0, max: 10 },
  /** Distance between neighbouring layers, centre to centre. */
  layerSpacing: { min: 1e-6, max: 1 },
  /** Coordinates of explicit rings and path points in the coil's frame. */
  position: { min: -10, max: 10 },
  /** Turns per layer; fractional allowed. */
  turns: { min: 0, max: 1000 },
  /** Layers of a winding (integer). */
  layers: { min: 1, max: 100 },
  /** Strands of a Litz bundle (integer). */
  strands: { min: 1, max: 100_000 },
  /** Relative permeability of a ferrite backing. */
  mur: { min: 1, max: 1e5 },
  /** Distance from the lowest layer's centre plane to the ferrite surface. */
  backingDistance: { min: 1e-6, max: 10 },
  /** Entries of a `rings` coil: enough for 1000 turns in 5 layers. */
  ringCount: { min: 1, max: 5000 },
  /** Points of a `path` coil: the self-overlap check is quadratic in this count. */
  pointCount: { min: 2, max: 5000 },
  /** Name of a coil, characters. */
  nameLength: { min: 1, max: 200 },
} as const;

/**
 * Packing factor of a Litz bundle (copper area / bundle area) used when `bundleDiameter` is
 * missing: 0.6 (common practice, no source; real bundles span about 0.5–0.75).
 */
export const LITZ_PACKING_FACTOR = 0.6;

/**
 * Geometric mean distance of a rectangle w × t from itself, ≈ 0.2235 (w + t) — Rosa & Grover,
 * Bull. Bureau of Standards 8 (1912); Grover, Inductance Calculations (1946) (from memory;
 * exact for a square (0.44705 a) and for a thin strip (e^(-3/2) w = 0.2231 w) to 0.2 %).
 */
export const RECTANGLE_GMD_FACTOR = 0.2235;
