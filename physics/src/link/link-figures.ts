import type { Coil } from '../coils/coil-schema';
import { coilResistance } from '../conductors/coil-resistance';
import { requireNonNegative } from '../guards/require-non-negative';
import { requirePositive } from '../guards/require-positive';
import { preparePair, type PreparedPair } from '../inductance/prepare-pair';
import type { PoseInput } from '../pose/pose-schema';
import { couplingCoefficient } from './coupling-coefficient';
import { inducedVoltage } from './induced-voltage';
import { maxLinkEfficiency } from './max-link-efficiency';
import { optimalLoad } from './optimal-load';
import { qualityFactor } from './quality-factor';
import { resonantVoltage } from './resonant-voltage';
import { seriesCompensation } from './series-compensation';

/** What the power stage sees of a Tx–Rx pair in one pose (SI units). */
export interface LinkFigures {
  /** Mutual inductance, H. */
  M: number;
  /** Coupling coefficient M / sqrt(L1 L2). */
  k: number;
  /** Tx self-inductance (backing included), H. */
  L1: number;
  /** Rx self-inductance in this pose (raised near a Tx backing), H. */
  L2: number;
  /** AC resistances of Tx and Rx at the frequency (skin effect only), Ω. */
  R1: number;
  R2: number;
  /** Unloaded quality factors ωL/R. */
  Q1: number;
  Q2: number;
  /** Maximum link efficiency (coil losses only), 0 … 1. */
  etaMax: number;
  /** Load in series with the resonant Rx that reaches etaMax, Ω. */
  optimalLoad: number;
  /** Open-circuit Rx voltage ωM·I1, V (rms if the current is rms). */
  inducedVoltage: number;
  /** Voltage across the Tx coil (and its series capacitor) ωL1·I1, V. */
  resonantVoltageTx: number;
  /** Series compensation capacitors 1/(ω²L), F. */
  C1: number;
  C2: number;
}

export interface LinkFigureOptions {
  /** Operating frequency, Hz. */
  frequency: number;
  /** Tx current, A (default 1: the voltages per ampere). */
  current?: number;
  /** Conductor temperature of both coils, °C (default 20). */
  temperature?: number;
  /** A pair already prepared for these coils, to reuse across calls (live pose controls). */
  pair?: PreparedPair;
}

/**
 * Link figures of a Tx–Rx pair at one pose: coupling, Q, maximum efficiency and the optimal
 * load, induced and resonant voltages, and series–series compensation.
 *
 * Method: M and the inductances from preparePair (L2 at the pose, so a Tx ferrite backing's
 * effect on the Rx is included); k = M/sqrt(L1 L2); R_ac of each coil from coilResistance (skin
 * effect only, so Q and eta_max are upper bounds); Q = ωL/R; eta_max = x/(1 + sqrt(1 + x))²,
 * x = k²Q1Q2; R_L,opt = R2 sqrt(1 + x); |V2| = ωM I1; |V_L1| = ωL1 I1; C = 1/(ω²L) per side.
 * Caution: the resonant voltage appears across coil and capacitor and can be lethal in vehicle
 * pads; the figures ignore ferrite saturation, nearby metal and self-resonance.
 *
 * References: M. Kiani, M. Ghovanloo, IEEE Trans. Industrial Electronics 60(11), 2013 (eta_max,
 * optimal load); see the single-figure functions for the rest.
 *
 * @param tx transmitter coil (m)
 * @param rx receiver coil (m)
 * @param pose Rx pose (m, degrees)
 * @param options frequency (Hz), current (A), temperature (°C), a prepared pair
 * @returns the figures (SI units)
 * @example linkFigures(pad50mm, pad40mm, { z: 0.003 }, { frequency: 150e3, current: 1 }).etaMax
 *   // ≈ 0.96 for two 20-turn Litz spirals, 50 and 40 mm across, 3 mm apart
 */
export function linkFigures(
  tx: Coil,
  rx: Coil,
  pose: PoseInput,
  options: LinkFigureOptions,
): LinkFigures {
  const { frequency } = options;
  requirePositive('frequency', frequency, 'Hz');
  const current = options.current ?? 1;
  requireNonNegative('current', current, 'A');
  const pair = options.pair ?? preparePair(tx, rx);
  const M = pair.mutual(pose);
  const L1 = pair.L1;
  const L2 = pair.L2At(pose);
  const k = couplingCoefficient(M, L1, L2);
  const at = { frequency, temperature: options.temperature };
  const R1 = coilResistance(tx, at).Rac as number;
  const R2 = coilResistance(rx, at).Rac as number;
  const Q1 = qualityFactor(L1, R1, frequency);
  const Q2 = qualityFactor(L2, R2, frequency);
  return {
    M,
    k,
    L1,
    L2,
    R1,
    R2,
    Q1,
    Q2,
    etaMax: maxLinkEfficiency(k, Q1, Q2),
    optimalLoad: optimalLoad(R2, k, Q1, Q2),
    inducedVoltage: inducedVoltage(M, frequency, current),
    resonantVoltageTx: resonantVoltage(L1, frequency, current),
    C1: seriesCompensation(L1, frequency),
    C2: seriesCompensation(L2, frequency),
  };
}
