import {
  AbstractControl,
  FormControl,
  FormGroup,
  NonNullableFormBuilder,
  ValidationErrors,
  Validators,
} from '@angular/forms';
import type {
  Compensation,
  CreateStudyRequest,
  StudyPose,
  StudyResponse,
  Threshold,
} from '../api-types';

/** The study form's controls; quantities are SI numbers (null while empty or unreadable). */
export type StudyForm = FormGroup<{
  name: FormControl<string>;
  txCoilId: FormControl<string>;
  rxCoilId: FormControl<string>;
  frequencyHz: FormControl<number | null>;
  txCurrentA: FormControl<number | null>;
  thresholdKind: FormControl<Threshold['kind']>;
  thresholdValue: FormControl<number | null>;
  compensation: FormControl<Compensation>;
  pose: FormGroup<{
    z: FormControl<number | null>;
    x: FormControl<number | null>;
    y: FormControl<number | null>;
    tiltX: FormControl<number | null>;
    tiltY: FormControl<number | null>;
  }>;
  notes: FormControl<string>;
}>;

/** The allowed ranges of the contract (api/src/studies/studies-dto.ts), SI units. */
export const studyLimits = {
  frequencyHz: { min: 1e3, max: 100e6 },
  txCurrentA: { min: 0, max: 1000 },
  gap: { min: 0, max: 1 },
  offset: { min: -1, max: 1 },
  tilt: { min: -90, max: 90 },
} as const;

/**
 * k_min lies in (0, 1], η_min in (0, 1): the value's rule depends on the kind beside it, so it is
 * checked here rather than by the field's own range.
 */
function thresholdRule(control: AbstractControl): ValidationErrors | null {
  const value = control.value as number | null;
  const kind = control.parent?.get('thresholdKind')?.value as Threshold['kind'] | undefined;
  if (value === null || kind === undefined) return null;
  if (kind === 'k' && !(value > 0 && value <= 1)) {
    return { threshold: 'k_min: above 0 and at most 1, e.g. 0.25' };
  }
  if (kind === 'eta' && !(value > 0 && value < 1)) {
    return { threshold: 'η_min: a fraction above 0 and below 1, e.g. 0.85 for 85 %' };
  }
  return null;
}

/** A new study starts at what a phone-size pad pair would use; every value is editable. */
export function buildStudyForm(fb: NonNullableFormBuilder): StudyForm {
  const quantity = (value: number | null) =>
    fb.control<number | null>(value, { validators: [Validators.required] });
  return fb.group({
    name: fb.control('', [Validators.required, Validators.maxLength(80)]),
    txCoilId: fb.control('', [Validators.required]),
    rxCoilId: fb.control('', [Validators.required]),
    frequencyHz: quantity(null),
    txCurrentA: quantity(null),
    thresholdKind: fb.control<Threshold['kind']>('k'),
    thresholdValue: fb.control<number | null>(null, [Validators.required, thresholdRule]),
    compensation: fb.control<Compensation>('series-series'),
    pose: fb.group({
      z: quantity(null),
      x: quantity(0),
      y: quantity(0),
      tiltX: quantity(0),
      tiltY: quantity(0),
    }),
    notes: fb.control('', [Validators.maxLength(10000)]),
  }) as StudyForm;
}

/** The form's value for a stored study. */
export function studyFormValue(study: StudyResponse): ReturnType<StudyForm['getRawValue']> {
  return {
    name: study.name,
    txCoilId: study.txCoil.id,
    rxCoilId: study.rxCoil.id,
    frequencyHz: study.frequencyHz,
    txCurrentA: study.txCurrentA,
    thresholdKind: study.threshold.kind,
    thresholdValue: study.threshold.value,
    compensation: study.compensation,
    pose: { ...study.nominalPose },
    notes: study.notes,
  };
}

/** The request body for a valid form (every quantity present). */
export function studyRequest(form: StudyForm): CreateStudyRequest {
  const v = form.getRawValue();
  const pose: StudyPose = {
    z: v.pose.z as number,
    x: v.pose.x ?? 0,
    y: v.pose.y ?? 0,
    tiltX: v.pose.tiltX ?? 0,
    tiltY: v.pose.tiltY ?? 0,
  };
  return {
    name: v.name.trim(),
    txCoilId: v.txCoilId,
    rxCoilId: v.rxCoilId,
    frequencyHz: v.frequencyHz as number,
    txCurrentA: v.txCurrentA as number,
    threshold: { kind: v.thresholdKind, value: v.thresholdValue as number } as Threshold,
    compensation: v.compensation,
    notes: v.notes,
    nominalPose: pose,
  };
}

const fieldLabels: [string, (s: StudyResponse) => unknown][] = [
  ['Name', (s) => s.name],
  ['Tx coil', (s) => s.txCoil.id],
  ['Rx coil', (s) => s.rxCoil.id],
  ['Frequency', (s) => s.frequencyHz],
  ['Tx current', (s) => s.txCurrentA],
  ['Threshold', (s) => `${s.threshold.kind}:${s.threshold.value}`],
  ['Compensation', (s) => s.compensation],
  ['Nominal pose', (s) => JSON.stringify(s.nominalPose)],
  ['Notes', (s) => s.notes],
];

/** What someone else changed between the version the form was opened on and the latest one. */
export function changedFields(before: StudyResponse, after: StudyResponse): string[] {
  return fieldLabels.filter(([, read]) => read(before) !== read(after)).map(([label]) => label);
}

/** Server field paths (the contract's names) to the form's control paths. */
export function formFieldPath(field: string): string {
  if (field.startsWith('nominalPose.')) return 'pose.' + field.slice('nominalPose.'.length);
  if (field === 'threshold.value' || field === 'threshold') return 'thresholdValue';
  return field;
}
