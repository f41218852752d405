import { z } from 'zod';
import type { Coil } from '../../../physics/src/index';
import type { CoilKind, CoilResponse } from '../coils/coils-dto';

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

/** A coil as a study sees it: the library's current spec (or the revision's frozen copy). */
export interface StudyCoil {
  id: string;
  name: string;
  kind: CoilKind;
  spec: Coil;
  version: number;
  figures: CoilResponse['figures'];
}

export interface StudyResponse {
  id: string;
  workspaceId: string;
  name: string;
  txCoil: StudyCoil;
  rxCoil: StudyCoil;
  frequencyHz: number;
  txCurrentA: number;
  threshold: Threshold;
  compensation: Compensation;
  notes: string;
  nominalPose: StudyPose;
  /**
   * sha256 of the canonical JSON of the inputs and both coil specs: a sweep run or revision with
   * another hash was computed from something else (shown as stale).
   */
  inputsHash: string;
  version: number;
  latestRevision: { id: string; number: number; createdAt: string } | null;
  createdBy: { userId: string; displayName: string } | null;
  updatedBy: { userId: string; displayName: string } | null;
  createdAt: string;
  updatedAt: string;
}

export interface StudySummaryResponse {
  id: string;
  name: string;
  txCoil: { id: string; name: string };
  rxCoil: { id: string; name: string };
  frequencyHz: number;
  threshold: Threshold;
  revisionCount: number;
  /** Status of the newest sweep run, if any. */
  lastRun: { id: string; kind: string; status: string; finishedAt: string | null } | null;
  updatedAt: string;
}

export interface ListStudiesResponse {
  items: StudySummaryResponse[];
}

export const createRevisionRequest = z
  .object({
    summary: z.string().trim().max(500, { message: 'must be at most 500 characters' }).default(''),
    /** The study version the author looked at; a stale one is refused. */
    studyVersion: z.number().int().positive({ message: 'must be ≥ 1' }),
  })
  .strict();
export type CreateRevisionRequest = z.input<typeof createRevisionRequest>;

export interface RevisionSummaryResponse {
  id: string;
  number: number;
  summary: string;
  engineVersion: string;
  inputsHash: string;
  /** Sweep kinds whose results the revision holds. */
  resultKinds: string[];
  createdBy: { userId: string; displayName: string } | null;
  createdAt: string;
}

export interface RevisionResponse extends RevisionSummaryResponse {
  /** The study's inputs as they were (the StudyResponse fields without ids and times). */
  inputs: {
    name: string;
    frequencyHz: number;
    txCurrentA: number;
    threshold: Threshold;
    compensation: Compensation;
    notes: string;
    nominalPose: StudyPose;
  };
  coilSnapshots: { tx: StudyCoil; rx: StudyCoil };
  /** The succeeded sweep runs with the revision's inputs hash, newest of each kind, frozen. */
  results: { runs: import('../sweeps/sweeps-dto').SweepRunResponse[] };
}

export interface ListRevisionsResponse {
  items: RevisionSummaryResponse[];
}
