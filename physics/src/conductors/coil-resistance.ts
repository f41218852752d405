import type { Coil } from '../coils/coil-schema';
import { windingLength } from '../coils/winding-length';
import { acResistanceFactor } from './ac-resistance-factor';
import { coilConductor } from './coil-conductor';
import { copperResistivity } from './copper-resistivity';
import { dcResistance } from './dc-resistance';
import { skinDepth } from './skin-depth';

/** Resistance figures of a coil's winding. */
export interface CoilResistance {
  /** Conductor length, m (leads excluded). */
  wireLength: number;
  /** DC resistance, Ω. */
  Rdc: number;
  /** AC resistance at the frequency, Ω (skin effect only; null without a frequency). */
  Rac: number | null;
  /** Skin depth in the conductor, m (null without a frequency). */
  skinDepth: number | null;
  /** Resistivity used, Ω·m. */
  resistivity: number;
}

export interface CoilResistanceOptions {
  /** Operating frequency, Hz; omit for DC figures only. */
  frequency?: number;
  /** Conductor temperature, °C (default 20). */
  temperature?: number;
}

/**
 * DC and AC resistance of a copper coil.
 *
 * Method: wire length from the coil model (windingLength), R_dc = rho(T)·l/A with the
 * conductor's metal cross-section (Litz: strands in parallel), rho(T) of annealed copper
 * (copperResistivity); R_ac = R_dc · F(δ) with δ = sqrt(rho/(π f mu0)) and the skin-effect
 * factor of acResistanceFactor (round wire: exact Bessel solution; Litz: per strand; trace: plate
 * solution). Proximity effect between turns and strands is NOT included, so R_ac is a lower
 * bound — often by a factor of 2 or more for tightly wound multi-turn coils at 100 kHz+.
 *
 * References: see copperResistivity, skinDepth, roundWireAcFactor, traceAcFactor.
 *
 * @param coil a validated coil (m)
 * @param options frequency (Hz) and temperature (°C)
 * @returns wire length (m), R_dc and R_ac (Ω), skin depth (m), resistivity (Ω·m)
 * @example coilResistance({ kind: 'ring', radius: 0.02, wireRadius: 5e-4 }, { frequency: 85e3 })
 *   // { wireLength ≈ 0.1257, Rdc ≈ 2.75e-3, Rac ≈ 3.74e-3, skinDepth ≈ 2.26e-4, … }
 */
export function coilResistance(coil: Coil, options: CoilResistanceOptions = {}): CoilResistance {
  const resistivity = copperResistivity(options.temperature);
  const conductor = coilConductor(coil);
  const wireLength = windingLength(coil);
  const Rdc = dcResistance(wireLength, conductor, resistivity);
  if (options.frequency === undefined) {
    return { wireLength, Rdc, Rac: null, skinDepth: null, resistivity };
  }
  const delta = skinDepth(resistivity, options.frequency);
  return {
    wireLength,
    Rdc,
    Rac: Rdc * acResistanceFactor(conductor, delta),
    skinDepth: delta,
    resistivity,
  };
}
