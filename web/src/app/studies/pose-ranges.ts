import type { Bounds } from './coil-bounds';

/** A slider's range and step in SI units (m or degrees). */
export interface PoseRange {
  min: number;
  max: number;
  step: number;
}

export interface PoseRanges {
  z: PoseRange;
  x: PoseRange;
  y: PoseRange;
  tiltX: PoseRange;
  tiltY: PoseRange;
}

/** The contract allows offsets and gaps up to 1 m and tilts of ±90°. */
const CONTRACT_REACH = 1;
/** Below this, a slider over a micro coil would still be usable in 0.01 mm steps. */
const SMALLEST_REACH = 0.002;

/** 1, 2 or 5 times a power of ten: the step nearest to range/divisions that reads well. */
export function niceStep(range: number, divisions = 500): number {
  const raw = range / divisions;
  const power = 10 ** Math.floor(Math.log10(raw));
  const mantissa = raw / power;
  return Number(
    ((mantissa < 1.5 ? 1 : mantissa < 3.5 ? 2 : mantissa < 7.5 ? 5 : 10) * power).toPrecision(12),
  );
}

/**
 * Slider ranges for the pose controls, sized to the pair: lateral offsets ±D and a gap up to
 * 1.5·D, with D the larger coil's widest outer size; tilts ±90° in 0.5° steps. A pose outside the
 * sliders can still be typed into the fields (up to the contract's limits).
 *
 * @param tx Tx conductor bounds in its frame, m
 * @param rx Rx conductor bounds in its frame, m
 * @returns the ranges (m, degrees)
 */
export function poseRanges(tx: Bounds, rx: Bounds): PoseRanges {
  const width = (b: Bounds) => Math.max(b.max.x - b.min.x, b.max.y - b.min.y);
  const D = Math.max(width(tx), width(rx));
  const reach = Math.min(CONTRACT_REACH, Math.max(SMALLEST_REACH, D));
  const gap = Math.min(CONTRACT_REACH, Math.max(SMALLEST_REACH, 1.5 * D));
  // Ends on whole steps, so every slider position reads as a round number (12.4 mm, not 12.3417).
  const aligned = (extent: number, step: number) =>
    Math.min(CONTRACT_REACH, Number((Math.ceil(extent / step - 1e-9) * step).toPrecision(12)));
  const offsetStep = niceStep(2 * reach);
  const gapStep = niceStep(gap);
  const offsetMax = aligned(reach, offsetStep);
  const offset = { min: -offsetMax, max: offsetMax, step: offsetStep };
  const tilt = { min: -90, max: 90, step: 0.5 };
  return {
    z: { min: 0, max: aligned(gap, gapStep), step: gapStep },
    x: offset,
    y: offset,
    tiltX: tilt,
    tiltY: tilt,
  };
}
