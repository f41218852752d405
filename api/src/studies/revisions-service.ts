import type { z } from 'zod';
import { ENGINE_VERSION } from '../../../physics/src/index';
import type { StudyRevisionRow } from '../../../schema/src/index';
import { recordAudit } from '../audit/audit-repository';
import type { Database, Executor } from '../db/database';
import { NotFoundError, StaleVersionError } from '../errors/app-errors';
import type { SweepRunResponse } from '../sweeps/sweeps-dto';
import { toSweepRunResponse } from '../sweeps/sweep-run-response';
import * as revisionsRepo from './revisions-repository';
import { staleStudyMessage } from './stale-study-message';
import * as studiesRepo from './studies-repository';
import type {
  createRevisionRequest,
  RevisionResponse,
  RevisionSummaryResponse,
  StudyCoil,
} from './studies-dto';
import type { StudyInputs } from './study-columns';
import { loadStudySnapshot } from './study-snapshot';

type CreateFields = z.output<typeof createRevisionRequest>;

/** How a revision keeps its frozen parts in its jsonb columns. */
interface StoredInputs extends StudyInputs {
  inputsHash: string;
}
interface StoredResults {
  resultKinds: string[];
  runs: SweepRunResponse[];
}

/**
 * Revisions: immutable snapshots of a study — its inputs, copies of both coils, the engine
 * version and the newest succeeded run of each sweep kind computed from exactly those inputs.
 * There is no update or delete (a database trigger refuses updates too); a study's revisions go
 * only when the study itself is deleted.
 */
export class RevisionsService {
  constructor(private readonly db: Database) {}

  async create(
    workspaceId: string,
    studyId: string,
    actorId: string,
    fields: CreateFields,
  ): Promise<RevisionResponse> {
    return this.db.transaction(async (tx) => {
      // Locking the study row serialises revision saves of one study, so max + 1 cannot be
      // taken twice, and keeps a save of the study from slipping in while the snapshot is read.
      const study = await studiesRepo.findStudy(tx, workspaceId, studyId, 'update');
      if (!study) throw new NotFoundError('No such study');
      if (study.version !== fields.studyVersion) {
        const names = await studiesRepo.displayNames(tx, [study.updatedBy]);
        const message = staleStudyMessage({
          by: study.updatedBy ? (names.get(study.updatedBy) ?? null) : null,
          at: study.updatedAt,
          version: study.version,
          sentVersion: fields.studyVersion,
        });
        throw new StaleVersionError(message, study.version);
      }
      const snapshot = await loadStudySnapshot(tx, study);
      const runs = await revisionsRepo.matchingRuns(
        tx,
        studyId,
        snapshot.inputsHash,
        ENGINE_VERSION,
      );
      const names = await studiesRepo.displayNames(
        tx,
        runs.map((r) => r.requestedBy),
      );
      const frozenRuns = runs.map((run) =>
        toSweepRunResponse(run, {
          currentHash: snapshot.inputsHash,
          requestedBy: run.requestedBy
            ? { userId: run.requestedBy, displayName: names.get(run.requestedBy) ?? '' }
            : null,
          withResult: true,
        }),
      );
      const inputs: StoredInputs = { ...snapshot.inputs, inputsHash: snapshot.inputsHash };
      const results: StoredResults = {
        resultKinds: frozenRuns.map((r) => r.kind),
        runs: frozenRuns,
      };
      const number = await revisionsRepo.nextRevisionNumber(tx, studyId);
      const row = await revisionsRepo.insertRevision(tx, {
        studyId,
        number,
        summary: fields.summary,
        inputs: inputs as unknown as Record<string, unknown>,
        coilSnapshots: { tx: snapshot.txCoil, rx: snapshot.rxCoil },
        engineVersion: ENGINE_VERSION,
        results: results as unknown as Record<string, unknown>,
        createdBy: actorId,
      });
      await revisionsRepo.linkRunsToRevision(
        tx,
        runs.map((r) => r.id),
        row.id,
      );
      await recordAudit(tx, {
        workspaceId,
        actorId,
        action: 'revision.created',
        subject: `${study.name} — revision ${number}`,
        details: { studyId, revisionId: row.id, number, resultKinds: results.resultKinds },
      });
      return this.toResponse(tx, row);
    });
  }

  async list(workspaceId: string, studyId: string): Promise<RevisionSummaryResponse[]> {
    await this.requireStudy(workspaceId, studyId);
    const rows = await revisionsRepo.listRevisions(this.db, studyId);
    const names = await studiesRepo.displayNames(
      this.db,
      rows.map((r) => r.createdBy),
    );
    return rows.map((r) => ({
      id: r.id,
      number: r.number,
      summary: r.summary,
      engineVersion: r.engineVersion,
      inputsHash: r.inputsHash,
      resultKinds: r.resultKinds ?? [],
      createdBy: r.createdBy
        ? { userId: r.createdBy, displayName: names.get(r.createdBy) ?? '' }
        : null,
      createdAt: r.createdAt.toISOString(),
    }));
  }

  async get(workspaceId: string, studyId: string, revisionId: string): Promise<RevisionResponse> {
    await this.requireStudy(workspaceId, studyId);
    const row = await revisionsRepo.findRevision(this.db, studyId, revisionId);
    if (!row) throw new NotFoundError('No such revision of this study');
    return this.toResponse(this.db, row);
  }

  private async requireStudy(workspaceId: string, studyId: string): Promise<void> {
    if (!(await studiesRepo.findStudy(this.db, workspaceId, studyId))) {
      throw new NotFoundError('No such study');
    }
  }

  private async toResponse(ex: Executor, row: StudyRevisionRow): Promise<RevisionResponse> {
    const { inputsHash, ...inputs } = row.inputs as unknown as StoredInputs;
    const results = (row.results ?? { resultKinds: [], runs: [] }) as unknown as StoredResults;
    const snapshots = row.coilSnapshots as unknown as { tx: StudyCoil; rx: StudyCoil };
    const names = await studiesRepo.displayNames(ex, [row.createdBy]);
    return {
      id: row.id,
      number: row.number,
      summary: row.summary,
      engineVersion: row.engineVersion,
      inputsHash,
      resultKinds: results.resultKinds,
      createdBy: row.createdBy
        ? { userId: row.createdBy, displayName: names.get(row.createdBy) ?? '' }
        : null,
      createdAt: row.createdAt.toISOString(),
      inputs,
      coilSnapshots: { tx: snapshots.tx, rx: snapshots.rx },
      results: { runs: results.runs },
    };
  }
}
