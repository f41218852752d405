import {
  coilFigures,
  copperResistivity,
  skinDepth,
  storedEnergy,
  timeConstant,
  type Coil,
  type CoilFigures,
} from '../../../physics/src/index';
import type { CoilRow } from '../../../schema/src/index';
import type { StudyCoil } from './studies-dto';

/**
 * A library coil as a study shows it (and a revision freezes it): its spec, version and the
 * figures the library gives for it, at the library's operating frequency and rated current.
 */
export function toStudyCoil(row: CoilRow): StudyCoil {
  const spec = row.spec as unknown as Coil;
  return {
    id: row.id,
    name: row.name,
    kind: row.kind,
    spec,
    version: row.version,
    figures: libraryFigures(row, spec),
  };
}

/**
 * The figures from the library's cached columns when they are all there (the engine computed
 * them when the coil was saved; recomputing L for every study read would cost a filament
 * integration per coil), otherwise from the engine now. Stored energy, time constant and skin
 * depth follow from the cached values by their one-line formulas.
 */
function libraryFigures(row: CoilRow, spec: Coil): CoilFigures {
  const frequency = row.operatingFrequencyHz ?? undefined;
  const current = row.ratedCurrentA ?? 1;
  const L = row.selfInductanceH;
  const Rdc = row.dcResistanceOhm;
  const wireLength = row.wireLengthM;
  const acCached =
    frequency === undefined || (row.acResistanceOhm !== null && row.qualityFactor !== null);
  if (L === null || Rdc === null || wireLength === null || !acCached) {
    return coilFigures(spec, { frequency, current });
  }
  return {
    L,
    Rdc,
    Rac: frequency === undefined ? null : row.acResistanceOhm,
    Q: frequency === undefined ? null : row.qualityFactor,
    storedEnergy: storedEnergy(L, current),
    timeConstant: timeConstant(L, Rdc),
    wireLength,
    skinDepth: frequency === undefined ? null : skinDepth(copperResistivity(), frequency),
  };
}
