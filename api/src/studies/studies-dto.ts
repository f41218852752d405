import { z } from 'zod';
import type { Coil } from '../../../physics/src/index';
import { coilFiguresResponse, coilKindSchema, type CoilResponse } from '../coils/coils-dto';
import type { SweepRunResponse } from '../sweeps/sweeps-dto';

// Request and response shapes of the study and revision routes (contract of issue 4).

const uuid = z.uuid({ message: 'must be a UUID' });
const studyName = z
  .string({ message: 'must be a text' })
  .trim()
  .min(1, { message: 'must not be empty' })
  .max(80, { message: 'must be at most 80 characters' });

export const studyParams = z.object({ workspaceId: uuid, studyId: uuid }).strict();
export const revisionParams = z
  .object({ workspaceId: uuid, studyId: uuid, revisionId: uuid })
  .strict();

/** What the power stage must see everywhere in the envelope: a coupling or an efficiency. */
export const thresholdSchema = z.discriminatedUnion(
  'kind',
  [
    z
      .object({
        kind: z.literal('k'),
        value: z
          .number({ message: 'must be a number' })
          .gt(0, { message: 'k_min must be above 0' })
          .max(1, { message: 'k_min must be at most 1' }),
      })
      .strict(),
    z
      .object({
        kind: z.literal('eta'),
        value: z
          .number({ message: 'must be a number' })
          .gt(0, { message: 'η_min must be above 0' })
          .lt(1, { message: 'η_min must be below 1' }),
      })
      .strict(),
  ],
  { error: () => 'threshold kind must be k or eta' },
);
export type Threshold = z.infer<typeof thresholdSchema>;

export const compensations = ['series-series', 'series-parallel'] as const;
export const compensationSchema = z.enum(compensations, {
  message: 'must be series-series or series-parallel',
});
export type Compensation = z.infer<typeof compensationSchema>;

const metres = (label: string) =>
  z
    .number({ message: `${label} must be a number (m)` })
    .min(-1, { message: `${label} must be at least -1 m` })
    .max(1, { message: `${label} must be at most 1 m` });
const degrees = (label: string) =>
  z
    .number({ message: `${label} must be a number (°)` })
    .min(-90, { message: `${label} must be at least -90°` })
    .max(90, { message: `${label} must be at most 90°` });

/** The Rx in the Tx frame: offsets and gap in metres, tilts in degrees (physics' pose). */
export const studyPoseSchema = z
  .object({
    x: metres('x').default(0),
    y: metres('y').default(0),
    z: metres('gap').min(0, { message: 'gap must be at least 0 m' }),
    tiltX: degrees('tiltX').default(0),
    tiltY: degrees('tiltY').default(0),
  })
  .strict();
export type StudyPose = z.infer<typeof studyPoseSchema>;

const studyFields = {
  name: studyName,
  txCoilId: uuid,
  rxCoilId: uuid,
  /** Operating frequency, Hz (1 kHz … 100 MHz). */
  frequencyHz: z
    .number({ message: 'must be a number (Hz)' })
    .min(1e3, { message: 'must be at least 1 kHz' })
    .max(100e6, { message: 'must be at most 100 MHz' }),
  /** Tx coil current (rms), A. */
  txCurrentA: z
    .number({ message: 'must be a number (A)' })
    .gt(0, { message: 'must be above 0 A' })
    .max(1000, { message: 'must be at most 1000 A' }),
  threshold: thresholdSchema,
  compensation: compensationSchema.default('series-series'),
  notes: z.string().max(10000, { message: 'must be at most 10000 characters' }).default(''),
  nominalPose: studyPoseSchema,
};

export const createStudyRequest = z.object(studyFields).strict();
export type CreateStudyRequest = z.input<typeof createStudyRequest>;

/** A full replacement; `version` is the version the editor loaded (a stale one is refused). */
export const updateStudyRequest = z
  .object({ ...studyFields, version: z.number().int().positive({ message: 'must be ≥ 1' }) })
  .strict();
export type UpdateStudyRequest = z.input<typeof updateStudyRequest>;

const isoTime = z.iso.datetime({ offset: true });
const person = z.object({ userId: uuid, displayName: z.string() }).nullable();
// Response shapes restate the stored values without the request's limits: a limit tightened
// later must not turn an existing study into a 500.
const thresholdOut = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('k'), value: z.number() }),
  z.object({ kind: z.literal('eta'), value: z.number() }),
]);
const poseOut = z.object({
  x: z.number(),
  y: z.number(),
  z: z.number(),
  tiltX: z.number(),
  tiltY: z.number(),
});

/** A coil as a study sees it: the library's current spec (or the revision's frozen copy). */
export const studyCoil = z.object({
  id: uuid,
  name: z.string(),
  kind: coilKindSchema,
  spec: z.record(z.string(), z.unknown()),
  version: z.number().int(),
  figures: coilFiguresResponse,
});
/** The spec passed the engine's schema on its way into the library, so it is a `Coil`. */
export type StudyCoil = Omit<z.infer<typeof studyCoil>, 'spec' | 'figures'> & {
  spec: Coil;
  figures: CoilResponse['figures'];
};

export const studyResponse = z.object({
  id: uuid,
  workspaceId: uuid,
  name: z.string(),
  txCoil: studyCoil,
  rxCoil: studyCoil,
  frequencyHz: z.number(),
  txCurrentA: z.number(),
  threshold: thresholdOut,
  compensation: compensationSchema,
  notes: z.string(),
  nominalPose: poseOut,
  /**
   * sha256 of the canonical JSON of the inputs and both coil specs: a sweep run or revision with
   * another hash was computed from something else (shown as stale).
   */
  inputsHash: z.string(),
  version: z.number().int(),
  latestRevision: z.object({ id: uuid, number: z.number().int(), createdAt: isoTime }).nullable(),
  createdBy: person,
  updatedBy: person,
  createdAt: isoTime,
  updatedAt: isoTime,
});
export type StudyResponse = Omit<z.infer<typeof studyResponse>, 'txCoil' | 'rxCoil'> & {
  txCoil: StudyCoil;
  rxCoil: StudyCoil;
};

export const studySummaryResponse = z.object({
  id: uuid,
  name: z.string(),
  txCoil: z.object({ id: uuid, name: z.string() }),
  rxCoil: z.object({ id: uuid, name: z.string() }),
  frequencyHz: z.number(),
  threshold: thresholdOut,
  revisionCount: z.number().int(),
  /** Status of the newest sweep run, if any. */
  lastRun: z
    .object({ id: uuid, kind: z.string(), status: z.string(), finishedAt: isoTime.nullable() })
    .nullable(),
  updatedAt: isoTime,
});
export type StudySummaryResponse = z.infer<typeof studySummaryResponse>;

export const listStudiesResponse = z.object({ items: z.array(studySummaryResponse) });
export type ListStudiesResponse = z.infer<typeof listStudiesResponse>;

/**
 * `DELETE …/studies/:studyId?version=N`: the version is optional; when given it must be current.
 * A study with revisions is deleted by an owner only (its reviewed work goes with it).
 */
export const deleteStudyQuery = z
  .object({ version: z.coerce.number().int().positive({ message: 'must be ≥ 1' }).optional() })
  .strict();

export const createRevisionRequest = z
  .object({
    summary: z.string().trim().max(500, { message: 'must be at most 500 characters' }).default(''),
    /** The study version the author looked at; a stale one is refused. */
    studyVersion: z.number().int().positive({ message: 'must be ≥ 1' }),
  })
  .strict();
export type CreateRevisionRequest = z.input<typeof createRevisionRequest>;

export const revisionSummaryResponse = z.object({
  id: uuid,
  number: z.number().int(),
  summary: z.string(),
  engineVersion: z.string(),
  inputsHash: z.string(),
  /** Sweep kinds whose results the revision holds. */
  resultKinds: z.array(z.string()),
  createdBy: person,
  createdAt: isoTime,
});
export type RevisionSummaryResponse = z.infer<typeof revisionSummaryResponse>;

export const revisionResponse = revisionSummaryResponse.extend({
  /** The study's inputs as they were (the StudyResponse fields without ids and times). */
  inputs: z.object({
    name: z.string(),
    frequencyHz: z.number(),
    txCurrentA: z.number(),
    threshold: thresholdOut,
    compensation: compensationSchema,
    notes: z.string(),
    nominalPose: poseOut,
  }),
  coilSnapshots: z.object({ tx: studyCoil, rx: studyCoil }),
  /** The succeeded sweep runs with the revision's inputs hash, newest of each kind, frozen. */
  results: z.object({ runs: z.array(z.record(z.string(), z.unknown())) }),
});
export type RevisionResponse = Omit<
  z.infer<typeof revisionResponse>,
  'coilSnapshots' | 'results'
> & {
  coilSnapshots: { tx: StudyCoil; rx: StudyCoil };
  results: { runs: SweepRunResponse[] };
};

export const listRevisionsResponse = z.object({ items: z.array(revisionSummaryResponse) });
export type ListRevisionsResponse = z.infer<typeof listRevisionsResponse>;

/** The inputs that decide every number a study computes (names and notes do not). */
export interface StudyComputeInputs {
  frequencyHz: number;
  txCurrentA: number;
  threshold: Threshold;
  compensation: Compensation;
  nominalPose: StudyPose;
  tx: Coil;
  rx: Coil;
}
