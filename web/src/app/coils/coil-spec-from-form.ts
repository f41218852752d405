import type { CoilFormValue } from './coil-form';
import { parsePointsText } from './coil-points-text';

/** A problem the form finds before the engine sees the spec (unreadable pasted points). */
export interface FormProblem {
  control: string;
  message: string;
}

export interface AssembledSpec {
  /** The spec as the engine reads it; missing required values are left out. */
  spec: Record<string, unknown>;
  problems: FormProblem[];
}

/** Leaves out what is null, so the engine reports a missing value rather than a wrong type. */
function defined(fields: Record<string, unknown>): Record<string, unknown> {
  return Object.fromEntries(Object.entries(fields).filter(([, value]) => value !== null));
}

/**
 * Builds the coil spec (SI units, the engine's JSON) from the editor's values: only the fields of
 * the chosen kind, the chosen conductor, and the ferrite backing when it is switched on.
 *
 * @param value the form's raw value
 * @returns the spec and the problems found on the way
 */
export function coilSpecFromForm(value: CoilFormValue): AssembledSpec {
  const problems: FormProblem[] = [];
  const layered = defined({
    layers: value.layers,
    layerSpacing: (value.layers ?? 1) > 1 ? value.layerSpacing : null,
  });
  const conductor = conductorSpec(value);
  let geometry: Record<string, unknown>;
  switch (value.kind) {
    case 'ring':
      geometry = defined({ radius: value.radius, wireRadius: value.wireRadius });
      break;
    case 'rings':
      geometry = defined({
        wireRadius: value.wireRadius,
        rings: value.rings.map((ring) => defined({ r: ring.r, z: ring.z })),
      });
      break;
    case 'circular-spiral':
      geometry = defined({
        turns: value.turns,
        ...(value.sizing === 'diameters'
          ? { innerDiameter: value.innerDiameter, outerDiameter: value.outerDiameter }
          : { innerRadius: value.innerRadius, pitch: value.pitch }),
        ...layered,
        model: value.spiralModel,
        conductor,
      });
      break;
    case 'rectangular-spiral':
      geometry = defined({
        outerWidth: value.outerWidth,
        outerHeight: value.outerHeight,
        cornerRadius: value.cornerRadius ?? 0,
        pitch: value.pitch,
        turns: value.turns,
        ...layered,
        conductor,
      });
      break;
    case 'solenoid':
      geometry = defined({
        radius: value.radius,
        length: value.length,
        turns: value.turns,
        ...layered,
        model: value.solenoidModel,
        conductor,
      });
      break;
    case 'path': {
      const parsed = parsePointsText(value.points);
      if ('error' in parsed) problems.push({ control: 'points', message: parsed.error });
      geometry = {
        points: 'points' in parsed ? parsed.points : [],
        closed: value.closed,
        conductor,
      };
      break;
    }
  }
  const backing = value.hasBacking
    ? { backing: defined({ mur: value.mur, distance: value.backingDistance }) }
    : {};
  return { spec: { kind: value.kind, ...geometry, ...backing }, problems };
}

function conductorSpec(value: CoilFormValue): Record<string, unknown> {
  switch (value.conductorType) {
    case 'round':
      return defined({ type: 'round', diameter: value.wireDiameter });
    case 'litz':
      return defined({
        type: 'litz',
        strands: value.strands,
        strandDiameter: value.strandDiameter,
        bundleDiameter: value.bundleDiameter,
      });
    case 'trace':
      return defined({ type: 'trace', width: value.traceWidth, thickness: value.traceThickness });
  }
}
