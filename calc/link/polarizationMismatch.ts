/**
 * Polarization mismatch between two elliptically polarized antennas, from their axial ratios, their
 * senses of rotation and the angle between their major axes. W. L. Stutzman, Polarization in
 * Electromagnetic Systems, Artech House, 1993; W. L. Stutzman and G. A. Thiele, Antenna Theory and
 * Design, 3rd ed., Wiley, 2012 (polarization efficiency).
 *
 * Each antenna's sense of rotation is its own, as it transmits (two right-hand circular antennas
 * facing each other match), and the tilt difference is the physical angle between the two major
 * axes; so equal axial ratio, sense and tilt means a match. A circularly polarized gain
 * in dBic is the gain to the co-polarized circular component; a linear antenna sees half of it
 * (3 dB: the linear–circular case below).
 */
import { CalcInputError, requireFinite, requireNonNegative } from '../errors';

/** Polarization efficiency cap: below this the model's zero (ideal cross-polarization) is reported as this floor. */
export const POLARIZATION_EFFICIENCY_FLOOR = 1e-6;

/** Linear axial ratio (≥ 1) from axial ratio in dB (≥ 0; 0 dB circular, large values near-linear). */
export function axialRatioFromDb(axialRatioDb: number): number {
  requireFinite('axialRatioDb', axialRatioDb, 'dB');
  if (axialRatioDb < 0) throw new CalcInputError('axialRatioDb', `expected an axial ratio ≥ 0 dB (0 dB is circular; the major axis over the minor), got ${axialRatioDb} dB`);
  return 10 ** (axialRatioDb / 20);
}

/**
 * Polarization efficiency (0–1) of two elliptical polarizations with axial ratios ≥ 1 (linear),
 * senses +1/−1 each, and the angle between their major axes tiltDifferenceDeg:
 * p = ½ + [4·r₁r₂ + (1 − r₁²)(1 − r₂²)·cos 2Δτ] / [2(1 + r₁²)(1 + r₂²)], with r signed by the sense.
 * Written with ρ = 1/r so that a linear antenna (r → ∞) is exact: ρ = 0.
 */
export function polarizationEfficiency(
  axialRatio1: number,
  axialRatio2: number,
  sameSense: boolean,
  tiltDifferenceDeg: number,
): number {
  requireFinite('axialRatio1', axialRatio1);
  requireFinite('axialRatio2', axialRatio2);
  requireFinite('tiltDifferenceDeg', tiltDifferenceDeg, 'deg');
  if (axialRatio1 < 1) throw new CalcInputError('axialRatio1', `expected a linear axial ratio ≥ 1, got ${axialRatio1}`);
  if (axialRatio2 < 1) throw new CalcInputError('axialRatio2', `expected a linear axial ratio ≥ 1, got ${axialRatio2}`);
  const p1 = 1 / axialRatio1;
  const p2 = (sameSense ? 1 : -1) / axialRatio2;
  // dividing numerator and denominator by r₁²r₂²: 4ρ₁ρ₂ + (ρ₁² − 1)(ρ₂² − 1)cos 2Δτ over 2(1 + ρ₁²)(1 + ρ₂²)
  const cos2 = Math.cos((2 * tiltDifferenceDeg * Math.PI) / 180);
  const p = 0.5 + (4 * p1 * p2 + (p1 * p1 - 1) * (p2 * p2 - 1) * cos2) / (2 * (1 + p1 * p1) * (1 + p2 * p2));
  return Math.min(1, Math.max(0, p));
}

/** Polarization mismatch loss in dB (≥ 0) from axial ratios in dB, the senses and the tilt difference; capped at 60 dB (ideal cross-polarization). */
export function polarizationMismatchLossDb(
  axialRatio1Db: number,
  axialRatio2Db: number,
  sameSense: boolean,
  tiltDifferenceDeg: number,
): number {
  requireNonNegative('axialRatio1Db', axialRatio1Db, 'dB');
  requireNonNegative('axialRatio2Db', axialRatio2Db, 'dB');
  const p = polarizationEfficiency(axialRatioFromDb(axialRatio1Db), axialRatioFromDb(axialRatio2Db), sameSense, tiltDifferenceDeg);
  return 0 - 10 * Math.log10(Math.max(p, POLARIZATION_EFFICIENCY_FLOOR)); // +0 for a match, not −0
}
