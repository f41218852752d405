import type { Coil } from '../../../../physics/src/index';
import type { CoilKind } from '../api-types';
import { ringRow, type CoilForm, type CoilFormValue } from './coil-form';
import { pointsText } from './coil-points-text';

/** What the editor loads: a stored coil's fields. */
export interface CoilFormSource {
  name: string;
  description: string;
  operatingFrequencyHz: number | null;
  ratedCurrentA: number | null;
  spec: Coil;
}

/**
 * Puts a stored coil into the editor: every control reset, then the spec's fields written to
 * their controls (the reverse of `coilSpecFromForm`). Leaves the form pristine.
 *
 * @param form the editor's form
 * @param source the coil's stored fields
 */
export function fillCoilForm(form: CoilForm, source: CoilFormSource): void {
  const spec = source.spec;
  form.controls.rings.clear({ emitEvent: false });
  if (spec.kind === 'rings') {
    for (const ring of spec.rings)
      form.controls.rings.push(ringRow(ring.r, ring.z), { emitEvent: false });
  }
  const value: Partial<CoilFormValue> = {
    name: source.name,
    description: source.description,
    operatingFrequencyHz: source.operatingFrequencyHz,
    ratedCurrentA: source.ratedCurrentA,
    kind: spec.kind,
    ...specValues(spec),
  };
  form.reset();
  form.patchValue(value);
  form.markAsPristine();
  form.markAsUntouched();
}

function specValues(spec: Coil): Partial<CoilFormValue> {
  const backing = spec.backing
    ? { hasBacking: true, mur: spec.backing.mur, backingDistance: spec.backing.distance }
    : { hasBacking: false };
  switch (spec.kind) {
    case 'ring':
      return { radius: spec.radius, wireRadius: spec.wireRadius, ...backing };
    case 'rings':
      return { wireRadius: spec.wireRadius, ...backing };
    case 'circular-spiral':
      return {
        turns: spec.turns,
        sizing: spec.innerRadius !== undefined || spec.pitch !== undefined ? 'pitch' : 'diameters',
        innerDiameter: spec.innerDiameter ?? null,
        outerDiameter: spec.outerDiameter ?? null,
        innerRadius: spec.innerRadius ?? null,
        pitch: spec.pitch ?? null,
        layers: spec.layers ?? null,
        layerSpacing: spec.layerSpacing ?? null,
        spiralModel: spec.model ?? 'rings',
        ...conductorValues(spec.conductor),
        ...backing,
      };
    case 'rectangular-spiral':
      return {
        outerWidth: spec.outerWidth,
        outerHeight: spec.outerHeight,
        cornerRadius: spec.cornerRadius,
        pitch: spec.pitch,
        turns: spec.turns,
        layers: spec.layers ?? null,
        layerSpacing: spec.layerSpacing ?? null,
        ...conductorValues(spec.conductor),
        ...backing,
      };
    case 'solenoid':
      return {
        radius: spec.radius,
        length: spec.length,
        turns: spec.turns,
        layers: spec.layers ?? null,
        layerSpacing: spec.layerSpacing ?? null,
        solenoidModel: spec.model ?? 'rings',
        ...conductorValues(spec.conductor),
        ...backing,
      };
    case 'path':
      return {
        points: pointsText(spec.points),
        closed: spec.closed ?? false,
        ...conductorValues(spec.conductor),
        ...backing,
      };
  }
}

function conductorValues(conductor: Extract<Coil, { conductor: unknown }>['conductor']) {
  switch (conductor.type) {
    case 'round':
      return { conductorType: 'round' as const, wireDiameter: conductor.diameter };
    case 'litz':
      return {
        conductorType: 'litz' as const,
        strands: conductor.strands,
        strandDiameter: conductor.strandDiameter,
        bundleDiameter: conductor.bundleDiameter ?? null,
      };
    case 'trace':
      return {
        conductorType: 'trace' as const,
        traceWidth: conductor.width,
        traceThickness: conductor.thickness,
      };
  }
}

/**
 * Starting values for a new coil of each kind, so that the figures show at once. They are a
 * phone-sized starting point to edit (invented for the form), not design advice.
 */
export const coilKindStarts: Record<CoilKind, Partial<CoilFormValue>> = {
  'circular-spiral': {
    turns: 10,
    sizing: 'diameters',
    innerDiameter: 0.02,
    outerDiameter: 0.043,
    conductorType: 'litz',
    strands: 105,
    strandDiameter: 0.08e-3,
  },
  'rectangular-spiral': {
    outerWidth: 0.06,
    outerHeight: 0.04,
    cornerRadius: 0.005,
    pitch: 0.0015,
    turns: 8,
    conductorType: 'trace',
    traceWidth: 0.001,
    traceThickness: 70e-6,
  },
  solenoid: {
    radius: 0.01,
    length: 0.02,
    turns: 20,
    conductorType: 'round',
    wireDiameter: 0.8e-3,
  },
  ring: { radius: 0.02, wireRadius: 0.5e-3 },
  rings: { wireRadius: 0.4e-3 },
  path: {
    points: '-20 -20 0\n20 -20 0\n20 20 0\n-20 20 0',
    closed: true,
    conductorType: 'round',
    wireDiameter: 0.8e-3,
  },
};

/** Rings a new `rings` coil starts with: three turns 2 mm apart, m. */
const startRings: [number, number][] = [
  [0.01, 0],
  [0.012, 0],
  [0.014, 0],
];

/** Fills the empty fields of `kind` with its starting values; what the user typed stays. */
export function applyKindStart(form: CoilForm, kind: CoilKind): void {
  const start = coilKindStarts[kind];
  const conductorSet = [
    form.controls.wireDiameter,
    form.controls.strands,
    form.controls.strandDiameter,
    form.controls.traceWidth,
    form.controls.traceThickness,
  ].some((control) => control.value !== null);
  const conductorKeys = new Set(['conductorType', 'wireDiameter', 'strands', 'strandDiameter']);
  for (const [key, value] of Object.entries(start)) {
    if (conductorSet && (conductorKeys.has(key) || key.startsWith('trace'))) continue;
    const control = form.get(key);
    if (!control) continue;
    const empty = control.value === null || control.value === '' || key === 'conductorType';
    if (empty) control.setValue(value);
  }
  if (kind === 'rings' && form.controls.rings.length === 0) {
    for (const [r, z] of startRings) form.controls.rings.push(ringRow(r, z));
  }
}
