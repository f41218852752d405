import { and, count, eq, inArray } from 'drizzle-orm';
import { ENGINE_VERSION, sweepSpecSchema } from '../physics/src/index';
import { recordAudit } from '../api/src/audit/audit-repository';
import { coilValues } from '../api/src/coils/coil-values';
import { createCoilRequest } from '../api/src/coils/coils-dto';
import type { Transaction } from '../api/src/db/database';
import { createStudyRequest } from '../api/src/studies/studies-dto';
import { studyColumns } from '../api/src/studies/study-columns';
import { loadStudySnapshot } from '../api/src/studies/study-snapshot';
import { checkSweepShape, sweepPoseCount } from '../api/src/sweeps/check-sweep-shape';
import { computeSweepResult } from '../api/src/sweeps/compute-sweep';
import { toSweepRunResponse } from '../api/src/sweeps/sweep-run-response';
import type { FrozenSweepSpec } from '../api/src/sweeps/sweeps-dto';
import { coils, studies, studyRevisions, sweepRuns } from '../schema/src/index';
import { demoCoils, demoRevisionSummary, demoStudy, demoSweeps } from './demo-library';
import { demoWorkspace } from './demo-workspace';

export interface DemoAuthor {
  id: string;
  displayName: string;
}

export interface DemoLibraryReport {
  /** False when the workspace already had coils or studies (nothing was touched). */
  loaded: boolean;
  coils: number;
  runs: { kind: string; poses: number; seconds: number }[];
  seconds: number;
}

/**
 * Fills the demo workspace's coil library, its baseline study, four stored sweep runs and
 * revision 1, as the API would have: the same DTO validation, the same figures on every coil,
 * the same frozen sweep specs and inputs hash, results from the same compute function. Only when
 * the workspace has no coil and no study yet, so a second load costs two counts and never
 * brings back what people deleted or overwrites what they changed.
 */
export async function loadDemoLibrary(
  tx: Transaction,
  author: DemoAuthor,
): Promise<DemoLibraryReport> {
  const started = performance.now();
  const workspaceId = demoWorkspace.id;
  const [coilCount] = await tx
    .select({ n: count() })
    .from(coils)
    .where(eq(coils.workspaceId, workspaceId));
  const [studyCount] = await tx
    .select({ n: count() })
    .from(studies)
    .where(eq(studies.workspaceId, workspaceId));
  if ((coilCount?.n ?? 0) > 0 || (studyCount?.n ?? 0) > 0) {
    return { loaded: false, coils: 0, runs: [], seconds: 0 };
  }

  for (const demo of Object.values(demoCoils)) {
    const values = coilValues(createCoilRequest.parse(demo.request));
    await tx
      .insert(coils)
      .values({ ...values, id: demo.id, workspaceId, createdBy: author.id, updatedBy: author.id });
    await recordAudit(tx, {
      workspaceId,
      actorId: author.id,
      action: 'coil.created',
      subject: values.name,
      details: { coilId: demo.id, kind: values.kind, demo: true },
    });
  }

  const fields = createStudyRequest.parse(demoStudy.request);
  const [study] = await tx
    .insert(studies)
    .values({
      ...studyColumns(fields),
      id: demoStudy.id,
      workspaceId,
      createdBy: author.id,
      updatedBy: author.id,
    })
    .returning();
  await recordAudit(tx, {
    workspaceId,
    actorId: author.id,
    action: 'study.created',
    subject: study!.name,
    details: { studyId: study!.id, demo: true },
  });

  const snapshot = await loadStudySnapshot(tx, study!);
  const runs: DemoLibraryReport['runs'] = [];
  const runIds: string[] = [];
  for (const sweep of demoSweeps) {
    const grid = sweepSpecSchema.parse(sweep.grid);
    checkSweepShape(sweep.kind, grid);
    const frozen: FrozenSweepSpec = {
      kind: sweep.kind,
      grid,
      inputs: {
        frequencyHz: snapshot.inputs.frequencyHz,
        txCurrentA: snapshot.inputs.txCurrentA,
        threshold: snapshot.inputs.threshold,
        compensation: snapshot.inputs.compensation,
        nominalPose: snapshot.inputs.nominalPose,
        tx: snapshot.txCoil.spec,
        rx: snapshot.rxCoil.spec,
      },
      coilNames: { tx: snapshot.txCoil.name, rx: snapshot.rxCoil.name },
      engineVersion: ENGINE_VERSION,
      inputsHash: snapshot.inputsHash,
    };
    const startedAt = new Date();
    const t0 = performance.now();
    const result = await computeSweepResult(frozen);
    const seconds = (performance.now() - t0) / 1000;
    const poses = sweepPoseCount(grid);
    const [run] = await tx
      .insert(sweepRuns)
      .values({
        studyId: study!.id,
        kind: sweep.kind,
        inputsHash: snapshot.inputsHash,
        spec: frozen as unknown as Record<string, unknown>,
        status: 'succeeded',
        pointsTotal: poses,
        pointsDone: poses,
        progressFraction: 1,
        queuedAt: startedAt,
        startedAt,
        finishedAt: new Date(),
        computeTimeS: seconds,
        result: result as unknown as Record<string, unknown>,
        requestedBy: author.id,
      })
      .returning({ id: sweepRuns.id });
    runIds.push(run!.id);
    runs.push({ kind: sweep.kind, poses, seconds });
  }

  // Revision 1 freezes the study and its runs exactly as RevisionsService.create stores them.
  const runRows = await tx.select().from(sweepRuns).where(inArray(sweepRuns.id, runIds));
  const frozenRuns = runIds.map((id) =>
    toSweepRunResponse(
      runRows.find((r) => r.id === id)!,
      {
        currentHash: snapshot.inputsHash,
        requestedBy: { userId: author.id, displayName: author.displayName },
        withResult: true,
      },
    ),
  );
  const [revision] = await tx
    .insert(studyRevisions)
    .values({
      studyId: study!.id,
      number: 1,
      summary: demoRevisionSummary,
      inputs: { ...snapshot.inputs, inputsHash: snapshot.inputsHash },
      coilSnapshots: { tx: snapshot.txCoil, rx: snapshot.rxCoil },
      engineVersion: ENGINE_VERSION,
      results: { resultKinds: frozenRuns.map((r) => r.kind), runs: frozenRuns },
      createdBy: author.id,
    })
    .returning({ id: studyRevisions.id });
  await tx
    .update(sweepRuns)
    .set({ revisionId: revision!.id })
    .where(and(eq(sweepRuns.studyId, study!.id), inArray(sweepRuns.id, runIds)));
  await recordAudit(tx, {
    workspaceId,
    actorId: author.id,
    action: 'revision.created',
    subject: `${study!.name} — revision 1`,
    details: {
      studyId: study!.id,
      revisionId: revision!.id,
      number: 1,
      resultKinds: frozenRuns.map((r) => r.kind),
      demo: true,
    },
  });
  return {
    loaded: true,
    coils: Object.keys(demoCoils).length,
    runs,
    seconds: (performance.now() - started) / 1000,
  };
}
