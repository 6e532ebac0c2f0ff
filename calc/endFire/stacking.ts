/**
 * Stacking identical Yagi–Uda antennas and the beamwidth estimate it needs. Common practice,
 * no single published source: the figures are rules of thumb, and the page says so.
 */
import { CalcInputError, requireInRange, requirePositive } from '../errors';
import { degToRad } from '../angle';
import { SPHERE_SQUARE_DEG } from '../beamSolidAngle';

/** Bays in a stack. */
export type StackBays = 1 | 2 | 4;

/**
 * Usual gain increase of a stack of identical Yagis over one (dB), as a range: 2 bays +2.5 to +3 dB,
 * 4 bays +5 to +6 dB (common practice, no source; the ideal lossless figures are +3.01 and +6.02 dB).
 */
export function stackingGainIncreaseDb(bays: StackBays): { low: number; high: number } {
  if (bays === 1) return { low: 0, high: 0 };
  if (bays === 2) return { low: 2.5, high: 3 };
  if (bays === 4) return { low: 5, high: 6 };
  throw new CalcInputError('bays', `expected 1, 2 or 4 bays, got ${bays}`);
}

/**
 * Stacking distance (λ) in a plane whose half-power beamwidth is hpbwDeg:
 * D ≈ λ / (2 sin(HPBW/2)) (common practice, no source: it places the first null of the
 * two-bay array factor near the single antenna's half-power points).
 */
export function stackingDistanceWavelengths(hpbwDeg: number): number {
  requireInRange('hpbwDeg', hpbwDeg, 1e-6, 180, '°');
  return 1 / (2 * Math.sin(degToRad(hpbwDeg) / 2));
}

/**
 * HPBW (degrees) of a beam with equal E- and H-plane widths and directivity D, from the
 * beam-area estimate D ≈ 41 253 / (θ_E θ_H) with both in degrees (SPHERE_SQUARE_DEG, calc/beamSolidAngle.ts;
 * Kraus, "Antennas", 2nd ed., §2-13 (section number from memory); an estimate for a single main beam without large sidelobes).
 */
export function hpbwFromDirectivityDeg(directivity: number): number {
  requirePositive('directivity', directivity);
  const beamAreaDeg2 = SPHERE_SQUARE_DEG / directivity;
  return Math.min(180, Math.sqrt(beamAreaDeg2));
}

/** Inverse of hpbwFromDirectivityDeg: directivity of a beam with equal E- and H-plane HPBW (degrees), D ≈ 41 253/θ². */
export function directivityForEqualPlaneHpbw(hpbwDeg: number): number {
  requireInRange('hpbwDeg', hpbwDeg, 1e-6, 180, '°');
  return SPHERE_SQUARE_DEG / (hpbwDeg * hpbwDeg);
}
