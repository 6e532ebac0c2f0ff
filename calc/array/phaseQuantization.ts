import { requireInteger } from '../errors';
import type { ComplexWeights } from './types';

/** Phase reduced to [0°, 360°). */
export function wrapPhaseDeg(phaseDeg: number): number {
  const wrapped = phaseDeg % 360;
  return wrapped < 0 ? wrapped + 360 : wrapped === 360 ? 0 : wrapped;
}

/** Phase (degrees) rounded to the nearest multiple of 360°/2^bits and reduced to [0°, 360°). */
export function quantizePhaseDeg(phaseDeg: number, bits: number): number {
  requireInteger('phaseBits', bits, 1, 24);
  const step = 360 / 2 ** bits;
  return wrapPhaseDeg(Math.round(wrapPhaseDeg(phaseDeg) / step) * step);
}

/** Copy of the weights with every phase rounded to a B-bit phase shifter state (amplitudes kept). */
export function quantizeWeightPhases(weights: ComplexWeights, bits: number): ComplexWeights {
  requireInteger('phaseBits', bits, 1, 24);
  const step = (2 * Math.PI) / 2 ** bits;
  const count = weights.re.length;
  const re = new Float64Array(count);
  const im = new Float64Array(count);
  for (let n = 0; n < count; n++) {
    const amplitude = Math.hypot(weights.re[n], weights.im[n]);
    const phase = Math.round(Math.atan2(weights.im[n], weights.re[n]) / step) * step;
    re[n] = amplitude * Math.cos(phase);
    im[n] = amplitude * Math.sin(phase);
  }
  return { re, im };
}
