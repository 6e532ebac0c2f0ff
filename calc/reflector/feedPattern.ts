/**
 * The feed model of calc/reflector: a rotationally symmetric POWER pattern
 *   P(ψ) = cos^q ψ  for 0 ≤ ψ < 90°,  0 beyond,
 * with q the power-pattern exponent (the field pattern is then cos^(q/2) ψ). This is the form of
 * Balanis, Antenna Theory, 4th ed., §15.4 (section number from memory; G_f = 2(n+1)cos^n θ′, a gain = power pattern).
 * Everywhere in calc/reflector, "q" means this power exponent.
 */
import { requireInRange, requireNonNegative, CalcInputError } from '../errors';
import { spaceAttenuationDb } from './geometry';

/** Largest power exponent accepted (a feed pattern about 1.6° wide at −3 dB). */
export const MAX_POWER_EXPONENT = 10_000;

/** Feed power pattern cos^q ψ relative to its peak (linear, 0 for ψ ≥ 90°). */
export function feedPowerPattern(powerExponent: number, feedAngleRad: number): number {
  const c = Math.cos(feedAngleRad);
  if (!(c > 0)) return 0;
  return powerExponent === 0 ? 1 : Math.pow(c, powerExponent);
}

/** Feed's own fall-off at feed angle ψ, dB (≤ 0): 10·q·log10(cos ψ). Needs ψ < 90°. */
export function feedEdgeLevelDb(powerExponent: number, feedAngleRad: number): number {
  requireInRange('powerExponent', powerExponent, 0, MAX_POWER_EXPONENT);
  requireInRange('feedAngleRad', feedAngleRad, 0, Math.PI / 2 - 1e-12, 'rad');
  return 10 * powerExponent * Math.log10(Math.cos(feedAngleRad));
}

/**
 * Edge taper at the rim, dB (≤ 0): aperture power density at the rim relative to the centre,
 * feed fall-off plus space attenuation: 10 q log10(cos ψ0) + 20 log10((1 + cos ψ0)/2).
 */
export function edgeTaperDb(powerExponent: number, rimHalfAngle: number): number {
  return feedEdgeLevelDb(powerExponent, rimHalfAngle) + spaceAttenuationDb(rimHalfAngle);
}

/**
 * Power exponent q giving a wanted edge taper (including space attenuation) at rim half-angle ψ0.
 * Throws CalcInputError if the taper is weaker than the space attenuation alone (it would need
 * a feed stronger at the rim than on axis, q < 0).
 */
export function powerExponentForEdgeTaper(edgeTaperDecibels: number, rimHalfAngle: number): number {
  requireInRange('feedAngleRad', rimHalfAngle, 1e-9, Math.PI / 2 - 1e-12, 'rad');
  requireNonNegative('edgeTaper (as a loss)', -edgeTaperDecibels, 'dB');
  const space = spaceAttenuationDb(rimHalfAngle);
  const feedPart = edgeTaperDecibels - space;
  if (feedPart > 1e-12) {
    throw new CalcInputError(
      'edgeTaperDb',
      `expected an edge taper of ${space.toFixed(2)} dB or lower: at this f/D the space attenuation alone gives ${space.toFixed(2)} dB at the rim, got ${edgeTaperDecibels} dB`,
    );
  }
  const q = Math.max(0, feedPart / (10 * Math.log10(Math.cos(rimHalfAngle))));
  if (q > MAX_POWER_EXPONENT) {
    throw new CalcInputError('edgeTaperDb', `the edge taper ${edgeTaperDecibels} dB needs a feed exponent above ${MAX_POWER_EXPONENT} at this f/D; expected a weaker taper`);
  }
  return q;
}
