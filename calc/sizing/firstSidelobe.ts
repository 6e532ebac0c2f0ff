import { patternPowerAtDirections } from '../array/patternPower';
import type { ArrayModel } from '../array/types';
import { degToRad } from '../angle';
import { goldenMinimize } from '../numeric/goldenMinimize';

/**
 * First sidelobe of a broadside beam in the cut at φ = planeDeg, dB relative to the peak at θ = 0:
 * walks out from the peak in steps of HPBW/16 to the first minimum (the first null), then to the
 * next maximum, and refines that maximum by golden-section search. Null when the pattern has no
 * sidelobe before θ = 90°. Only the first sidelobe of the cut: cheaper than a full sidelobe
 * search, and it is what the sizing's sidelobe requirement names.
 */
export function firstSidelobeInCutDb(model: ArrayModel, hpbwDeg: number, planeDeg: number): number | null {
  const cosPhi = Math.cos(degToRad(planeDeg));
  const sinPhi = Math.sin(degToRad(planeDeg));
  const power = (thetaRad: number): number => {
    const s = Math.sin(thetaRad);
    return patternPowerAtDirections(model, [s * cosPhi], [s * sinPhi], [Math.cos(thetaRad)])[0];
  };
  const peak = power(0);
  const step = degToRad(hpbwDeg) / 16;
  let previous = peak;
  let falling = true;
  for (let theta = step; theta < Math.PI / 2; theta += step) {
    const p = power(theta);
    if (falling && p > previous) falling = false;
    else if (!falling && p < previous) {
      const best = goldenMinimize((t) => -power(t), Math.max(0, theta - 2 * step), theta, 1e-9);
      return 10 * Math.log10(power(best) / peak);
    }
    previous = p;
  }
  return null;
}
