import type { SweepKind, SweepStatus } from '../api-types';

/** The sweep kinds in the order the set-up offers them, with their names on screen. */
export const sweepKindLabels: Record<SweepKind, string> = {
  'xy-map': 'x–y map',
  gap: 'Gap sweep',
  tilt: 'Tilt sweep',
  'xy-stack': 'Stack of maps',
};

export const sweepKindOrder: readonly SweepKind[] = ['xy-map', 'xy-stack', 'gap', 'tilt'];

export const sweepStatusLabels: Record<SweepStatus, string> = {
  queued: 'Queued',
  running: 'Running',
  succeeded: 'Succeeded',
  failed: 'Failed',
  cancelled: 'Cancelled',
};

/** Whether a run may still change: its progress is worth following. */
export function isActiveStatus(status: SweepStatus): boolean {
  return status === 'queued' || status === 'running';
}
