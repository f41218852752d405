import type { CoilKind } from '../api-types';

/** The coil kinds in the order the pickers list them, with our words for them. */
export const coilKindLabels: Record<CoilKind, string> = {
  'circular-spiral': 'Circular spiral',
  'rectangular-spiral': 'Rectangular spiral',
  solenoid: 'Solenoid',
  rings: 'Rings (list)',
  ring: 'Single ring',
  path: 'Custom path',
};

/** The kinds as a list, for selects. */
export const coilKindOptions = Object.entries(coilKindLabels).map(([kind, label]) => ({
  kind: kind as CoilKind,
  label,
}));
