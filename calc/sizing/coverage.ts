/**
 * The coverage region every candidate is sized for, in one convention.
 *
 * The region is ±az in azimuth by ±el in elevation about a boresight. A face (planar, linear,
 * ring or Y array) faces the boresight: its normal is +z, x is horizontal and y vertical, so a
 * direction at azimuth az and elevation el (elevation measured from the horizontal plane) is
 * (cos el · sin az, sin el, cos el · cos az), with direction cosines u = sin az · cos el and
 * v = sin el. Its angle from the face normal is θ = acos(cos az · cos el): largest at the
 * region's corner, so the corner sets scan loss and beam broadening. A mechanically steered
 * antenna (reflector, Yagi–Uda) turns its boresight to every direction of the region instead.
 */
import { degToRad, radToDeg } from '../angle';
import { requireInRange } from '../errors';
import { maxGratingFreeSpacingWavelengths, type Lattice } from '../gratingLobeLimit';

/** Angle from the face normal of the region's corner, degrees: acos(cos az · cos el). */
export function coverageCornerScanDeg(azimuthDeg: number, elevationDeg: number): number {
  requireInRange('scanAzimuthDeg', azimuthDeg, 0, 90, '°');
  requireInRange('scanElevationDeg', elevationDeg, 0, 90, '°');
  const cosine = Math.cos(degToRad(azimuthDeg)) * Math.cos(degToRad(elevationDeg));
  return radToDeg(Math.acos(Math.min(1, Math.max(-1, cosine))));
}

/** Angle in the face plane (φ from the horizontal x axis) of the plane of scan through the corner, degrees. */
export function coverageCornerPlaneDeg(azimuthDeg: number, elevationDeg: number): number {
  const u = Math.sin(degToRad(azimuthDeg)) * Math.cos(degToRad(elevationDeg));
  const v = Math.sin(degToRad(elevationDeg));
  return u === 0 && v === 0 ? 0 : radToDeg(Math.atan2(v, u));
}

/**
 * The one scan angle to put into the one-angle grating-lobe limit (gratingLobeLimit.ts) so that it
 * holds over the whole region, degrees.
 * Rectangular lattice (axes horizontal and vertical): grating lobes sit at (u0 ± λ/d, v0) and
 * (u0, v0 ± λ/d); the first stays invisible while (λ/d − |u0|)² + v0² ≥ 1, i.e.
 * λ/d ≥ |u0| + √(1 − v0²) = cos el (1 + sin|az|), largest at el = 0, az = ±A: the limit is
 * 1/(1 + sin A) in the horizontal plane and likewise 1/(1 + sin E) in the vertical, so the larger
 * of the two plane edges decides, not the corner.
 * Equilateral triangular lattice: its six nearest grating lobes lie in oblique directions, so we
 * take the cone through the corner (θ = acos(cos az · cos el)), which contains the region:
 * conservative by at most the difference between the corner and the worse plane edge.
 */
export function coverageSpacingLimitScanDeg(azimuthDeg: number, elevationDeg: number, lattice: Lattice): number {
  return lattice === 'rectangular' ? Math.max(azimuthDeg, elevationDeg) : coverageCornerScanDeg(azimuthDeg, elevationDeg);
}

/** Largest grating-lobe-free spacing over the whole region, wavelengths (see coverageSpacingLimitScanDeg). */
export function coverageSpacingLimitWavelengths(azimuthDeg: number, elevationDeg: number, lattice: Lattice): number {
  return maxGratingFreeSpacingWavelengths(coverageSpacingLimitScanDeg(azimuthDeg, elevationDeg, lattice), lattice);
}
