import { requireInteger, requirePositive } from '../errors';
import { MAX_ARRAY_ELEMENTS } from './limits';

/**
 * Ordinary end-fire progressive phase δ = −kd (rad per element) that puts the beam of a line on
 * +x (θ = 90°, φ = 0°), with element n getting phase n·δ. Balanis, "Antenna Theory", 4th ed., §6.3 (section number from memory).
 */
export function ordinaryEndFirePhaseStepRad(spacingWavelengths: number): number {
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  return -2 * Math.PI * spacingWavelengths;
}

/**
 * Hansen–Woodyard increased-directivity end-fire phase step δ = −(kd + 2.92/N) rad toward +x
 * (2.92/N ≈ π/N). Balanis, "Antenna Theory", 4th ed., §6.4 (section number from memory; Hansen & Woodyard, Proc. IRE 1938).
 * Pass approximation 'piOverN' for the δ = −(kd + π/N) form.
 */
export function hansenWoodyardPhaseStepRad(count: number, spacingWavelengths: number, approximation: 'exact' | 'piOverN' = 'exact'): number {
  requireInteger('count', count, 1, MAX_ARRAY_ELEMENTS);
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  const extra = approximation === 'piOverN' ? Math.PI / count : 2.92 / count;
  return -(2 * Math.PI * spacingWavelengths + extra);
}
