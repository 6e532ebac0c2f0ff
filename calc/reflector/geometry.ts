/**
 * Geometry of a front-fed (prime-focus) paraboloid: z = ρ²/(4f), focus at z = f, vertex at the
 * origin. ψ is the angle at the focus between the axis (towards the vertex) and a ray to the
 * reflector. Standard results; e.g. Balanis, Antenna Theory, 4th ed., §15.4 (section number from memory).
 */
import { requireInRange, requirePositive } from '../errors';

/** Focal length f = (f/D)·D, metres. */
export function focalLengthM(diameterM: number, focalRatio: number): number {
  requirePositive('diameterM', diameterM, 'm');
  requirePositive('focalRatio', focalRatio);
  return focalRatio * diameterM;
}

/** Depth of the dish from rim plane to vertex, D²/(16 f), metres. */
export function dishDepthM(diameterM: number, focalLengthMetres: number): number {
  requirePositive('diameterM', diameterM, 'm');
  requirePositive('focalLengthM', focalLengthMetres, 'm');
  return (diameterM * diameterM) / (16 * focalLengthMetres);
}

/** Half-angle subtended by the rim at the focus, ψ0 = 2·atan(1/(4 f/D)), radians. */
export function rimHalfAngleRad(focalRatio: number): number {
  requirePositive('focalRatio', focalRatio);
  return 2 * Math.atan(1 / (4 * focalRatio));
}

/** Aperture radius reached by the ray at feed angle ψ: ρ = 2f·tan(ψ/2), metres. */
export function apertureRadiusAtFeedAngleM(focalLengthMetres: number, feedAngleRad: number): number {
  requirePositive('focalLengthM', focalLengthMetres, 'm');
  requireInRange('feedAngleRad', feedAngleRad, 0, Math.PI - 1e-9, 'rad');
  return 2 * focalLengthMetres * Math.tan(feedAngleRad / 2);
}

/** Feed angle ψ of the ray reaching aperture radius ρ: ψ = 2·atan(ρ/(2f)), radians. */
export function feedAngleAtApertureRadiusRad(focalLengthMetres: number, radiusM: number): number {
  requirePositive('focalLengthM', focalLengthMetres, 'm');
  requireInRange('radiusM', radiusM, 0, Number.MAX_VALUE, 'm');
  return 2 * Math.atan(radiusM / (2 * focalLengthMetres));
}

/** Distance from the focus to the reflector along feed angle ψ: r = f / cos²(ψ/2), metres. */
export function focusToReflectorM(focalLengthMetres: number, feedAngleRad: number): number {
  requirePositive('focalLengthM', focalLengthMetres, 'm');
  requireInRange('feedAngleRad', feedAngleRad, 0, Math.PI - 1e-9, 'rad');
  const c = Math.cos(feedAngleRad / 2);
  return focalLengthMetres / (c * c);
}

/**
 * Space attenuation at feed angle ψ relative to the axis, in dB (≤ 0): 20·log10((1 + cos ψ)/2).
 * The spherical wave from the feed travels farther to the rim (r ∝ 1/cos²(ψ/2)), so the aperture
 * power density falls as ((1 + cos ψ)/2)² on top of the feed's own pattern.
 */
export function spaceAttenuationDb(feedAngleRad: number): number {
  requireInRange('feedAngleRad', feedAngleRad, 0, Math.PI - 1e-9, 'rad');
  return 20 * Math.log10((1 + Math.cos(feedAngleRad)) / 2);
}
