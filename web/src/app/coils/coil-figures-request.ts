import {
  coilFigures,
  parseCoil,
  resonantVoltage,
  type CoilFigures,
} from '../../../../physics/src/index';

/** What the editor asks the figures worker: a spec as typed, and the operating point. */
export interface CoilFiguresRequest {
  id: number;
  spec: unknown;
  /** Operating frequency, Hz; null for DC figures only. */
  frequency: number | null;
  /** Rated current, A; null means the figures per ampere (1 A). */
  current: number | null;
}

/** The live figures of a coil: physics' coilFigures plus the coil voltage at the rating. */
export interface LiveCoilFigures extends CoilFigures {
  /** ω L I at the operating frequency and rated current, V; null without a frequency. */
  coilVoltage: number | null;
  /** The current the energy and voltage are given at, A. */
  current: number;
  frequency: number | null;
}

export type CoilFiguresAnswer =
  { id: number; figures: LiveCoilFigures } | { id: number; error: string };

/**
 * Computes a coil's live figures for the editor, in the figures worker (or inline where there is
 * no worker). A spec the engine refuses answers with the engine's own message.
 *
 * Method: parseCoil (the engine's schema), then coilFigures (L by the filament model, R_dc and
 * R_ac with skin effect, Q, stored energy ½LI², L/R time constant, wire length, skin depth) and
 * resonantVoltage (ωLI); see those functions for their methods and references.
 *
 * @param request the spec and operating point
 * @returns the figures, or the error message, tagged with the request's id
 */
export function answerCoilFigures(request: CoilFiguresRequest): CoilFiguresAnswer {
  try {
    const coil = parseCoil(request.spec);
    const current = request.current ?? 1;
    const frequency = request.frequency;
    const figures = coilFigures(coil, { frequency: frequency ?? undefined, current });
    const coilVoltage =
      frequency === null || current === 0 ? null : resonantVoltage(figures.L, frequency, current);
    return { id: request.id, figures: { ...figures, coilVoltage, current, frequency } };
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    return { id: request.id, error: message };
  }
}
