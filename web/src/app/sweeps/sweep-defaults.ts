import type { StudyResponse } from '../api-types';
import { coilExtent } from './coil-extent';
import type { SweepSetupValue } from './sweep-request';

/** Lengths of the defaults are rounded to 0.1 mm: a range a person would type. */
const lengthStep = 1e-4;
const roundLength = (m: number) => Number((Math.round(m / lengthStep) * lengthStep).toFixed(4));

/**
 * The sweep set-up a study starts from, sized by its coils and centred on its nominal pose.
 *
 * Method (common practice, no source): lateral offsets span ± the larger coil's half size about
 * the nominal offset, by which the coupling of a pair has fallen far below its aligned value;
 * 41 steps (odd, so a symmetric range hits the nominal point) give a 41 × 41 map. The gap sweep
 * runs from half the nominal gap to twice it, or to the nominal gap plus the larger half size
 * when that is further; tilts run ±30° in 2° steps at the nominal gap; a stack holds five
 * 31 × 31 maps from half to one and a half times the nominal gap.
 *
 * @param study the study (its coils and nominal pose)
 * @returns the form's starting value (m, degrees)
 */
export function sweepDefaults(study: StudyResponse): SweepSetupValue {
  const tx = coilExtent(study.txCoil.spec);
  const rx = coilExtent(study.rxCoil.spec);
  // A coil too small to round (below 0.05 mm) still gets a map 1 mm across.
  const halfX = roundLength(Math.max(tx.halfX, rx.halfX)) || 5e-4;
  const halfY = roundLength(Math.max(tx.halfY, rx.halfY)) || 5e-4;
  const { x, y, z } = study.nominalPose;
  const gap = roundLength(z);
  const around = (centre: number, half: number, steps: number) => ({
    from: roundLength(centre - half),
    to: roundLength(centre + half),
    steps,
  });
  const span = (from: number, to: number, steps: number) => {
    const low = roundLength(from);
    const high = roundLength(to);
    // A nominal gap of 0 would give an empty range; 1 mm keeps it a range.
    return { from: low, to: high > low ? high : low + 1e-3, steps };
  };
  return {
    kind: 'xy-map',
    map: { x: around(x, halfX, 41), y: around(y, halfY, 41), gap },
    gap: { gaps: span(z / 2, Math.max(2 * z, z + Math.max(halfX, halfY)), 31) },
    tilt: { axis: 'tiltX', tilt: { from: -30, to: 30, steps: 31 }, gap },
    stack: { x: around(x, halfX, 31), y: around(y, halfY, 31), gaps: span(z / 2, 1.5 * z, 5) },
  };
}
