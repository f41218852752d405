import { FormArray, FormControl, FormGroup, Validators } from '@angular/forms';
import type { CoilKind } from '../api-types';

const quantity = () => new FormControl<number | null>(null);
const choice = <T>(value: T) => new FormControl<T>(value, { nonNullable: true });

/** One entry of a `rings` coil: centre-line radius and height, m. */
export function ringRow(r: number | null = null, z: number | null = null) {
  return new FormGroup({
    r: new FormControl<number | null>(r),
    z: new FormControl<number | null>(z),
  });
}
export type RingRow = ReturnType<typeof ringRow>;

/**
 * The coil editor's form: one flat set of controls for every kind (a field shared by two kinds,
 * such as `pitch` or `turns`, keeps its value when the kind changes); `coilSpecFromForm` picks
 * the controls the chosen kind reads. Lengths, frequencies and currents are SI numbers (null when
 * empty) from `app-quantity-field`s. Ranges and cross-field rules come from the physics engine's
 * own schema (see `coilFormIssues`), so only what the engine does not check is validated here.
 */
export function createCoilForm() {
  return new FormGroup({
    name: new FormControl('', {
      nonNullable: true,
      validators: [Validators.required, Validators.maxLength(80), Validators.pattern(/\S/)],
    }),
    description: new FormControl('', {
      nonNullable: true,
      validators: [Validators.maxLength(2000)],
    }),
    kind: choice<CoilKind>('circular-spiral'),
    operatingFrequencyHz: quantity(),
    ratedCurrentA: quantity(),

    turns: quantity(),
    /** A circular spiral is given by its two diameters or by its inner radius and pitch. */
    sizing: choice<'diameters' | 'pitch'>('diameters'),
    innerDiameter: quantity(),
    outerDiameter: quantity(),
    innerRadius: quantity(),
    pitch: quantity(),
    outerWidth: quantity(),
    outerHeight: quantity(),
    cornerRadius: quantity(),
    radius: quantity(),
    length: quantity(),
    wireRadius: quantity(),
    layers: quantity(),
    layerSpacing: quantity(),
    spiralModel: choice<'rings' | 'spiral'>('rings'),
    solenoidModel: choice<'rings' | 'helix'>('rings'),
    rings: new FormArray<RingRow>([]),
    /** Points of a custom path: a pasted table (x y z in mm per line) or JSON in metres. */
    points: new FormControl('', { nonNullable: true }),
    closed: choice(true),

    conductorType: choice<'round' | 'litz' | 'trace'>('round'),
    wireDiameter: quantity(),
    strands: quantity(),
    strandDiameter: quantity(),
    bundleDiameter: quantity(),
    traceWidth: quantity(),
    traceThickness: quantity(),

    hasBacking: choice(false),
    mur: quantity(),
    backingDistance: quantity(),
  });
}

export type CoilForm = ReturnType<typeof createCoilForm>;
export type CoilFormValue = ReturnType<CoilForm['getRawValue']>;
