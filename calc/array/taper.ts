import { requireInRange, requireInteger, requireNonNegative } from '../errors';
import { chebyshevLineWeights } from './chebyshevWeights';
import { requireElementCount } from './limits';
import { taylorAt, taylorCoefficients, taylorLineWeights } from './taylorWeights';

/** Amplitude tapers. sidelobeDb is a positive number of dB below the main-beam peak. */
export type Taper =
  | { kind: 'uniform' }
  /** pedestal + (1 − pedestal)·cos^exponent(πt/2) on t ∈ [−1, 1]; pedestal is the edge amplitude (linear, 0…1). */
  | { kind: 'cosineOnPedestal'; pedestal: number; exponent?: number }
  | { kind: 'taylor'; nbar: number; sidelobeDb: number }
  | { kind: 'chebyshev'; sidelobeDb: number };

/** Throws a CalcInputError unless the taper's parameters are valid. */
export function validateTaper(taper: Taper): Taper {
  switch (taper.kind) {
    case 'uniform': break;
    case 'cosineOnPedestal':
      requireInRange('taper.pedestal', taper.pedestal, 0, 1);
      requireNonNegative('taper.exponent', taper.exponent ?? 1);
      break;
    case 'taylor':
      requireInteger('taper.nbar', taper.nbar, 1, 100);
      requireInRange('taper.sidelobeDb', taper.sidelobeDb, 0, 200, 'dB');
      break;
    case 'chebyshev':
      requireInRange('taper.sidelobeDb', taper.sidelobeDb, 0, 300, 'dB');
      break;
    default:
      throw new RangeError(`unknown taper ${(taper as { kind: string }).kind}`);
  }
  return taper;
}

/** Cosine-on-pedestal amplitude at normalized coordinate t ∈ [−1, 1] (edge t = ±1 gives the pedestal). */
export function cosineOnPedestalAt(pedestal: number, exponent: number, t: number): number {
  const c = Math.cos((Math.PI * Math.min(1, Math.abs(t))) / 2);
  return pedestal + (1 - pedestal) * c ** exponent;
}

/**
 * Amplitude weights of a count-element line for the taper, sampled at element centres
 * t_n = (2n − count + 1)/count; Taylor normalized to 1 at the centre, Chebyshev to a largest weight of 1.
 */
export function lineTaperWeights(taper: Taper, count: number): Float64Array {
  requireElementCount('count', count);
  validateTaper(taper);
  switch (taper.kind) {
    case 'uniform': return new Float64Array(count).fill(1);
    case 'taylor': return taylorLineWeights(count, taper.nbar, taper.sidelobeDb, true);
    case 'chebyshev': return chebyshevLineWeights(count, taper.sidelobeDb);
    case 'cosineOnPedestal': {
      const weights = new Float64Array(count);
      for (let n = 0; n < count; n++) weights[n] = cosineOnPedestalAt(taper.pedestal, taper.exponent ?? 1, (2 * n - count + 1) / count);
      return weights;
    }
  }
}

/**
 * The taper as a function of a normalized aperture coordinate t ∈ [−1, 1] (|t| > 1 is clamped),
 * for radial (circular) and masked apertures. Taylor uses its continuous line-source form;
 * Dolph–Chebyshev, which exists only for discrete lines, interpolates linearly between the
 * weights of a referenceCount-element line.
 */
export function taperFunction(taper: Taper, referenceCount: number): (t: number) => number {
  validateTaper(taper);
  switch (taper.kind) {
    case 'uniform': return () => 1;
    case 'cosineOnPedestal': return (t) => cosineOnPedestalAt(taper.pedestal, taper.exponent ?? 1, t);
    case 'taylor': {
      const coefficients = taylorCoefficients(taper.nbar, taper.sidelobeDb);
      const scale = 1 / taylorAt(coefficients, 0);
      return (t) => scale * taylorAt(coefficients, Math.max(-1, Math.min(1, t)));
    }
    case 'chebyshev': {
      const count = Math.max(2, referenceCount);
      const weights = chebyshevLineWeights(count, taper.sidelobeDb);
      return (t) => {
        const position = Math.max(0, Math.min(count - 1, ((Math.max(-1, Math.min(1, t)) * count + count - 1) / 2)));
        const lower = Math.floor(position);
        const upper = Math.min(count - 1, lower + 1);
        const fraction = position - lower;
        return weights[lower] * (1 - fraction) + weights[upper] * fraction;
      };
    }
  }
}
