import type { Conductor } from './conductor';
import { conductorArea } from './conductor-area';
import { roundWireAcFactor } from './round-wire-ac-factor';
import { traceAcFactor } from './trace-ac-factor';

/**
 * Skin-effect factor R_ac/R_dc of a conductor at a given skin depth.
 *
 * Method, by conductor:
 * - round wire: the exact Bessel-function solution for an isolated wire (roundWireAcFactor);
 * - Litz wire: each strand carries an equal share of the current (ideal transposition), so the
 *   bundle's factor is the strand's round-wire factor with d = strandDiameter. The proximity
 *   effect — strand-on-strand inside the bundle and turn-on-turn in the winding — is NEGLECTED,
 *   although at 85–200 kHz it usually dominates a Litz winding's AC loss; the result is a lower
 *   bound. A Dowell/Sullivan-style proximity factor needs the winding's field and is left out;
 * - trace: the plate solution across the thickness (traceAcFactor), width ≫ thickness assumed.
 *
 * References: see roundWireAcFactor and traceAcFactor; for Litz, C. R. Sullivan, "Optimal choice
 * for number of strands in a litz-wire transformer winding", IEEE Trans. Power Electronics 14(2),
 * 1999 (skin vs proximity terms).
 *
 * @param conductor the conductor, dimensions in m
 * @param delta skin depth, m (Infinity for DC)
 * @returns R_ac/R_dc (≥ 1)
 * @example acResistanceFactor({ type: 'litz', strands: 100, strandDiameter: 0.1e-3 }, 0.226e-3)
 *   // ≈ 1.00005 (0.1 mm strands at 85 kHz)
 */
export function acResistanceFactor(conductor: Conductor, delta: number): number {
  conductorArea(conductor); // validates every dimension with a field-naming error
  switch (conductor.type) {
    case 'round':
      return roundWireAcFactor(conductor.diameter, delta);
    case 'litz':
      return roundWireAcFactor(conductor.strandDiameter, delta);
    case 'trace':
      return traceAcFactor(conductor.thickness, delta);
  }
}
