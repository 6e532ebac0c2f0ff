import { requireInteger, requirePositive } from '../errors';
import type { ArrayGeometry } from './geometry';
import { emptyPositions } from './geometry';
import { MAX_ARRAY_ELEMENTS } from './limits';

/**
 * Y-shaped array: three straight arms at 120° in the x–y plane (arms along φ = 90°, 210°, 330°),
 * elementsPerArm elements per arm at spacing (λ) starting one spacing from the centre, plus an
 * optional element at the centre.
 */
export function yShapedGeometry(elementsPerArm: number, spacingWavelengths: number, includeCentre = false): ArrayGeometry {
  requireInteger('elementsPerArm', elementsPerArm, 1, Math.floor((MAX_ARRAY_ELEMENTS - 1) / 3));
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  const count = 3 * elementsPerArm + (includeCentre ? 1 : 0);
  const positions = emptyPositions(count);
  let n = includeCentre ? 1 : 0;
  for (let arm = 0; arm < 3; arm++) {
    const angle = Math.PI / 2 + (arm * 2 * Math.PI) / 3;
    for (let k = 1; k <= elementsPerArm; k++) {
      positions.x[n] = k * spacingWavelengths * Math.cos(angle);
      positions.y[n] = k * spacingWavelengths * Math.sin(angle);
      n++;
    }
  }
  const half = elementsPerArm * spacingWavelengths + spacingWavelengths / 2;
  return { positionsWavelengths: positions, fullGrid: false, apertureHalfXWavelengths: half, apertureHalfYWavelengths: half };
}
