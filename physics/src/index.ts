/**
 * Couplet physics: the library's public surface. The rest of Couplet should import from here:
 * the files behind it may move. SI units throughout (metres, henries, ohms, hertz; pose angles in
 * degrees). Bad input is a `RangeError` that names the parameter and its allowed range.
 *
 * Left out on purpose: the kernels' building blocks (quadrature rules, Chebyshev tables, the
 * Bessel node sets, packed segments), which serve the evaluators below and may change with them.
 */

export { ENGINE_VERSION } from './engine/engine-version';

// Coil descriptions: schemas, validation, filaments.
export {
  backingSchema,
  circularSpiralCoilSchema,
  coilSchema,
  conductorSchema,
  litzConductorSchema,
  pathCoilSchema,
  rectangularSpiralCoilSchema,
  ringCoilSchema,
  ringsCoilSchema,
  roundConductorSchema,
  solenoidCoilSchema,
  traceConductorSchema,
} from './coils/coil-schema';
export type {
  Backing,
  CircularSpiralCoil,
  Coil,
  Conductor,
  PathCoil,
  RectangularSpiralCoil,
  RingCoil,
  RingsCoil,
  SolenoidCoil,
} from './coils/coil-schema';
export { COIL_LIMITS } from './coils/coil-limits';
export { parseCoil } from './coils/parse-coil';
export { coilGeometryIssues, type GeometryIssue } from './coils/coil-geometry-issues';
export { coilFilaments } from './coils/coil-filaments';
export { conductorSection, type ConductorSection } from './coils/conductor-section';
export { ferriteImages } from './coils/ferrite-images';
export { windingLength } from './coils/winding-length';
export type { FilamentSet, PathFilament, RingFilament, Vec3 } from './filaments';

// Poses: schema, validation, placement, clearance.
export { poseSchema, type Pose, type PoseInput } from './pose/pose-schema';
export { parsePose } from './pose/parse-pose';
export { poseRotation, type Mat3 } from './pose/pose-rotation';
export { transformFilaments } from './pose/transform-filaments';
export { checkClearance } from './pose/check-clearance';

// Inductance of coils and pairs.
export { selfInductance, type SelfInductanceOptions } from './inductance/self-inductance';
export { mutualInductance } from './inductance/mutual-inductance';
export { preparePair, type PreparedPair, type PreparePairOptions } from './inductance/prepare-pair';

// Kernels a user may call directly: closed forms and references for filament pairs.
export { MU0 } from './kernels/mu0';
export { maxwellCoaxial } from './kernels/maxwell-coaxial';
export { ringRingMutual, type RingRingOptions } from './kernels/ring-ring-mutual';
export { groverParallel } from './kernels/grover-parallel';
export { conwayBessel } from './kernels/conway-bessel';
export { neumannRingPair } from './kernels/neumann-ring-pair';
export { ringSelf, type RingSelfOptions } from './kernels/ring-self';
export { ringSelfGmd } from './kernels/ring-self-gmd';
export { ringVectorPotential } from './kernels/ring-vector-potential';
export { segmentSegmentMutual } from './kernels/segment-segment-mutual';
export { segmentRingMutual } from './kernels/segment-ring-mutual';
export { segmentSelf } from './kernels/segment-self';
export { pathPathMutual } from './kernels/path-path-mutual';
export { pathRingMutual } from './kernels/path-ring-mutual';
export { polylineSelf, type PolylineSelfOptions } from './kernels/polyline-self';
export { roundWireGmd } from './kernels/round-wire-gmd';
export { rectangularGmd } from './kernels/rectangular-gmd';

// Conductors: resistivity, skin effect, resistance.
export {
  COPPER_REFERENCE_TEMPERATURE,
  COPPER_RESISTIVITY_20C,
  COPPER_TEMPERATURE_COEFFICIENT,
  copperResistivity,
} from './conductors/copper-resistivity';
export { skinDepth } from './conductors/skin-depth';
export { conductorArea } from './conductors/conductor-area';
export { dcResistance } from './conductors/dc-resistance';
export { acResistanceFactor } from './conductors/ac-resistance-factor';
export { roundWireAcFactor } from './conductors/round-wire-ac-factor';
export { traceAcFactor } from './conductors/trace-ac-factor';
export {
  coilResistance,
  type CoilResistance,
  type CoilResistanceOptions,
} from './conductors/coil-resistance';

// Link figures: one coil, one pair, and the single formulas behind them.
export { coilFigures, type CoilFigureOptions, type CoilFigures } from './link/coil-figures';
export { linkFigures, type LinkFigureOptions, type LinkFigures } from './link/link-figures';
export { qualityFactor } from './link/quality-factor';
export { COUPLING_TOLERANCE, couplingCoefficient } from './link/coupling-coefficient';
export { couplingForEfficiency } from './link/coupling-for-efficiency';
export { maxLinkEfficiency } from './link/max-link-efficiency';
export { optimalLoad } from './link/optimal-load';
export { inducedVoltage } from './link/induced-voltage';
export { resonantVoltage } from './link/resonant-voltage';
export { seriesCompensation } from './link/series-compensation';
export {
  compensationCapacitors,
  type CompensationCapacitors,
  type CompensationTopology,
} from './link/compensation-capacitors';
export { storedEnergy } from './link/stored-energy';
export { timeConstant } from './link/time-constant';

// Sweeps over poses.
export {
  MAX_SWEEP_POSES,
  sweepSpecSchema,
  type SweepAxisSpec,
  type SweepSpec,
} from './sweep/sweep-spec-schema';
export { parseSweepSpec } from './sweep/parse-sweep-spec';
export { sweepAxes, type SweepAxes } from './sweep/sweep-axes';
export { sweepGrid, type SweepGrid } from './sweep/sweep-grid';
export { sweepPoseAt } from './sweep/sweep-pose-at';
export type { SweepPose } from './sweep/sweep-pose';
export type { SweepPair } from './sweep/sweep-pair';
export {
  DEFAULT_SWEEP_CHUNK,
  sweepChunks,
  type SweepChunk,
  type SweepChunkOptions,
} from './sweep/sweep-chunks';
export { runSweep, type RunSweepOptions, type SweepResult } from './sweep/run-sweep';
export { SweepCancelledError } from './sweep/sweep-cancelled-error';

// Misalignment tolerance envelope of a coupling map.
export { toleranceEnvelope, type ToleranceEnvelope } from './envelope/tolerance-envelope';
export type { CouplingField } from './envelope/coupling-field';
