import { requirePositive } from '../errors';
import type { ArrayGeometry } from './geometry';
import { emptyPositions } from './geometry';
import { requireElementCount } from './limits';

/** Uniform circular array: count elements equally spaced on a circle of radius (λ) in the x–y plane, the first on +x. */
export function uniformCircularGeometry(count: number, radiusWavelengths: number): ArrayGeometry {
  requireElementCount('count', count);
  requirePositive('radiusWavelengths', radiusWavelengths, 'λ');
  const positions = emptyPositions(count);
  for (let n = 0; n < count; n++) {
    const angle = (2 * Math.PI * n) / count;
    positions.x[n] = radiusWavelengths * Math.cos(angle);
    positions.y[n] = radiusWavelengths * Math.sin(angle);
  }
  return { positionsWavelengths: positions, fullGrid: false, apertureHalfXWavelengths: radiusWavelengths, apertureHalfYWavelengths: radiusWavelengths };
}
