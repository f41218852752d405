import type { FilamentSet } from '../filaments';
import { circularSpiralFilaments } from './circular-spiral-filaments';
import type { Coil } from './coil-schema';
import { conductorSection } from './conductor-section';
import { rectangularSpiralFilaments } from './rectangular-spiral-filaments';
import { solenoidFilaments } from './solenoid-filaments';

/**
 * The filaments of a coil in its local frame: circular rings where the winding is circular (so
 * the closed forms of the kernels apply) and polylines elsewhere.
 *
 * Method and conventions (physics/README.md has the full list):
 * - local frame: the winding's axis is +z; the origin is the centre of the lowest layer's plane
 *   (of the winding's bottom end for a solenoid); all conductor centre lines lie in z ≥ 0, so a
 *   ferrite backing at z < -distance sits behind the whole winding and the distance is measured
 *   from the layer nearest to it; further layers stack toward +z (away from the backing);
 * - radii, diameters, widths and heights are conductor centre lines;
 * - current circulates right-handed about +z in every turn and layer (layers in series, aiding);
 * - `ring`, `rings`: one ring filament per turn, weight 1;
 * - `circular-spiral`: concentric rings at r_in + i · pitch, the fractional last turn weighted by
 *   its fraction; or a true Archimedean polyline (circularSpiralFilaments);
 * - `rectangular-spiral`: one closed rounded-rectangle polygon per turn, stepping inward
 *   (rectangularSpiralFilaments);
 * - `solenoid`: stacked rings at the mean height of each helix turn, or a true helix
 *   (solenoidFilaments);
 * - `path`: the points as given, one polyline, `closed` default false.
 * Every filament's `wireRadius` is the conductor's equivalent round-wire radius (conductorSection).
 * A `backing` is not included: ferriteImages adds its images.
 *
 * References: see the per-kind builders; ring self terms need the wire radius after Rosa & Grover
 * (1912).
 *
 * @param coil a validated coil (parseCoil), SI units
 * @returns its filaments in the coil's local frame, m
 * @example coilFilaments({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }).rings[0].radius // 0.02
 */
export function coilFilaments(coil: Coil): FilamentSet {
  const up = { x: 0, y: 0, z: 1 };
  switch (coil.kind) {
    case 'ring':
      return {
        rings: [
          {
            center: { x: 0, y: 0, z: 0 },
            normal: { ...up },
            radius: coil.radius,
            wireRadius: coil.wireRadius,
            weight: 1,
          },
        ],
        paths: [],
      };
    case 'rings':
      return {
        rings: coil.rings.map((ring) => ({
          center: { x: 0, y: 0, z: ring.z },
          normal: { ...up },
          radius: ring.r,
          wireRadius: coil.wireRadius,
          weight: 1,
        })),
        paths: [],
      };
    case 'circular-spiral':
      return circularSpiralFilaments(coil);
    case 'rectangular-spiral':
      return rectangularSpiralFilaments(coil);
    case 'solenoid':
      return solenoidFilaments(coil);
    case 'path':
      return {
        rings: [],
        paths: [
          {
            points: coil.points.map((p) => ({ x: p.x, y: p.y, z: p.z })),
            closed: coil.closed ?? false,
            wireRadius: conductorSection(coil.conductor).wireRadius,
            weight: 1,
          },
        ],
      };
  }
}
