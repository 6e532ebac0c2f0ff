/**
 * Aperture blockage. A blocked part of the aperture radiates nothing, so the on-axis field drops
 * by the blocked share of the aperture-field integral, C = ∫blocked E dA / ∫ E dA, and the gain by
 * (1 − C)² (the blocked power is lost too: the forward gain falls as the square of the field).
 * For a uniform aperture this is the familiar (1 − (Db/D)²)². Standard aperture-theory estimate;
 * it ignores diffraction around the obstacle and the feed's own scattering. Sources (from memory,
 * chapter not rechecked): Stutzman & Thiele, Antenna Theory and Design, 3rd ed. (2012), reflector
 * antennas, aperture blockage; Kildal, Foundations of Antenna Engineering (2015), blockage efficiency.
 */
import { requireInRange } from '../errors';
import { MAX_POWER_EXPONENT } from './feedPattern';
import { apertureFieldIntegral } from './efficiency';

/**
 * Illumination-weighted blocked fraction Cb of a central disk seen from the focus within feed
 * angle ψb (radians), for the cos^q power feed and rim half-angle ψ0: ∫0^ψb / ∫0^ψ0 of √P tan(ψ/2).
 */
export function centralBlockedFraction(powerExponent: number, rimHalfAngle: number, blockedHalfAngle: number): number {
  requireInRange('powerExponent', powerExponent, 0, MAX_POWER_EXPONENT);
  requireInRange('rimHalfAngleRad', rimHalfAngle, 1e-6, Math.PI / 2, 'rad');
  requireInRange('blockedHalfAngleRad', blockedHalfAngle, 0, rimHalfAngle, 'rad');
  if (blockedHalfAngle === 0) return 0;
  return apertureFieldIntegral(powerExponent, 0, blockedHalfAngle) / apertureFieldIntegral(powerExponent, 0, rimHalfAngle);
}

/** Blockage efficiency (1 − C)² for an illumination-weighted blocked fraction C in [0, 1]. */
export function blockageEfficiency(blockedFraction: number): number {
  requireInRange('blockedFraction', blockedFraction, 0, 1);
  return (1 - blockedFraction) ** 2;
}
