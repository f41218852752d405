import { requireFinite } from '../guards/require-finite';

/**
 * Resistivity of annealed copper at 20 °C, Ω·m: the International Annealed Copper Standard (IACS,
 * 1913) value 1/58 Ω·mm²/m ≈ 1.7241e-8 Ω·m, rounded as it is usually quoted. `from memory`.
 */
export const COPPER_RESISTIVITY_20C = 1.72e-8;

/** Temperature coefficient of resistivity of annealed copper near 20 °C, 1/K. `from memory`. */
export const COPPER_TEMPERATURE_COEFFICIENT = 0.00393;

/** The reference temperature of the two constants above, °C. */
export const COPPER_REFERENCE_TEMPERATURE = 20;

/**
 * Resistivity of annealed copper at a temperature.
 *
 * Method: the linear model rho(T) = rho20 · (1 + alpha · (T − 20 °C)) with rho20 = 1.72e-8 Ω·m and
 * alpha = 0.00393 /K. The linear model is good to about 1 % from −50 °C to 150 °C, which covers
 * coil operation; outside −100 °C … 250 °C it is refused rather than extrapolated.
 *
 * References: International Annealed Copper Standard (IACS), US Bureau of Standards Circular 31
 * (1914) — constants quoted `from memory`.
 *
 * @param temperature conductor temperature, °C (default 20)
 * @returns resistivity, Ω·m
 * @example copperResistivity(100) // ≈ 2.26e-8 Ω·m
 */
export function copperResistivity(temperature: number = COPPER_REFERENCE_TEMPERATURE): number {
  requireFinite('temperature', temperature, '°C');
  // Beyond this band the linear law drifts by several percent; refuse instead of misleading.
  if (temperature < -100 || temperature > 250) {
    throw new RangeError(`temperature: must be between -100 and 250 °C (got ${temperature})`);
  }
  return (
    COPPER_RESISTIVITY_20C *
    (1 + COPPER_TEMPERATURE_COEFFICIENT * (temperature - COPPER_REFERENCE_TEMPERATURE))
  );
}
