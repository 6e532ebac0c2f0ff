import { CalcInputError, requireFinite } from '../errors';
import { freeSpaceWavelengthM } from '../wavelength';
import type { ArrayGeometry } from './geometry';
import { emptyPositions } from './geometry';
import { requireElementCount } from './limits';

/** Arbitrary 3-D element positions given in wavelengths (x, y, z arrays of equal length). */
export function customGeometryWavelengths(xWavelengths: ArrayLike<number>, yWavelengths: ArrayLike<number>, zWavelengths: ArrayLike<number>): ArrayGeometry {
  const count = requireElementCount('positionsWavelengths.length', xWavelengths.length);
  if (yWavelengths.length !== count || zWavelengths.length !== count) {
    throw new CalcInputError('positionsWavelengths', `expected x, y and z of equal length, got ${count}, ${yWavelengths.length}, ${zWavelengths.length}`);
  }
  const positions = emptyPositions(count);
  let half = 0;
  for (let n = 0; n < count; n++) {
    positions.x[n] = requireFinite(`positionsWavelengths.x[${n}]`, xWavelengths[n], 'λ');
    positions.y[n] = requireFinite(`positionsWavelengths.y[${n}]`, yWavelengths[n], 'λ');
    positions.z[n] = requireFinite(`positionsWavelengths.z[${n}]`, zWavelengths[n], 'λ');
    half = Math.max(half, Math.hypot(positions.x[n], positions.y[n]));
  }
  half = Math.max(half, 0.25);
  return { positionsWavelengths: positions, fullGrid: false, apertureHalfXWavelengths: half, apertureHalfYWavelengths: half };
}

/** Arbitrary 3-D element positions given in metres, converted to wavelengths at frequencyHz. */
export function customGeometryMetres(xM: ArrayLike<number>, yM: ArrayLike<number>, zM: ArrayLike<number>, frequencyHz: number): ArrayGeometry {
  const wavelengthM = freeSpaceWavelengthM(frequencyHz);
  const scale = (values: ArrayLike<number>, name: string) =>
    Float64Array.from({ length: values.length }, (_, n) => requireFinite(`${name}[${n}]`, values[n], 'm') / wavelengthM);
  return customGeometryWavelengths(scale(xM, 'xM'), scale(yM, 'yM'), scale(zM, 'zM'));
}
