import { requirePositive } from '../errors';
import type { ArrayGeometry } from './geometry';
import { emptyPositions } from './geometry';
import { requireElementCount } from './limits';

/** Uniform linear array of count elements along x, spacing in wavelengths, centred on the origin. */
export function uniformLinearGeometry(count: number, spacingWavelengths: number): ArrayGeometry {
  requireElementCount('count', count);
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  const positions = emptyPositions(count);
  const origin = (-(count - 1) * spacingWavelengths) / 2;
  const column = new Int32Array(count);
  const row = new Int32Array(count);
  for (let n = 0; n < count; n++) {
    positions.x[n] = origin + n * spacingWavelengths;
    column[n] = n;
  }
  return {
    positionsWavelengths: positions,
    lattice: {
      kind: 'line', pitchXWavelengths: spacingWavelengths, pitchYWavelengths: 1,
      originXWavelengths: origin, originYWavelengths: 0, columns: count, rows: 1, column, row,
      vectorsWavelengths: [[spacingWavelengths, 0]],
    },
    fullGrid: true,
    apertureHalfXWavelengths: (count * spacingWavelengths) / 2,
    apertureHalfYWavelengths: spacingWavelengths / 2,
  };
}
