/**
 * Filament model shared by every part of the physics engine.
 *
 * A coil becomes filaments: circular rings (fast closed forms exist for them) and polylines of
 * straight segments (polygons, true spiral paths, custom paths). All lengths in metres. A filament
 * carries the coil's full current in the direction stated below; `weight` multiplies its
 * contribution (1 for an ordinary turn, -1 for a reversed one, (mur-1)/(mur+1) for a ferrite
 * image).
 */

/** A point or direction in 3D, metres. */
export interface Vec3 {
  x: number;
  y: number;
  z: number;
}

/**
 * A circular filament. Current circulates right-handed about `normal` (a unit vector).
 * `wireRadius` is the conductor's radius, used for self terms and for clearance checks.
 */
export interface RingFilament {
  center: Vec3;
  normal: Vec3;
  radius: number;
  wireRadius: number;
  weight: number;
}

/**
 * A polyline filament: current flows from points[0] to points[n-1]. `closed` adds the segment
 * from the last point back to the first.
 */
export interface PathFilament {
  points: Vec3[];
  closed: boolean;
  wireRadius: number;
  weight: number;
}

/** Every filament of one coil, in one frame (the coil's local frame unless stated). */
export interface FilamentSet {
  rings: RingFilament[];
  paths: PathFilament[];
}
