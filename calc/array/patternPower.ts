import type { EvaluationPath } from './arrayFactor';
import { arrayFactorAtDirections, evaluationPath } from './arrayFactor';
import { elementFieldAt, isIsotropic } from './elementPattern';
import type { ArrayModel } from './types';

/**
 * Total radiated power pattern |E_element(û)|²·|AF(û)|² (linear, unnormalized; element pattern ×
 * array factor) at each direction (u[i], v[i], w[i]).
 */
export function patternPowerAtDirections(model: ArrayModel, u: ArrayLike<number>, v: ArrayLike<number>, w: ArrayLike<number>, path: EvaluationPath = evaluationPath(model)): Float64Array {
  const count = u.length;
  const factor = new Float64Array(2 * count);
  arrayFactorAtDirections(model, u, v, w, factor, path);
  const power = new Float64Array(count);
  const isotropic = isIsotropic(model.element);
  for (let i = 0; i < count; i++) {
    const af2 = factor[2 * i] * factor[2 * i] + factor[2 * i + 1] * factor[2 * i + 1];
    const e = isotropic ? 1 : elementFieldAt(model.element, u[i], v[i], w[i]);
    power[i] = af2 * e * e;
  }
  return power;
}

/** Power pattern at one direction given in degrees. */
export function patternPowerAt(model: ArrayModel, thetaDeg: number, phiDeg: number): number {
  const theta = (thetaDeg * Math.PI) / 180, phi = (phiDeg * Math.PI) / 180;
  return patternPowerAtDirections(model, [Math.sin(theta) * Math.cos(phi)], [Math.sin(theta) * Math.sin(phi)], [Math.cos(theta)])[0];
}
