import { requireInteger, requireInRange } from '../errors';
import { requireElementCount } from './limits';

/**
 * Coefficients F_m (m = 1…n̄−1) of Taylor's line-source distribution
 * g(t) = 1 + 2 Σ F_m cos(mπt), t ∈ [−1, 1], for sidelobe level sidelobeDb (positive dB below the
 * peak) and n̄ nearly equal sidelobes. Source: T. T. Taylor, "Design of line-source antennas for
 * narrow beamwidth and low side lobes", IRE Trans. AP-3 (1955); same as scipy.signal.windows.taylor.
 */
export function taylorCoefficients(nbar: number, sidelobeDb: number): Float64Array {
  requireInteger('nbar', nbar, 1, 100);
  requireInRange('sidelobeDb', sidelobeDb, 0, 200, 'dB');
  const a = Math.acosh(10 ** (sidelobeDb / 20)) / Math.PI;
  const sigma2 = (nbar * nbar) / (a * a + (nbar - 0.5) ** 2);
  const coefficients = new Float64Array(Math.max(0, nbar - 1));
  for (let m = 1; m < nbar; m++) {
    let numerator = m % 2 === 1 ? 1 : -1;
    let denominator = 2;
    for (let n = 1; n < nbar; n++) {
      numerator *= 1 - (m * m) / sigma2 / (a * a + (n - 0.5) ** 2);
      if (n !== m) denominator *= 1 - (m * m) / (n * n);
    }
    coefficients[m - 1] = numerator / denominator;
  }
  return coefficients;
}

/** Taylor distribution at normalized aperture coordinate t ∈ [−1, 1] (1 at t = 0 before any normalization is ~ the peak). */
export function taylorAt(coefficients: Float64Array, t: number): number {
  let sum = 1;
  for (let m = 1; m <= coefficients.length; m++) sum += 2 * coefficients[m - 1] * Math.cos(m * Math.PI * t);
  return sum;
}

/**
 * Taylor weights of a count-element line, sampled at t_n = (2n − count + 1)/count (element
 * centres of equal cells). normalize = true scales the centre value g(0) to 1, as
 * scipy.signal.windows.taylor(count, nbar, sll, norm=True); false leaves g unscaled (norm=False).
 */
export function taylorLineWeights(count: number, nbar: number, sidelobeDb: number, normalize = true): Float64Array {
  requireElementCount('count', count);
  const coefficients = taylorCoefficients(nbar, sidelobeDb);
  if (count === 1) return Float64Array.of(1); // a single element is unweighted (as SciPy)
  const scale = normalize ? 1 / taylorAt(coefficients, 0) : 1;
  const weights = new Float64Array(count);
  for (let n = 0; n < count; n++) weights[n] = scale * taylorAt(coefficients, (2 * n - count + 1) / count);
  return weights;
}
