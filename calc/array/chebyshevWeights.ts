import { CalcInputError, requireInRange } from '../errors';
import { requireElementCount } from './limits';

/** Largest line length for Dolph–Chebyshev weights (the transform below costs count²/2 operations). */
export const MAX_CHEBYSHEV_COUNT = 16_384;

/**
 * Dolph–Chebyshev weights of a count-element line for sidelobe level sidelobeDb (positive dB
 * below the peak), scaled to a largest weight of 1. Samples the Chebyshev polynomial
 * T_{N−1}(β cos(πk/N)) with β = cosh(acosh(10^(SLL/20))/(N−1)) and transforms it back to element
 * weights (C. L. Dolph, Proc. IRE 34 (1946); the sampling form of scipy.signal.windows.chebwin).
 */
export function chebyshevLineWeights(count: number, sidelobeDb: number): Float64Array {
  requireElementCount('count', count);
  requireInRange('sidelobeDb', sidelobeDb, 0, 300, 'dB');
  if (count > MAX_CHEBYSHEV_COUNT) {
    throw new CalcInputError('count', `expected at most ${MAX_CHEBYSHEV_COUNT} elements for Dolph–Chebyshev weights, got ${count}`);
  }
  if (count === 1) return Float64Array.of(1);
  const order = count - 1;
  const beta = Math.cosh(Math.acosh(10 ** (sidelobeDb / 20)) / order);
  const samples = new Float64Array(count);
  for (let k = 0; k < count; k++) {
    const x = beta * Math.cos((Math.PI * k) / count);
    if (x > 1) samples[k] = Math.cosh(order * Math.acosh(x));
    else if (x < -1) samples[k] = (2 * (count % 2) - 1) * Math.cosh(order * Math.acosh(-x));
    else samples[k] = Math.cos(order * Math.acos(x));
  }
  // Real part of the DFT (with a half-sample shift for even count), by a cosine table.
  const cosTable = new Float64Array(2 * count);
  for (let i = 0; i < 2 * count; i++) { cosTable[i] = Math.cos((Math.PI * i) / count); }
  const even = count % 2 === 0;
  const half = even ? count / 2 + 1 : (count + 1) / 2;
  const spectrum = new Float64Array(half);
  for (let m = 0; m < half; m++) {
    let sum = 0;
    for (let k = 0; k < count; k++) {
      // odd: Re Σ p_k e^{−2πjkm/N};  even: Re Σ p_k e^{jπk/N} e^{−2πjkm/N} = Σ p_k cos(πk(1 − 2m)/N)
      const index = even ? (((k * (1 - 2 * m)) % (2 * count)) + 2 * count) % (2 * count) : ((2 * k * m) % (2 * count));
      sum += samples[k] * cosTable[index];
    }
    spectrum[m] = sum;
  }
  const weights = new Float64Array(count);
  if (even) {
    // w = [s[n−1], …, s[1], s[1], …, s[n−1]] with n = N/2 + 1
    for (let i = 0; i < count / 2; i++) { weights[i] = spectrum[half - 1 - i]; weights[count - 1 - i] = spectrum[half - 1 - i]; }
  } else {
    for (let i = 0; i < half; i++) { weights[half - 1 - i] = spectrum[i]; weights[half - 1 + i] = spectrum[i]; }
  }
  let peak = 0;
  for (const w of weights) peak = Math.max(peak, w);
  for (let i = 0; i < count; i++) weights[i] /= peak;
  return weights;
}
