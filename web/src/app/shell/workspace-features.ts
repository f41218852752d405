import type { IconName } from './icon';

/** A screen of a workspace, as the navigation and the home page present it. */
export interface WorkspaceFeature {
  key: string;
  path: string;
  label: string;
  icon: IconName;
  summary: string;
  /** False until the screen ships; it then shows a placeholder that says so. */
  ready: boolean;
}

export const workspaceFeatures: readonly WorkspaceFeature[] = [
  {
    key: 'coils',
    path: 'coils',
    label: 'Coil library',
    icon: 'coil',
    summary:
      'Planar and rectangular spirals, solenoids and custom paths with live inductance, ' +
      'resistance and Q at the operating frequency, drawn to scale.',
    ready: true,
  },
  {
    key: 'studies',
    path: 'studies',
    label: 'Studies',
    icon: 'study',
    summary:
      'A Tx and Rx pair in 3D, pose controls, sweeps of gap, offset and tilt, coupling maps ' +
      'and the tolerance envelope.',
    ready: true,
  },
  {
    key: 'compare',
    path: 'compare',
    label: 'Compare',
    icon: 'compare',
    summary:
      'Several transmitter candidates against one receiver, ranked by coupling and link ' +
      'efficiency.',
    ready: false,
  },
  {
    key: 'review',
    path: 'review',
    label: 'Review room',
    icon: 'review',
    summary:
      'A frozen revision shown large for the design meeting, with comments pinned to map ' +
      'points and the decision on record.',
    ready: false,
  },
];
