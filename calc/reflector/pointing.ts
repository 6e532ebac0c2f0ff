/**
 * Pointing and measurement figures derived from the beamwidth and the aperture size.
 */
import { requireInRange, requireNonNegative, requirePositive } from '../errors';

/**
 * Coefficient of the Gaussian-beam pointing rule loss_dB = c·(Δθ/HPBW)²: c = 4·ln 2·10/ln 10
 * ≈ 12.04 for an exactly Gaussian main beam; "12" in common practice (no source).
 */
export const GAUSSIAN_POINTING_COEFFICIENT = (40 * Math.LN2) / Math.LN10;

/** Pointing loss in dB (≥ 0) for pointing error Δθ, by the Gaussian-beam rule (common practice). */
export function pointingLossDb(pointingErrorDeg: number, hpbwDeg: number): number {
  requireNonNegative('pointingErrorDeg', pointingErrorDeg, 'deg');
  requirePositive('hpbwDeg', hpbwDeg, 'deg');
  const r = pointingErrorDeg / hpbwDeg;
  return GAUSSIAN_POINTING_COEFFICIENT * r * r;
}

/** Pointing error (degrees) that costs lossDb, by the Gaussian-beam rule: HPBW·√(loss/12.04). */
export function pointingErrorForLossDeg(lossDb: number, hpbwDeg: number): number {
  requireInRange('lossDb', lossDb, 0, 3, 'dB');
  requirePositive('hpbwDeg', hpbwDeg, 'deg');
  return hpbwDeg * Math.sqrt(lossDb / GAUSSIAN_POINTING_COEFFICIENT);
}

