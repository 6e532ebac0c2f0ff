/**
 * The reflector's diameter solve for efficiencies that depend on D (a fixed-size central blockage).
 * The aperture relation G = η (πD/λ)² itself and its fixed-efficiency inverse live in calc/aperture/.
 */
import { requireInRange, requirePositive, CalcInputError } from '../errors';
import { brentRoot } from '../numeric/brentRoot';

/**
 * Diameter (m) at which gainOfDiameter(D) (dBi, increasing in D) reaches the target, by Brent's
 * method, for efficiencies that depend on D (e.g. a fixed-size central blockage). Searches above
 * minimumDiameterM; throws CalcInputError when the target is below the gain just above it.
 */
export function solveDiameterForGainM(targetGainDbi: number, gainOfDiameter: (diameterM: number) => number, minimumDiameterM: number, firstGuessM: number): number {
  requireInRange('gainDbi', targetGainDbi, -100, 200, 'dBi');
  requirePositive('minimumDiameterM', minimumDiameterM, 'm');
  requirePositive('firstGuessM', firstGuessM, 'm');
  const miss = (d: number) => gainOfDiameter(d) - targetGainDbi;
  const lo = minimumDiameterM;
  if (miss(lo) >= 0) {
    throw new CalcInputError('gainDbi', `expected a target gain above ${gainOfDiameter(lo).toFixed(2)} dBi, the gain of the smallest dish these inputs allow; got ${targetGainDbi} dBi`);
  }
  let hi = Math.max(firstGuessM, lo * 2);
  for (let i = 0; i < 200 && miss(hi) < 0; i++) hi *= 2;
  return brentRoot(miss, lo, hi, 1e-12 * hi);
}
