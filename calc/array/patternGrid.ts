import { requireInteger } from '../errors';
import type { EvaluationPath } from './arrayFactor';
import { patternPowerAtDirections } from './patternPower';
import type { ArrayModel } from './types';

/** A θ–φ grid: θ from 0 to 180°, φ from 0 to 360° (both ends included); power[iθ·phiCount + iφ] linear. */
export interface ThetaPhiGrid {
  thetaDeg: Float64Array;
  phiDeg: Float64Array;
  power: Float64Array;
}

/** Total pattern on a full θ–φ grid of thetaCount × phiCount samples (defaults 181 × 361, 1° steps). */
export function patternThetaPhiGrid(model: ArrayModel, thetaCount = 181, phiCount = 361, path?: EvaluationPath): ThetaPhiGrid {
  requireInteger('thetaCount', thetaCount, 2, 100_000);
  requireInteger('phiCount', phiCount, 2, 100_000);
  const thetaDeg = Float64Array.from({ length: thetaCount }, (_, i) => (180 * i) / (thetaCount - 1));
  const phiDeg = Float64Array.from({ length: phiCount }, (_, j) => (360 * j) / (phiCount - 1));
  const total = thetaCount * phiCount;
  const u = new Float64Array(total), v = new Float64Array(total), w = new Float64Array(total);
  const cosPhi = phiDeg.map((p) => Math.cos((p * Math.PI) / 180));
  const sinPhi = phiDeg.map((p) => Math.sin((p * Math.PI) / 180));
  for (let i = 0; i < thetaCount; i++) {
    const theta = (thetaDeg[i] * Math.PI) / 180;
    const s = Math.sin(theta), c = Math.cos(theta);
    for (let j = 0; j < phiCount; j++) {
      const k = i * phiCount + j;
      u[k] = s * cosPhi[j]; v[k] = s * sinPhi[j]; w[k] = c;
    }
  }
  return { thetaDeg, phiDeg, power: patternPowerAtDirections(model, u, v, w, path) };
}
