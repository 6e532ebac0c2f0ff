/**
 * Conventional far-field (Fraunhofer) distance 2D²/λ of an aperture whose largest dimension is D:
 * there the path difference from the centre and the edge of the aperture to the observer is at
 * most λ/16 (a phase error of π/8). Sources:
 * IEEE Std 149-2021, IEEE Recommended Practice for Antenna Measurements; C. A. Balanis, Antenna Theory: Analysis and Design, 4th ed., Wiley, 2016,
 * §2.2.4 (section number from memory).
 */
import { requirePositive } from '../errors';

/** Far-field distance 2D²/λ in metres, D the largest dimension of the aperture (m), λ in m. */
export function farFieldDistanceM(largestDimensionM: number, wavelengthM: number): number {
  requirePositive('diameterM', largestDimensionM, 'm');
  requirePositive('wavelengthM', wavelengthM, 'm');
  return (2 * largestDimensionM * largestDimensionM) / wavelengthM;
}
