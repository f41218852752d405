import type { z } from 'zod';
import type { Coil } from '../../../physics/src/index';
import type { CoilRow } from '../../../schema/src/index';
import { recordAudit } from '../audit/audit-repository';
import type { Database, Executor } from '../db/database';
import { ConflictError, InUseError, NotFoundError, StaleVersionError } from '../errors/app-errors';
import { coilValues, type CoilInput } from './coil-values';
import { copyName } from './copy-name';
import type { CoilResponse, ListCoilsQuery, updateCoilRequest } from './coils-dto';
import * as repo from './coils-repository';
import { FOREIGN_KEY_VIOLATION, postgresError, UNIQUE_VIOLATION } from './postgres-error';
import { staleCoilMessage } from './stale-coil-message';
import { storedCoilFigures } from './stored-coil-figures';

type CoilUpdate = z.output<typeof updateCoilRequest>;
type UsedBy = { id: string; name: string }[];

/** How often a duplicate retries when another save took the "(copy n)" name it picked. */
const COPY_NAME_ATTEMPTS = 5;

export class CoilsService {
  constructor(private readonly db: Database) {}

  async list(workspaceId: string, query: ListCoilsQuery): Promise<CoilResponse[]> {
    const rows = await repo.listCoils(this.db, workspaceId, query);
    const usedBy = await repo.studiesUsingCoils(
      this.db,
      workspaceId,
      rows.map((r) => r.id),
    );
    return rows.map((row) => toResponse(row, usedBy.get(row.id) ?? []));
  }

  async get(workspaceId: string, coilId: string): Promise<CoilResponse> {
    return this.read(this.db, workspaceId, coilId);
  }

  async create(workspaceId: string, actorId: string, input: CoilInput): Promise<CoilResponse> {
    const values = coilValues(input);
    return this.db.transaction(async (tx) => {
      const row = await nameGuard(input.name, () =>
        repo.insertCoil(tx, workspaceId, actorId, values),
      );
      await recordAudit(tx, {
        workspaceId,
        actorId,
        action: 'coil.created',
        subject: row.name,
        details: { coilId: row.id, kind: row.kind },
      });
      return this.read(tx, workspaceId, row.id);
    });
  }

  /** A full replacement, accepted only from the version that is stored now. */
  async update(
    workspaceId: string,
    coilId: string,
    actorId: string,
    input: CoilUpdate,
  ): Promise<CoilResponse> {
    // The models run before the transaction opens: a heavy coil must not hold a connection.
    const values = coilValues(input);
    return this.db.transaction(async (tx) => {
      const row = await nameGuard(input.name, () =>
        repo.updateCoilAtVersion(tx, workspaceId, coilId, input.version, actorId, values),
      );
      if (!row) throw await this.whyNotSaved(tx, workspaceId, coilId, input.version);
      await recordAudit(tx, {
        workspaceId,
        actorId,
        action: 'coil.updated',
        subject: row.name,
        details: { coilId, version: row.version },
      });
      return this.read(tx, workspaceId, coilId);
    });
  }

  /** A copy under a new name: the given one, or "<name> (copy)", "(copy 2)" … when none. */
  async duplicate(
    workspaceId: string,
    coilId: string,
    actorId: string,
    name: string | undefined,
  ): Promise<CoilResponse> {
    const source = await repo.findCoil(this.db, workspaceId, coilId);
    if (!source) throw new NotFoundError('No such coil in this workspace');
    for (let attempt = 1; ; attempt++) {
      const target =
        name ??
        copyName(source.name, await repo.namesStartingWith(this.db, workspaceId, source.name));
      try {
        return await this.db.transaction(async (tx) => {
          const row = await repo.insertCoil(tx, workspaceId, actorId, copiedValues(source, target));
          await recordAudit(tx, {
            workspaceId,
            actorId,
            action: 'coil.duplicated',
            subject: row.name,
            details: { coilId: row.id, fromCoilId: source.id, fromName: source.name },
          });
          return this.read(tx, workspaceId, row.id);
        });
      } catch (error) {
        if (!isNameTaken(error)) throw error;
        // A name the caller chose is theirs to change; a generated one is retried.
        if (name !== undefined || attempt >= COPY_NAME_ATTEMPTS) throw nameConflict(target);
      }
    }
  }

  /**
   * Deletes a coil no study uses. The row is locked first, so a study cannot start using it
   * between the check and the delete; the foreign key (restrict) backs the check up.
   */
  async delete(
    workspaceId: string,
    coilId: string,
    actorId: string,
    version: number | undefined,
  ): Promise<void> {
    try {
      await this.db.transaction(async (tx) => {
        const coil = await repo.lockCoil(tx, workspaceId, coilId);
        if (!coil) throw new NotFoundError('No such coil in this workspace');
        if (version !== undefined && version !== coil.version) {
          throw await this.whyNotSaved(tx, workspaceId, coilId, version);
        }
        const usedBy = (await repo.studiesUsingCoils(tx, workspaceId, [coilId])).get(coilId);
        if (usedBy?.length) throw inUse(coil.name, usedBy);
        await repo.deleteCoil(tx, workspaceId, coilId);
        await recordAudit(tx, {
          workspaceId,
          actorId,
          action: 'coil.deleted',
          subject: coil.name,
          details: { coilId, version: coil.version },
        });
      });
    } catch (error) {
      if (postgresError(error)?.code !== FOREIGN_KEY_VIOLATION) throw error;
      const coil = await repo.findCoil(this.db, workspaceId, coilId);
      const usedBy = (await repo.studiesUsingCoils(this.db, workspaceId, [coilId])).get(coilId);
      throw inUse(coil?.name ?? 'This coil', usedBy ?? []);
    }
  }

  private async read(ex: Executor, workspaceId: string, coilId: string): Promise<CoilResponse> {
    const row = await repo.findCoil(ex, workspaceId, coilId);
    if (!row) throw new NotFoundError('No such coil in this workspace');
    const usedBy = await repo.studiesUsingCoils(ex, workspaceId, [coilId]);
    return toResponse(row, usedBy.get(coilId) ?? []);
  }

  /** The error for a save that matched no row: the coil is gone, or someone saved first. */
  private async whyNotSaved(
    ex: Executor,
    workspaceId: string,
    coilId: string,
    sentVersion: number,
  ): Promise<Error> {
    const now = await repo.findCoil(ex, workspaceId, coilId);
    if (!now) return new NotFoundError('No such coil in this workspace');
    return new StaleVersionError(
      staleCoilMessage({
        by: now.updatedByName,
        at: now.updatedAt,
        version: now.version,
        sentVersion,
      }),
      now.version,
    );
  }
}

function copiedValues(source: CoilRow, name: string): repo.CoilValues {
  return {
    name,
    kind: source.kind,
    description: source.description,
    spec: source.spec,
    operatingFrequencyHz: source.operatingFrequencyHz,
    ratedCurrentA: source.ratedCurrentA,
    // The same spec at the same operating point: the stored figures are the copy's figures.
    selfInductanceH: source.selfInductanceH!,
    dcResistanceOhm: source.dcResistanceOhm!,
    acResistanceOhm: source.acResistanceOhm,
    qualityFactor: source.qualityFactor,
    wireLengthM: source.wireLengthM!,
  };
}

function toResponse(row: repo.CoilWithPeople, usedBy: UsedBy): CoilResponse {
  return {
    id: row.id,
    workspaceId: row.workspaceId,
    name: row.name,
    description: row.description,
    kind: row.kind,
    spec: row.spec as unknown as Coil,
    operatingFrequencyHz: row.operatingFrequencyHz,
    ratedCurrentA: row.ratedCurrentA,
    figures: storedCoilFigures(row),
    usedBy,
    version: row.version,
    createdBy: person(row.createdBy, row.createdByName),
    updatedBy: person(row.updatedBy, row.updatedByName),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

function person(userId: string | null, displayName: string | null) {
  return userId ? { userId, displayName: displayName ?? '' } : null;
}

function isNameTaken(error: unknown): boolean {
  const pg = postgresError(error);
  return pg?.code === UNIQUE_VIOLATION && pg.constraint === 'coils_workspace_name_unique';
}

function nameConflict(name: string): ConflictError {
  return new ConflictError(`A coil named "${name}" already exists in this workspace`, 'name');
}

/** Runs a write and turns a clash on the workspace's coil names into a 409 on `name`. */
async function nameGuard<T>(name: string, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (isNameTaken(error)) throw nameConflict(name);
    throw error;
  }
}

function inUse(coilName: string, usedBy: UsedBy): InUseError {
  const names = usedBy.map((s) => `"${s.name}"`).join(', ');
  const what =
    usedBy.length === 0
      ? 'is used by a study'
      : `is used by ${usedBy.length === 1 ? 'the study' : `${usedBy.length} studies:`} ${names}`;
  return new InUseError(
    `"${coilName}" ${what}; choose another Tx or Rx there, or delete the study, first`,
    usedBy,
  );
}
