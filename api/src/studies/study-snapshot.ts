import type { StudyRow } from '../../../schema/src/index';
import type { Executor } from '../db/database';
import type { StudyCoil } from './studies-dto';
import { findCoilsById } from './studies-repository';
import { studyInputs, type StudyInputs } from './study-columns';
import { toStudyCoil } from './study-coil';
import { studyInputsHash, type StudyComputeInputs } from './study-inputs-hash';

/** A study as it computes now: its inputs, both coils as the library holds them, the hash. */
export interface StudySnapshot {
  inputs: StudyInputs;
  txCoil: StudyCoil;
  rxCoil: StudyCoil;
  inputsHash: string;
}

/** The compute inputs of a study with these coils (what the inputs hash and sweeps read). */
export function studyComputeInputs(
  inputs: StudyInputs,
  tx: StudyCoil,
  rx: StudyCoil,
): StudyComputeInputs {
  return {
    frequencyHz: inputs.frequencyHz,
    txCurrentA: inputs.txCurrentA,
    threshold: inputs.threshold,
    compensation: inputs.compensation,
    nominalPose: inputs.nominalPose,
    tx: tx.spec,
    rx: rx.spec,
  };
}

/** Reads both coils of a study and computes its inputs hash from them. */
export async function loadStudySnapshot(ex: Executor, row: StudyRow): Promise<StudySnapshot> {
  if (row.txCoilId === null || row.rxCoilId === null) {
    // The coil columns are restrict foreign keys and the API always sets them.
    throw new Error(`study ${row.id} has no Tx or Rx coil`);
  }
  const coilRows = await findCoilsById(ex, [row.txCoilId, row.rxCoilId]);
  const byId = new Map(coilRows.map((c) => [c.id, toStudyCoil(c)]));
  const txCoil = byId.get(row.txCoilId);
  const rxCoil = byId.get(row.rxCoilId);
  if (!txCoil || !rxCoil) throw new Error(`study ${row.id} points at a missing coil`);
  const inputs = studyInputs(row);
  const inputsHash = studyInputsHash(studyComputeInputs(inputs, txCoil, rxCoil));
  return { inputs, txCoil, rxCoil, inputsHash };
}
