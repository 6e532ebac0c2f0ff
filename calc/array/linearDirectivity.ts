import { degToRad } from '../angle';
import { CalcInputError, requireInRange, requirePositive } from '../errors';
import { requireElementCount } from './limits';
import type { ComplexWeights } from './types';

/** sin(x)/x with the limit 1 at x = 0. */
export function sinc(x: number): number {
  return Math.abs(x) < 1e-8 ? 1 - (x * x) / 6 : Math.sin(x) / x;
}

/**
 * Exact directivity (linear) of a line of isotropic elements along x with spacing d (λ) and
 * complex weights w_n, toward direction cosine u = sin θ cos φ:
 * D = |Σ w_n e^{jkd n u}|² / Σ_m Σ_n w_m w_n* sin(kd(m−n))/(kd(m−n)).
 * The denominator is the average radiation intensity (∫ e^{jk r·û} dΩ = 4π sin(kr)/(kr));
 * e.g. Hansen, "Phased Array Antennas", 2nd ed., ch. 2 (chapter number from memory; directivity of a linear array).
 */
export function linearArrayDirectivity(weights: ComplexWeights, spacingWavelengths: number, directionCosineU: number): number {
  const count = requireElementCount('weights.length', weights.re.length);
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  requireInRange('directionCosineU', directionCosineU, -1, 1);
  const kd = 2 * Math.PI * spacingWavelengths;
  const { re, im } = weights;
  let numRe = 0, numIm = 0;
  for (let n = 0; n < count; n++) {
    const phase = kd * n * directionCosineU;
    const c = Math.cos(phase), s = Math.sin(phase);
    numRe += re[n] * c - im[n] * s;
    numIm += re[n] * s + im[n] * c;
  }
  // Σ_Δ sinc(kdΔ)·R(Δ), R(Δ) = Σ_n w_{n+Δ} w_n*, using R(−Δ) = R(Δ)*.
  let denominator = 0;
  for (let lag = 0; lag < count; lag++) {
    let correlation = 0;
    for (let n = 0; n + lag < count; n++) correlation += re[n + lag] * re[n] + im[n + lag] * im[n];
    denominator += (lag === 0 ? 1 : 2) * sinc(kd * lag) * correlation;
  }
  if (!(denominator > 0)) throw new CalcInputError('weights', 'expected at least one non-zero weight');
  return (numRe * numRe + numIm * numIm) / denominator;
}

/**
 * Directivity (linear) of a uniformly excited line of count isotropic elements, spacing d (λ),
 * steered to scanDeg from broadside in the φ = 0° plane by the phase −kd·n·sin θ0:
 * D = N / (1 + (2/N) Σ_{m=1}^{N−1} (N − m) sinc(mkd) cos(mkd sin θ0)), the uniform case of
 * linearArrayDirectivity (same source).
 */
export function uniformLinearArrayDirectivity(count: number, spacingWavelengths: number, scanDeg: number): number {
  requireElementCount('count', count);
  requirePositive('spacingWavelengths', spacingWavelengths, 'λ');
  requireInRange('scanDeg', scanDeg, -90, 90, '°');
  const kd = 2 * Math.PI * spacingWavelengths;
  const u0 = Math.sin(degToRad(scanDeg));
  let sum = 0;
  for (let m = 1; m < count; m++) sum += (count - m) * sinc(m * kd) * Math.cos(m * kd * u0);
  return count / (1 + (2 / count) * sum);
}
