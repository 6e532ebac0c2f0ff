/**
 * Noise figure ↔ noise temperature, the noise of a lossy line, and the antenna noise temperature.
 * IEEE Std 145 and the IRE noise-figure definition: F = 1 + Tₑ/T₀ with T₀ = 290 K.
 */
import { requireInRange, requireNonNegative } from '../errors';
import { REFERENCE_NOISE_TEMPERATURE_K } from './thermalNoise';

/** Effective input noise temperature (K) of a two-port with noise figure noiseFigureDb: T₀(10^(NF/10) − 1). */
export function noiseFigureToTemperatureK(noiseFigureDb: number): number {
  requireNonNegative('noiseFigureDb', noiseFigureDb, 'dB');
  return REFERENCE_NOISE_TEMPERATURE_K * (10 ** (noiseFigureDb / 10) - 1);
}

/** Noise figure (dB) of a two-port with effective input noise temperature noiseTemperatureK: 10·log10(1 + Tₑ/T₀). */
export function noiseTemperatureToFigureDb(noiseTemperatureK: number): number {
  requireNonNegative('noiseTemperatureK', noiseTemperatureK, 'K');
  return 10 * Math.log10(1 + noiseTemperatureK / REFERENCE_NOISE_TEMPERATURE_K);
}

/**
 * Effective input noise temperature (K) of a matched lossy line (loss lossDb ≥ 0, at physical
 * temperature physicalTemperatureK): (L − 1)·T_phys. Pozar, Microwave Engineering, 4th ed. (2012),
 * noise of a lossy line (section number from memory).
 */
export function lossyLineNoiseTemperatureK(lossDb: number, physicalTemperatureK: number): number {
  requireNonNegative('lossDb', lossDb, 'dB');
  requireNonNegative('physicalTemperatureK', physicalTemperatureK, 'K');
  return (10 ** (lossDb / 10) - 1) * physicalTemperatureK;
}

/**
 * Antenna noise temperature (K) as a weighted sum: the fraction groundFraction (0–1) of the pattern
 * that sees the ground (spillover, sidelobes) at groundTemperatureK, the rest the sky at
 * skyTemperatureK. A first estimate (common practice, no source); a pattern integral replaces it.
 */
export function antennaNoiseTemperatureK(skyTemperatureK: number, groundTemperatureK: number, groundFraction: number): number {
  requireNonNegative('skyTemperatureK', skyTemperatureK, 'K');
  requireNonNegative('groundTemperatureK', groundTemperatureK, 'K');
  requireInRange('groundFraction', groundFraction, 0, 1);
  return (1 - groundFraction) * skyTemperatureK + groundFraction * groundTemperatureK;
}

/**
 * Share of a reflector antenna's noise pick-up that comes from the ground through spillover:
 * (1 − η_spill)·towardGroundShare, where towardGroundShare (default ½) is the part of the
 * spillover that lands on the ground rather than the sky — about half for a dish pointed well
 * above the horizon (common practice, no source).
 */
export function spilloverGroundFraction(spilloverEfficiency: number, towardGroundShare = 0.5): number {
  requireInRange('spilloverEfficiency', spilloverEfficiency, 0, 1);
  requireInRange('towardGroundShare', towardGroundShare, 0, 1);
  return (1 - spilloverEfficiency) * towardGroundShare;
}
