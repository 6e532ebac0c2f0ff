import { requireFinite, requireInRange, requireNonNegative } from '../errors';
import { groundPlaneImageFactor } from './imageFactor';
import type { ElementPattern } from './types';

/** Throws a CalcInputError unless the element pattern's parameters are valid. */
export function validateElementPattern(element: ElementPattern): ElementPattern {
  if (element.kind === 'cosine') requireInRange('element.powerExponent', element.powerExponent, 0, 2000);
  else if (element.kind === 'halfWaveDipole' && !['x', 'y', 'z'].includes(element.axis)) {
    throw new RangeError(`element.axis: expected 'x', 'y' or 'z', got ${JSON.stringify(element.axis)}`);
  } else if (element.kind !== 'isotropic' && element.kind !== 'halfWaveDipole') {
    throw new RangeError(`element.kind: unknown element pattern ${JSON.stringify((element as { kind: string }).kind)}`);
  }
  if (element.groundPlaneHeightWavelengths !== undefined) {
    requireFinite('element.groundPlaneHeightWavelengths', element.groundPlaneHeightWavelengths, 'λ');
    requireNonNegative('element.groundPlaneHeightWavelengths', element.groundPlaneHeightWavelengths, 'λ');
  }
  return element;
}

/**
 * Element field pattern (real amplitude, peak 1 for the element alone) in the direction with
 * direction cosines (u, v, w) = (sin θ cos φ, sin θ sin φ, cos θ):
 * isotropic 1; cosine with power pattern cosⁿθ: field w^(n/2) for w > 0 and 0 behind; half-wave dipole along axis a with
 * cos ψ = û·â: cos((π/2) cos ψ)/sin ψ (Balanis, "Antenna Theory", 4th ed., eq. 4-84 (equation number from memory)).
 * With a ground plane at height h the pattern is multiplied by the image factor: the dipole
 * along z is vertical, every other element is treated as horizontal.
 */
export function elementFieldAt(element: ElementPattern, u: number, v: number, w: number): number {
  let field: number;
  switch (element.kind) {
    case 'isotropic': field = 1; break;
    case 'cosine': field = w > 0 ? (element.powerExponent === 0 ? 1 : w ** (element.powerExponent / 2)) : 0; break;
    case 'halfWaveDipole': {
      const cosPsi = element.axis === 'x' ? u : element.axis === 'y' ? v : w;
      const sin2 = 1 - cosPsi * cosPsi;
      field = sin2 < 1e-24 ? 0 : Math.cos((Math.PI / 2) * cosPsi) / Math.sqrt(sin2);
      break;
    }
  }
  const h = element.groundPlaneHeightWavelengths;
  if (h !== undefined) {
    const vertical = element.kind === 'halfWaveDipole' && element.axis === 'z';
    field *= groundPlaneImageFactor(h, w, vertical ? 'vertical' : 'horizontal');
  }
  return field;
}

/** True when the element pattern is 1 in every direction (no element or ground-plane factor). */
export function isIsotropic(element: ElementPattern): boolean {
  return element.kind === 'isotropic' && element.groundPlaneHeightWavelengths === undefined;
}
