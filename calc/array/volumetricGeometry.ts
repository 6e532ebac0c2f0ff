import { CalcInputError, requireInteger, requirePositive } from '../errors';
import type { ArrayGeometry } from './geometry';
import { emptyPositions } from './geometry';
import { MAX_ARRAY_ELEMENTS } from './limits';

/** Volumetric array: a countX × countY × countZ block of elements at spacing (λ) on each axis, centred on the origin. */
export function volumetricGeometry(countX: number, countY: number, countZ: number, spacingWavelengths: number): ArrayGeometry {
  requireInteger('countX', countX, 1, MAX_ARRAY_ELEMENTS);
  requireInteger('countY', countY, 1, MAX_ARRAY_ELEMENTS);
  requireInteger('countZ', countZ, 1, MAX_ARRAY_ELEMENTS);
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  const count = countX * countY * countZ;
  if (count > MAX_ARRAY_ELEMENTS) {
    throw new CalcInputError('countX×countY×countZ', `expected at most ${MAX_ARRAY_ELEMENTS} elements, got ${count}`);
  }
  const positions = emptyPositions(count);
  let n = 0;
  for (let k = 0; k < countZ; k++) {
    for (let j = 0; j < countY; j++) {
      for (let i = 0; i < countX; i++) {
        positions.x[n] = (i - (countX - 1) / 2) * spacingWavelengths;
        positions.y[n] = (j - (countY - 1) / 2) * spacingWavelengths;
        positions.z[n] = (k - (countZ - 1) / 2) * spacingWavelengths;
        n++;
      }
    }
  }
  return {
    positionsWavelengths: positions, fullGrid: false,
    apertureHalfXWavelengths: (countX * spacingWavelengths) / 2,
    apertureHalfYWavelengths: (countY * spacingWavelengths) / 2,
  };
}
