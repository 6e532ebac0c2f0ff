import { CalcInputError } from '../errors';

/**
 * Taper (illumination) efficiency of element amplitudes: |Σ a_n|² / (N Σ |a_n|²), 1 for uniform
 * excitation (e.g. Mailloux, "Phased Array Antenna Handbook", 2nd ed., §3.1 (section number from memory)).
 */
export function taperEfficiency(amplitudes: ArrayLike<number>): number {
  let sum = 0, sumSquares = 0;
  for (let n = 0; n < amplitudes.length; n++) { sum += amplitudes[n]; sumSquares += amplitudes[n] * amplitudes[n]; }
  if (!(sumSquares > 0)) throw new CalcInputError('amplitudes', 'expected at least one non-zero amplitude');
  return (sum * sum) / (amplitudes.length * sumSquares);
}
