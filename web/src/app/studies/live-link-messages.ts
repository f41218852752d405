// The messages between the workbench and its live-link worker. Types only: the page's chunk must
// not pull the physics engine in; the worker holds it.
import type { Coil, FilamentSet, LinkFigures } from '../../../../physics/src/index';
import type { Compensation, StudyPose } from '../api-types';

/** Prepare a coil pair (once per pair: the costly part). */
export interface LiveLinkSetup {
  type: 'setup';
  setupId: number;
  tx: Coil;
  rx: Coil;
  /** A pose to evaluate once while preparing (the nominal one), so the first answer is quick. */
  warmPose?: StudyPose;
}

/** The operating point a pose is evaluated at. */
export interface LiveOperatingPoint {
  frequency: number;
  current: number;
  compensation: Compensation;
}

/** Evaluate one pose of the prepared pair. */
export interface LiveLinkPoseRequest extends LiveOperatingPoint {
  type: 'pose';
  id: number;
  setupId: number;
  pose: StudyPose;
}

export type LiveLinkRequest = LiveLinkSetup | LiveLinkPoseRequest;

/** One coil on its own at the study frequency: L (H), R_ac (Ω), Q. */
export interface LiveCoilFigures {
  L: number;
  R: number;
  Q: number;
}

/**
 * What the panel shows for a pose (SI units): physics' link figures with the capacitors of the
 * study's compensation, and each coil alone at the frequency.
 */
export interface LiveFigures extends LinkFigures {
  compensation: Compensation;
  tx: LiveCoilFigures;
  rx: LiveCoilFigures;
}

export interface LiveLinkReady {
  type: 'ready';
  setupId: number;
  /** Filaments in each coil's local frame (m), for the 3D view. */
  tx: FilamentSet;
  rx: FilamentSet;
  prepareMs: number;
}

export interface LiveLinkFigures {
  type: 'figures';
  id: number;
  setupId: number;
  figures: LiveFigures;
  /** Time spent computing inside the worker, ms. */
  computeMs: number;
}

export interface LiveLinkFailure {
  type: 'error';
  /** The pose request that failed; null when the set-up did. */
  id: number | null;
  setupId: number;
  message: string;
}

export type LiveLinkResponse = LiveLinkReady | LiveLinkFigures | LiveLinkFailure;
