import { requirePositive } from '../guards/require-positive';

/**
 * L/R time constant of a coil: how fast its current settles after a step of voltage.
 *
 * Method: tau = L / R (first-order RL circuit), normally with the DC resistance, since a step
 * response is dominated by its slow part.
 *
 * References: any circuit-theory text (first-order circuits).
 *
 * @param L inductance, H
 * @param R resistance, Ω
 * @returns time constant, s
 * @example timeConstant(24e-6, 0.05) // 4.8e-4 s
 */
export function timeConstant(L: number, R: number): number {
  requirePositive('L', L, 'H');
  requirePositive('R', R, 'Ω');
  return L / R;
}
