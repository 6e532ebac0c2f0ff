/**
 * Gain of a circular aperture: G = η (πD/λ)² (IEEE Std 145 definitions; Balanis, Antenna Theory,
 * 4th ed., §15.4.1 (section number from memory)), and its inverse for the diameter.
 */
import { requireInRange, requirePositive, CalcInputError } from '../errors';
import { brentRoot } from '../numeric/brentRoot';

/** Gain in dBi of a circular aperture of diameter D with aperture efficiency η at wavelength λ. */
export function apertureGainDbi(apertureEfficiency: number, diameterM: number, wavelengthM: number): number {
  requireInRange('apertureEfficiency', apertureEfficiency, Number.MIN_VALUE, 1);
  requirePositive('diameterM', diameterM, 'm');
  requirePositive('wavelengthM', wavelengthM, 'm');
  const x = (Math.PI * diameterM) / wavelengthM;
  return 10 * Math.log10(apertureEfficiency * x * x);
}

/** Diameter in metres giving gain G (dBi) at a fixed efficiency: D = (λ/π)·√(G/η). */
export function diameterForGainM(gainDbi: number, apertureEfficiency: number, wavelengthM: number): number {
  requireInRange('gainDbi', gainDbi, -100, 200, 'dBi');
  requireInRange('apertureEfficiency', apertureEfficiency, Number.MIN_VALUE, 1);
  requirePositive('wavelengthM', wavelengthM, 'm');
  return (wavelengthM / Math.PI) * Math.sqrt(10 ** (gainDbi / 10) / apertureEfficiency);
}

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
