import type { SweepRunRow } from '../../../schema/src/index';
import type { FrozenSweepSpec, SweepResultBody, SweepRunResponse } from './sweeps-dto';

/**
 * A stored run as the API shows it. `currentHash` is the study's inputs hash now (a run with
 * another hash is marked not current); the result body is included only when asked for and the
 * run succeeded, since lists must stay small.
 */
export function toSweepRunResponse(
  row: SweepRunRow,
  options: {
    currentHash: string;
    requestedBy: { userId: string; displayName: string } | null;
    withResult?: boolean;
  },
): SweepRunResponse {
  const spec = row.spec as unknown as FrozenSweepSpec;
  const response: SweepRunResponse = {
    id: row.id,
    studyId: row.studyId,
    kind: spec.kind,
    grid: spec.grid,
    status: row.status,
    pointsTotal: row.pointsTotal,
    pointsDone: row.pointsDone,
    progressFraction: row.progressFraction,
    inputsHash: row.inputsHash,
    current: row.inputsHash === options.currentHash,
    engineVersion: spec.engineVersion,
    queuedAt: row.queuedAt.toISOString(),
    startedAt: row.startedAt?.toISOString() ?? null,
    finishedAt: row.finishedAt?.toISOString() ?? null,
    computeTimeS: row.computeTimeS,
    error: row.error,
    cancelRequested: row.cancelRequestedAt !== null,
    requestedBy: options.requestedBy,
  };
  if (options.withResult && row.status === 'succeeded' && row.result) {
    response.result = row.result as unknown as SweepResultBody;
  }
  return response;
}
