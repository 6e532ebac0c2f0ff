import { radToDeg } from '../angle';
import { CalcInputError, requireFinite, requirePositive } from '../errors';
import { freeSpaceWavelengthM } from '../wavelength';
import { directionCosines } from './steering';
import type { DirectionDeg } from './types';

/** A grating lobe in visible space: its reciprocal-lattice order, direction cosines and angles (degrees). */
export interface GratingLobe {
  order: [number, number];
  u: number;
  v: number;
  thetaDeg: number;
  phiDeg: number;
}

/**
 * Reciprocal vectors b_i (per wavelength) of lattice vectors a_i (λ) with a_i·b_j = δ_ij; for a
 * line (one vector along x) b = (1/d, 0). The array factor repeats at û0 + p b1 + q b2.
 */
export function reciprocalVectors(vectorsWavelengths: Array<[number, number]>): Array<[number, number]> {
  if (vectorsWavelengths.length === 1) {
    const [ax, ay] = vectorsWavelengths[0];
    const length2 = ax * ax + ay * ay;
    requirePositive('latticeVector length', length2, 'λ²');
    return [[ax / length2, ay / length2]];
  }
  const [[a1x, a1y], [a2x, a2y]] = vectorsWavelengths;
  const det = a1x * a2y - a1y * a2x;
  if (!(Math.abs(det) > 1e-15)) throw new CalcInputError('latticeVectors', 'expected two independent lattice vectors');
  return [[a2y / det, -a2x / det], [-a1y / det, a1x / det]];
}

/**
 * Directions of the grating lobes inside visible space (u² + v² ≤ 1) for lattice vectors in λ
 * and beam direction (θ0, φ0): û0 + p b1 + q b2 with (p, q) ≠ (0, 0) (Mailloux, "Phased Array
 * Antenna Handbook", 2nd ed., §2.1 (section number from memory)). For a line along x the lobe cone is reported where it
 * crosses the plane through the beam (v = v0).
 */
export function gratingLobeDirections(vectorsWavelengths: Array<[number, number]>, beam: DirectionDeg): GratingLobe[] {
  for (const [x, y] of vectorsWavelengths) { requireFinite('latticeVector.x', x, 'λ'); requireFinite('latticeVector.y', y, 'λ'); }
  const reciprocal = reciprocalVectors(vectorsWavelengths);
  const [u0, v0] = directionCosines(beam.thetaDeg, beam.phiDeg);
  const lengths = reciprocal.map(([x, y]) => Math.hypot(x, y));
  const maxOrder = (b: number) => Math.ceil(2 / b) + 1;
  const pMax = maxOrder(lengths[0]);
  const qMax = reciprocal.length > 1 ? maxOrder(lengths[1]) + pMax : 0;
  const lobes: GratingLobe[] = [];
  for (let p = -pMax; p <= pMax; p++) {
    for (let q = -qMax; q <= qMax; q++) {
      if (p === 0 && q === 0) continue;
      const u = u0 + p * reciprocal[0][0] + (q !== 0 ? q * reciprocal[1][0] : 0);
      const v = v0 + p * reciprocal[0][1] + (q !== 0 ? q * reciprocal[1][1] : 0);
      const r2 = u * u + v * v;
      if (r2 > 1 + 1e-12) continue;
      const sinTheta = Math.min(1, Math.sqrt(r2));
      const phi = r2 > 0 ? radToDeg(Math.atan2(v, u)) : 0;
      lobes.push({ order: [p, q], u, v, thetaDeg: radToDeg(Math.asin(sinTheta)), phiDeg: phi < 0 ? phi + 360 : phi });
    }
  }
  return lobes;
}

/** Lattice vectors in metres converted to wavelengths at frequencyHz (evaluate at the highest frequency of a band). */
export function latticeVectorsWavelengths(vectorsM: Array<[number, number]>, frequencyHz: number): Array<[number, number]> {
  const wavelengthM = freeSpaceWavelengthM(frequencyHz);
  return vectorsM.map(([x, y]) => [requireFinite('latticeVector.x', x, 'm') / wavelengthM, requireFinite('latticeVector.y', y, 'm') / wavelengthM]);
}

/**
 * Offset (direction cosines) of a point (u, v) from the replica û0 + p·b1 + q·b2 of the beam
 * nearest to it, among the orders allowed: for a line only the component along the line counts
 * (the array factor is constant across it), for a two-dimensional lattice the plain distance.
 */
function nearestReplicaDistance(vectorsWavelengths: Array<[number, number]>, beamUv: [number, number], pointUv: [number, number], allow: (p: number, q: number) => boolean): number {
  const du = pointUv[0] - beamUv[0], dv = pointUv[1] - beamUv[1];
  const reciprocal = reciprocalVectors(vectorsWavelengths);
  if (reciprocal.length === 1) {
    const [bx, by] = reciprocal[0];
    const length = Math.hypot(bx, by);
    const along = (du * bx + dv * by) / length; // component along the line's reciprocal direction
    const order = Math.round(along / length);
    let best = Infinity;
    for (const p of [order - 1, order, order + 1]) if (allow(p, 0)) best = Math.min(best, Math.abs(along - p * length));
    return best;
  }
  // fractional lattice coordinates: Δ = α b1 + β b2 with α = Δ·a1, β = Δ·a2 (a_i·b_j = δ_ij)
  const [[a1x, a1y], [a2x, a2y]] = vectorsWavelengths;
  const alpha = Math.round(du * a1x + dv * a1y), beta = Math.round(du * a2x + dv * a2y);
  let best = Infinity;
  for (let p = alpha - 2; p <= alpha + 2; p++) {
    for (let q = beta - 2; q <= beta + 2; q++) {
      if (!allow(p, q)) continue;
      best = Math.min(best, Math.hypot(du - p * reciprocal[0][0] - q * reciprocal[1][0], dv - p * reciprocal[0][1] - q * reciprocal[1][1]));
    }
  }
  return best;
}

/**
 * Distance in direction cosines from (u, v) to the nearest grating-lobe centre û0 + p·b1 + q·b2,
 * (p, q) ≠ (0, 0), visible or not (along the line for a line array). A pattern maximum closer to a
 * grating-lobe centre than the main beam's first null is to û0 belongs to that grating lobe: the
 * array factor repeats the main beam there (Mailloux, "Phased Array Antenna Handbook", 2nd ed., §2.1 (section number from memory)).
 */
export function distanceToGratingLobe(vectorsWavelengths: Array<[number, number]>, beamUv: [number, number], pointUv: [number, number]): number {
  return nearestReplicaDistance(vectorsWavelengths, beamUv, pointUv, (p, q) => p !== 0 || q !== 0);
}

/** Distance in direction cosines from (u, v) to the main beam û0 (along the line for a line array), in the metric of distanceToGratingLobe. */
export function distanceFromMainBeam(vectorsWavelengths: Array<[number, number]>, beamUv: [number, number], pointUv: [number, number]): number {
  return nearestReplicaDistance(vectorsWavelengths, beamUv, pointUv, (p, q) => p === 0 && q === 0);
}
