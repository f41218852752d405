import type { Coil } from '../coils/coil-schema';
import { coilResistance } from '../conductors/coil-resistance';
import { requireNonNegative } from '../guards/require-non-negative';
import { selfInductance } from '../inductance/self-inductance';
import { qualityFactor } from './quality-factor';
import { storedEnergy } from './stored-energy';
import { timeConstant } from './time-constant';

/** The figures of one coil that the coil library shows live. */
export interface CoilFigures {
  /** Low-frequency self-inductance (uniform-current self terms, backing included), H. */
  L: number;
  /** DC resistance, Ω. */
  Rdc: number;
  /** AC resistance at the frequency (skin effect only), Ω; null without a frequency. */
  Rac: number | null;
  /** Q = ωL/R_ac; null without a frequency. */
  Q: number | null;
  /** ½ L I² at the given current, J. */
  storedEnergy: number;
  /** L / R_dc, s. */
  timeConstant: number;
  /** Conductor length, m. */
  wireLength: number;
  /** Skin depth in copper at the frequency, m; null without a frequency. */
  skinDepth: number | null;
}

export interface CoilFigureOptions {
  /** Operating frequency, Hz (omit for DC-only figures). */
  frequency?: number;
  /** Coil current for the stored energy, A (default 1: the figure per ampere squared). */
  current?: number;
  /** Conductor temperature, °C (default 20). */
  temperature?: number;
}

/**
 * Inductance, resistance, Q, stored energy and time constant of one copper coil.
 *
 * Method: L from selfInductance (filament model, low-frequency self terms, ferrite backing by
 * images); R_dc and R_ac from coilResistance (skin effect only — proximity effect neglected, so
 * R_ac is a lower bound and Q an upper bound); Q = ωL/R_ac; W = ½LI²; tau = L/R_dc. The same L is
 * used at every frequency: skin effect removes the wire's internal inductance (the ring's "−7/4"
 * becomes "−2"), a few percent of L for a single turn and less for multi-turn coils, whose L is
 * mostly mutual terms between turns.
 *
 * References: see selfInductance, coilResistance, qualityFactor, storedEnergy, timeConstant.
 *
 * @param coil a validated coil (m)
 * @param options frequency (Hz), current (A), temperature (°C)
 * @returns the figures (SI units)
 * @example coilFigures({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }, { frequency: 85e3 }).Q
 *   // ≈ 14.4
 */
export function coilFigures(coil: Coil, options: CoilFigureOptions = {}): CoilFigures {
  const current = options.current ?? 1;
  requireNonNegative('current', current, 'A');
  const L = selfInductance(coil);
  const r = coilResistance(coil, {
    frequency: options.frequency,
    temperature: options.temperature,
  });
  return {
    L,
    Rdc: r.Rdc,
    Rac: r.Rac,
    Q: r.Rac === null ? null : qualityFactor(L, r.Rac, options.frequency as number),
    storedEnergy: storedEnergy(L, current),
    timeConstant: timeConstant(L, r.Rdc),
    wireLength: r.wireLength,
    skinDepth: r.skinDepth,
  };
}
