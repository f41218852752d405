import type { z } from 'zod';
import type { StudyRow } from '../../../schema/src/index';
import { recordAudit } from '../audit/audit-repository';
import type { Database, Executor } from '../db/database';
import {
  ConflictError,
  NotFoundError,
  StaleVersionError,
  ValidationError,
} from '../errors/app-errors';
import { roleAtLeast } from '../workspaces/role-rank';
import type { Role } from '../workspaces/workspaces-dto';
import * as repo from './studies-repository';
import type {
  createStudyRequest,
  StudyResponse,
  StudySummaryResponse,
  updateStudyRequest,
} from './studies-dto';
import { staleStudyMessage } from './stale-study-message';
import { studyColumns, studyThreshold } from './study-columns';
import { loadStudySnapshot } from './study-snapshot';

type CreateFields = z.output<typeof createStudyRequest>;
type UpdateFields = z.output<typeof updateStudyRequest>;

const nameConstraint = 'studies_workspace_name_unique';

/** Studies of a workspace: a Tx and an Rx from its coil library and the operating point. */
export class StudiesService {
  constructor(private readonly db: Database) {}

  async list(workspaceId: string): Promise<StudySummaryResponse[]> {
    const rows = await repo.listStudies(this.db, workspaceId);
    const ids = rows.map((r) => r.id);
    const [counts, runs] = await Promise.all([
      repo.revisionCounts(this.db, ids),
      repo.lastRuns(this.db, ids),
    ]);
    return rows.map((r) => {
      const run = runs.get(r.id);
      return {
        id: r.id,
        name: r.name,
        txCoil: { id: r.txCoilId ?? '', name: r.txCoilName ?? '' },
        rxCoil: { id: r.rxCoilId ?? '', name: r.rxCoilName ?? '' },
        frequencyHz: r.operatingFrequencyHz ?? 0,
        threshold: studyThreshold(r),
        revisionCount: counts.get(r.id) ?? 0,
        lastRun: run
          ? {
              id: run.id,
              kind: run.kind,
              status: run.status,
              finishedAt: run.finishedAt?.toISOString() ?? null,
            }
          : null,
        updatedAt: r.updatedAt.toISOString(),
      };
    });
  }

  async get(workspaceId: string, studyId: string): Promise<StudyResponse> {
    const row = await repo.findStudy(this.db, workspaceId, studyId);
    if (!row) throw new NotFoundError('No such study');
    return this.toResponse(this.db, row);
  }

  async create(workspaceId: string, actorId: string, fields: CreateFields): Promise<StudyResponse> {
    return this.withNameCheck(fields.name, () =>
      this.db.transaction(async (tx) => {
        await this.requireCoils(tx, workspaceId, fields);
        const row = await repo.insertStudy(tx, {
          ...studyColumns(fields),
          workspaceId,
          createdBy: actorId,
        });
        await recordAudit(tx, {
          workspaceId,
          actorId,
          action: 'study.created',
          subject: row.name,
          details: { studyId: row.id },
        });
        return this.toResponse(tx, row);
      }),
    );
  }

  /** A full replacement, refused when `fields.version` is not the stored version. */
  async update(
    workspaceId: string,
    studyId: string,
    actorId: string,
    fields: UpdateFields,
  ): Promise<StudyResponse> {
    return this.withNameCheck(fields.name, () =>
      this.db.transaction(async (tx) => {
        const before = await repo.findStudy(tx, workspaceId, studyId);
        if (!before) throw new NotFoundError('No such study');
        await this.requireCoils(tx, workspaceId, fields);
        const row = await repo.updateStudyIfVersion(
          tx,
          { workspaceId, studyId, version: fields.version },
          { ...studyColumns(fields), updatedBy: actorId },
        );
        if (!row) throw await this.staleOrMissing(tx, workspaceId, studyId, fields.version);
        await recordAudit(tx, {
          workspaceId,
          actorId,
          action: 'study.updated',
          subject: row.name,
          details: {
            studyId,
            version: row.version,
            ...(before.name !== row.name && { from: before.name }),
          },
        });
        return this.toResponse(tx, row);
      }),
    );
  }

  /**
   * Deletes a study with its sweep runs and revisions (the schema cascades). Revisions are
   * reviewed work that comments and decisions point at, so a study that has any is deleted by an
   * owner only; an editor gets a 409 that says so.
   */
  async delete(
    workspaceId: string,
    studyId: string,
    actor: { id: string; role: Role },
    version: number | undefined,
  ): Promise<void> {
    await this.db.transaction(async (tx) => {
      // The lock keeps a revision from being saved between the count and the delete.
      const row = await repo.findStudy(tx, workspaceId, studyId, 'update');
      if (!row) throw new NotFoundError('No such study');
      if (version !== undefined && version !== row.version) {
        throw await this.staleOrMissing(tx, workspaceId, studyId, version);
      }
      const revisions = await repo.countRevisions(tx, studyId);
      if (revisions > 0 && !roleAtLeast(actor.role, 'owner')) {
        throw new ConflictError(
          `"${row.name}" has ${revisions} saved revision${revisions === 1 ? '' : 's'}; only a ` +
            'workspace owner can delete a study with revisions (its revisions, their review ' +
            'comments and its sweep runs are deleted with it)',
        );
      }
      await repo.deleteStudy(tx, studyId);
      await recordAudit(tx, {
        workspaceId,
        actorId: actor.id,
        action: 'study.deleted',
        subject: row.name,
        details: { studyId, revisions },
      });
    });
  }

  /** Both coils must be coils of this workspace; any other id is answered like a missing one. */
  private async requireCoils(
    ex: Executor,
    workspaceId: string,
    fields: { txCoilId: string; rxCoilId: string },
  ): Promise<void> {
    const found = await repo.findWorkspaceCoils(ex, workspaceId, [
      fields.txCoilId,
      fields.rxCoilId,
    ]);
    const ids = new Set(found.map((c) => c.id));
    for (const field of ['txCoilId', 'rxCoilId'] as const) {
      if (!ids.has(fields[field])) {
        throw new ValidationError(`${field}: no such coil in this workspace's library`, field);
      }
    }
  }

  private async staleOrMissing(
    ex: Executor,
    workspaceId: string,
    studyId: string,
    sentVersion: number,
  ): Promise<Error> {
    const current = await repo.findStudy(ex, workspaceId, studyId);
    if (!current) return new NotFoundError('No such study');
    const names = await repo.displayNames(ex, [current.updatedBy]);
    const by = current.updatedBy ? (names.get(current.updatedBy) ?? null) : null;
    return new StaleVersionError(
      staleStudyMessage({ by, at: current.updatedAt, version: current.version, sentVersion }),
      current.version,
    );
  }

  private async withNameCheck<T>(name: string, work: () => Promise<T>): Promise<T> {
    try {
      return await work();
    } catch (error) {
      if (repo.isUniqueViolation(error, nameConstraint)) {
        throw new ConflictError(`A study named "${name}" already exists in this workspace`, 'name');
      }
      throw error;
    }
  }

  async toResponse(ex: Executor, row: StudyRow): Promise<StudyResponse> {
    // One after another: inside a transaction they share one connection.
    const snapshot = await loadStudySnapshot(ex, row);
    const latest = await repo.latestRevision(ex, row.id);
    const names = await repo.displayNames(ex, [row.createdBy, row.updatedBy]);
    const person = (id: string | null) =>
      id === null ? null : { userId: id, displayName: names.get(id) ?? '' };
    return {
      id: row.id,
      workspaceId: row.workspaceId,
      ...snapshot.inputs,
      txCoil: snapshot.txCoil,
      rxCoil: snapshot.rxCoil,
      inputsHash: snapshot.inputsHash,
      version: row.version,
      latestRevision: latest
        ? { id: latest.id, number: latest.number, createdAt: latest.createdAt.toISOString() }
        : null,
      createdBy: person(row.createdBy),
      updatedBy: person(row.updatedBy),
      createdAt: row.createdAt.toISOString(),
      updatedAt: row.updatedAt.toISOString(),
    };
  }
}
