import type { SweepPose } from './sweep-pose';

/**
 * What a sweep needs from a prepared coil pair (the result of `preparePair`): both
 * self-inductances (H) and mutual inductance (H) for a batch of poses, in the batch's order.
 * `L2At`, when present, is the Rx self-inductance in a pose (a Tx ferrite backing raises it near
 * the plate); without it L2 holds everywhere.
 */
export interface SweepPair {
  L1: number;
  L2: number;
  L2At?(pose: SweepPose): number;
  mutualMany(poses: SweepPose[]): Float64Array;
}
