import { z } from 'zod';
import { coilSchema, type Coil } from '../../../physics/src/index';

// Request and response shapes of the coil library routes (contract of issue 4). The web imports
// the inferred types with `import type`; the spec is validated by the physics engine's own schema,
// so the library can never hold a coil the engine refuses.

export const coilKinds = [
  'ring',
  'rings',
  'circular-spiral',
  'rectangular-spiral',
  'solenoid',
  'path',
] as const;
export const coilKindSchema = z.enum(coilKinds, {
  message: `must be one of ${coilKinds.join(', ')}`,
});
export type CoilKind = z.infer<typeof coilKindSchema>;

const isoTime = z.iso.datetime({ offset: true });
const uuid = z.uuid({ message: 'must be a UUID' });
const coilName = z
  .string({ message: 'must be a text' })
  .trim()
  .min(1, { message: 'must not be empty' })
  .max(80, { message: 'must be at most 80 characters' });

export const coilParams = z.object({ workspaceId: uuid, coilId: uuid }).strict();

export const listCoilsQuery = z
  .object({
    /** Case-insensitive part of the name or description. */
    q: z.string().max(80, { message: 'must be at most 80 characters' }).optional(),
    kind: coilKindSchema.optional(),
  })
  .strict();
export type ListCoilsQuery = z.infer<typeof listCoilsQuery>;

const coilFields = {
  name: coilName,
  description: z.string().max(2000, { message: 'must be at most 2000 characters' }).default(''),
  /** The geometry, SI units, exactly as the physics engine reads it (no `name` inside). */
  spec: coilSchema,
  /** Frequency the library's R_ac and Q are given at, Hz (1 Hz … 100 MHz); null for DC only. */
  operatingFrequencyHz: z
    .number({ message: 'must be a number (Hz)' })
    .positive({ message: 'must be above 0 Hz' })
    .max(100e6, { message: 'must be at most 100 MHz' })
    .nullable()
    .default(null),
  /** Current the stored energy is given at, A (0 … 1000). */
  ratedCurrentA: z
    .number({ message: 'must be a number (A)' })
    .min(0, { message: 'must be at least 0 A' })
    .max(1000, { message: 'must be at most 1000 A' })
    .nullable()
    .default(null),
};

export const createCoilRequest = z.object(coilFields).strict();
export type CreateCoilRequest = z.input<typeof createCoilRequest>;

/** A full replacement; `version` is the version the editor loaded (a stale one is refused). */
export const updateCoilRequest = z
  .object({ ...coilFields, version: z.number().int().positive({ message: 'must be ≥ 1' }) })
  .strict();
export type UpdateCoilRequest = z.input<typeof updateCoilRequest>;

export const duplicateCoilRequest = z.object({ name: coilName.optional() }).strict();
export type DuplicateCoilRequest = z.infer<typeof duplicateCoilRequest>;

/** `DELETE …/coils/:coilId?version=N`: the version is optional; when given it must be current. */
export const deleteCoilQuery = z
  .object({ version: z.coerce.number().int().positive().optional() })
  .strict();

/** Figures the engine computes for a stored coil (SI units), the same as physics' coilFigures. */
export const coilFiguresResponse = z.object({
  L: z.number(),
  Rdc: z.number(),
  Rac: z.number().nullable(),
  Q: z.number().nullable(),
  storedEnergy: z.number(),
  timeConstant: z.number(),
  wireLength: z.number(),
  skinDepth: z.number().nullable(),
});
export type CoilFiguresResponse = z.infer<typeof coilFiguresResponse>;

const person = z.object({ userId: uuid, displayName: z.string() }).nullable();

export const coilResponse = z.object({
  id: uuid,
  workspaceId: uuid,
  name: z.string(),
  description: z.string(),
  kind: coilKindSchema,
  spec: z.record(z.string(), z.unknown()),
  operatingFrequencyHz: z.number().nullable(),
  ratedCurrentA: z.number().nullable(),
  /** At operatingFrequencyHz and ratedCurrentA (1 A when null). */
  figures: coilFiguresResponse,
  /** Studies whose Tx or Rx this coil is (delete is refused while any). */
  usedBy: z.array(z.object({ id: uuid, name: z.string() })),
  version: z.number().int(),
  createdBy: person,
  updatedBy: person,
  createdAt: isoTime,
  updatedAt: isoTime,
});
/** The spec is what the engine validated on the way in, so the web may use it as a `Coil`. */
export type CoilResponse = Omit<z.infer<typeof coilResponse>, 'spec'> & { spec: Coil };

export const listCoilsResponse = z.object({ items: z.array(coilResponse) });
export interface ListCoilsResponse {
  items: CoilResponse[];
}
