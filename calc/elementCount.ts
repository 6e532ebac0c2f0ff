import { requirePositive, requireNonNegative } from './errors';
import { latticeCellAreaPerSpacingSquared, type Lattice } from './gratingLobeLimit';

/**
 * Estimated element count of a filled aperture: area ÷ area per element, rounded to the nearest
 * whole number (edge cells ignored). Square lattice cell d², equilateral triangular (√3/2)d².
 */
export function elementCountEstimate(areaM2: number, spacingM: number, lattice: Lattice): number {
  requireNonNegative('areaM2', areaM2, 'm²');
  requirePositive('spacingM', spacingM, 'm');
  return Math.round(areaM2 / (latticeCellAreaPerSpacingSquared(lattice) * spacingM * spacingM));
}
