import { requireNonNegative } from '../guards/require-non-negative';
import { requirePositive } from '../guards/require-positive';

/**
 * Voltage across a coil (and, at resonance, across its series capacitor) at a given current.
 *
 * Method: |V_L| = ω L I. At series resonance the capacitor carries the same magnitude in
 * anti-phase, so this is the voltage the insulation of both must stand — often far above the
 * supply voltage. Caution: resonant tanks reach hundreds of volts in consumer pads and kilovolts
 * in vehicle pads; follow local codes and licensed practice.
 *
 * References: textbook resonance; CHECK: 100 µH at 30 A, 85 kHz → 1.6 kV.
 *
 * @param L inductance, H
 * @param frequency Hz
 * @param I current through the coil, A (rms in → rms out)
 * @returns voltage magnitude, V
 * @example resonantVoltage(100e-6, 85e3, 30) // ≈ 1602 V
 */
export function resonantVoltage(L: number, frequency: number, I: number): number {
  requirePositive('L', L, 'H');
  requirePositive('frequency', frequency, 'Hz');
  requireNonNegative('current', I, 'A');
  return 2 * Math.PI * frequency * L * I;
}
