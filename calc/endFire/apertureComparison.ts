/**
 * The broadside comparison for an end-fire structure of length L: a uniformly illuminated
 * square aperture of side L (same length, area L²), D = 4π L²/λ² (Balanis, "Antenna Theory",
 * 4th ed., §12.5 (section number from memory): the maximum directivity of a uniform aperture, 4πA/λ², for apertures many λ across).
 */
import { requirePositive } from '../errors';
import { apertureGainFromArea, areaForGainM2 } from '../aperture/index';

/** Directivity (linear) of a uniformly illuminated square aperture of side L (λ): 4π L²/λ². */
export function squareApertureDirectivity(sideWavelengths: number): number {
  requirePositive('sideWavelengths', sideWavelengths, 'λ');
  return apertureGainFromArea(sideWavelengths * sideWavelengths, 1);
}

/** Side (λ) of the uniformly illuminated square aperture that gives the directivity D: √(D/4π). */
export function squareApertureSideForDirectivity(directivity: number): number {
  requirePositive('directivity', directivity);
  return Math.sqrt(areaForGainM2(directivity, 1));
}
