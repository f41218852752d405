import type { CoilKind } from '../api-types';

/** Spec fields whose form control has another name. */
const renamed: Record<string, string> = {
  'conductor.diameter': 'wireDiameter',
  'conductor.strands': 'strands',
  'conductor.strandDiameter': 'strandDiameter',
  'conductor.bundleDiameter': 'bundleDiameter',
  'conductor.width': 'traceWidth',
  'conductor.thickness': 'traceThickness',
  conductor: 'conductorType',
  'backing.mur': 'mur',
  'backing.distance': 'backingDistance',
  backing: 'hasBacking',
};

/**
 * The form control to show an engine issue at: the spec path `['conductor', 'diameter']` is the
 * control `wireDiameter`, `['rings', 3, 'r']` is `rings.3.r`; a path into the points of a custom
 * path is the points text. Null when the issue belongs to no one field (the page shows it).
 *
 * @param kind the coil's kind (the `model` field is a control per kind)
 * @param path the issue's path inside the spec
 * @returns a path for `FormGroup.get`, or null
 */
export function coilIssueControl(kind: CoilKind, path: readonly PropertyKey[]): string | null {
  if (path.length === 0) return null;
  const [head, index, leaf] = path;
  if (head === 'points') return 'points';
  if (head === 'rings' && typeof index === 'number') return `rings.${index}.${String(leaf ?? 'r')}`;
  if (head === 'rings') return 'rings';
  if (head === 'model') return kind === 'solenoid' ? 'solenoidModel' : 'spiralModel';
  const dotted = path.map(String).join('.');
  return renamed[dotted] ?? (path.length === 1 ? String(head) : null);
}
