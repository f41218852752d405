import type { StudyRow } from '../../../schema/src/index';
import type { z } from 'zod';
import {
  compensations,
  type Compensation,
  type createStudyRequest,
  type RevisionResponse,
  type Threshold,
} from './studies-dto';
import type { StudyColumns } from './studies-repository';

type StudyFields = z.output<typeof createStudyRequest>;
export type StudyInputs = RevisionResponse['inputs'];

/**
 * A study's fields as columns. The threshold is kept in the column of its kind and the other is
 * cleared, so a study never carries a stale k_min next to the η_min it now uses.
 */
export function studyColumns(fields: StudyFields): StudyColumns {
  return {
    name: fields.name,
    txCoilId: fields.txCoilId,
    rxCoilId: fields.rxCoilId,
    operatingFrequencyHz: fields.frequencyHz,
    txCurrentA: fields.txCurrentA,
    thresholdKind: fields.threshold.kind,
    minCouplingK: fields.threshold.kind === 'k' ? fields.threshold.value : null,
    minEfficiency: fields.threshold.kind === 'eta' ? fields.threshold.value : null,
    compensation: fields.compensation,
    notes: fields.notes,
    nominalPose: { ...fields.nominalPose },
  };
}

/** The threshold a row stores. */
export function studyThreshold(row: {
  thresholdKind: string;
  minCouplingK: number | null;
  minEfficiency: number | null;
}): Threshold {
  if (row.thresholdKind === 'eta') {
    return { kind: 'eta', value: required(row.minEfficiency, 'min_efficiency') };
  }
  return { kind: 'k', value: required(row.minCouplingK, 'min_coupling_k') };
}

/** The study's inputs as a revision freezes them (and the response shows them). */
export function studyInputs(row: StudyRow): StudyInputs {
  const pose = row.nominalPose;
  return {
    name: row.name,
    frequencyHz: required(row.operatingFrequencyHz, 'operating_frequency_hz'),
    txCurrentA: required(row.txCurrentA, 'tx_current_a'),
    threshold: studyThreshold(row),
    compensation: compensationOf(row.compensation),
    notes: row.notes,
    nominalPose: {
      x: pose.x ?? 0,
      y: pose.y ?? 0,
      z: required(pose.z ?? null, 'nominal_pose.z'),
      tiltX: pose.tiltX ?? 0,
      tiltY: pose.tiltY ?? 0,
    },
  };
}

function compensationOf(value: string): Compensation {
  const known = compensations.find((c) => c === value);
  if (!known) throw new Error(`study row has an unknown compensation ${JSON.stringify(value)}`);
  return known;
}

// Studies are written through the API only, which fills every column below; a missing one is a
// broken row, and a 500 that names it beats a study computed from a made-up value.
function required(value: number | null, column: string): number {
  if (value === null || !Number.isFinite(value)) {
    throw new Error(`study row has no ${column}`);
  }
  return value;
}
