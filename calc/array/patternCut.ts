import { degToRad } from '../angle';
import { requireInRange, requireInteger } from '../errors';
import type { EvaluationPath } from './arrayFactor';
import { powerToRelativeDb } from './normalize';
import { patternPowerAtDirections } from './patternPower';
import type { ArrayModel } from './types';

/** Options of a θ cut; angles in degrees. */
export interface CutOptions {
  /** Plane of the cut, φ in degrees (default 0: the x–z plane). */
  phiDeg?: number;
  /** First and last θ, degrees from −180 to 180 (default −90 and 90); negative θ means the half plane φ + 180°. */
  thetaStartDeg?: number;
  thetaStopDeg?: number;
  /** Number of equally spaced samples, 2…1,000,000 (default 721). */
  count?: number;
  /** Force an evaluation path (default the fastest valid). */
  path?: EvaluationPath;
}

/** A pattern cut: θ samples (degrees), total power (linear, unnormalized) and power in dB relative to the cut's peak. */
export interface PatternCut {
  phiDeg: number;
  thetaDeg: Float64Array;
  power: Float64Array;
  powerDb: Float64Array;
}

/**
 * Total pattern (element × array factor) along θ at fixed φ. θ may run negative: (−θ, φ) is the
 * direction (θ, φ + 180°), so −90…90 sweeps the whole forward half of the φ plane.
 */
export function patternCut(model: ArrayModel, options: CutOptions = {}): PatternCut {
  const phiDeg = requireInRange('phiDeg', options.phiDeg ?? 0, -360, 360, '°');
  const start = requireInRange('thetaStartDeg', options.thetaStartDeg ?? -90, -180, 180, '°');
  const stop = requireInRange('thetaStopDeg', options.thetaStopDeg ?? 90, -180, 180, '°');
  const count = requireInteger('count', options.count ?? 721, 2, 1_000_000);
  const thetaDeg = new Float64Array(count);
  const u = new Float64Array(count), v = new Float64Array(count), w = new Float64Array(count);
  const cosPhi = Math.cos(degToRad(phiDeg)), sinPhi = Math.sin(degToRad(phiDeg));
  for (let i = 0; i < count; i++) {
    const t = start + ((stop - start) * i) / (count - 1);
    thetaDeg[i] = t;
    const theta = degToRad(t);
    const s = Math.sin(theta); // negative θ flips (u, v) to the opposite half plane
    u[i] = s * cosPhi; v[i] = s * sinPhi; w[i] = Math.cos(theta);
  }
  const power = patternPowerAtDirections(model, u, v, w, options.path);
  return { phiDeg, thetaDeg, power, powerDb: powerToRelativeDb(power) };
}
