import { radToDeg } from '../angle';
import { quantizePhaseDeg, wrapPhaseDeg } from './phaseQuantization';
import type { ArrayModel } from './types';

/** Per-element excitation table for a beam-steering controller (columns as arrays, one entry per element). */
export interface ElementTable {
  xWavelengths: Float64Array;
  yWavelengths: Float64Array;
  zWavelengths: Float64Array;
  /** Amplitude relative to the largest (linear, 0…1). */
  amplitude: Float64Array;
  /** Amplitude relative to the largest, dB (floored at −300). */
  amplitudeDb: Float64Array;
  /** Phase reduced to [0°, 360°); a multiple of 360°/2^B when the model was quantized to B bits. */
  phaseDeg: Float64Array;
}

/** Amplitude and phase of every element of the model (phase modulo 360°). */
export function elementTable(model: ArrayModel): ElementTable {
  const { re, im } = model.weights;
  const count = re.length;
  const amplitude = new Float64Array(count);
  let peak = 0;
  for (let n = 0; n < count; n++) { amplitude[n] = Math.hypot(re[n], im[n]); peak = Math.max(peak, amplitude[n]); }
  const amplitudeDb = new Float64Array(count);
  const phaseDeg = new Float64Array(count);
  for (let n = 0; n < count; n++) {
    amplitude[n] = peak > 0 ? amplitude[n] / peak : 0;
    amplitudeDb[n] = amplitude[n] > 0 ? Math.max(-300, 20 * Math.log10(amplitude[n])) : -300;
    const phase = radToDeg(Math.atan2(im[n], re[n]));
    phaseDeg[n] = model.phaseBits !== undefined ? quantizePhaseDeg(phase, model.phaseBits) : wrapPhaseDeg(phase);
  }
  const { x, y, z } = model.positionsWavelengths;
  return { xWavelengths: x.slice(), yWavelengths: y.slice(), zWavelengths: z.slice(), amplitude, amplitudeDb, phaseDeg };
}
