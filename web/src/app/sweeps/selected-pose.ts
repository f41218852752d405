/** A pose picked on a map, for the workbench to move the Rx to: m and degrees. */
export interface SelectedPose {
  x: number;
  y: number;
  z: number;
  tiltX: number;
  tiltY: number;
}
