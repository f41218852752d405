import type { z } from 'zod';
import type { Coil } from '../../../physics/src/index';
import { ValidationError } from '../errors/app-errors';
import { computeCoilFigures } from './compute-coil-figures';
import type { CoilKind, createCoilRequest } from './coils-dto';
import type { CoilValues } from './coils-repository';

/** A coil as the create and update routes parse it. */
export type CoilInput = z.output<typeof createCoilRequest>;

/** Validates what the schema cannot see and runs the models for the figures to store. */
export function coilValues(input: CoilInput): CoilValues {
  const spec = input.spec as Coil;
  // Decision: the coil's name lives in `name` only. A second name inside the spec would drift
  // from the first, so it is refused rather than silently dropped.
  if (spec.name !== undefined) {
    throw new ValidationError(
      'spec.name: a coil is named by the top-level name field; leave name out of spec',
      'spec.name',
    );
  }
  const figures = computeCoilFigures(spec, input.operatingFrequencyHz, input.ratedCurrentA);
  return {
    name: input.name,
    kind: spec.kind as CoilKind,
    description: input.description,
    spec: spec as unknown as Record<string, unknown>,
    operatingFrequencyHz: input.operatingFrequencyHz,
    ratedCurrentA: input.ratedCurrentA,
    selfInductanceH: figures.L,
    dcResistanceOhm: figures.Rdc,
    acResistanceOhm: figures.Rac,
    qualityFactor: figures.Q,
    wireLengthM: figures.wireLength,
  };
}
