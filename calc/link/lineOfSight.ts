/**
 * Line-of-sight geometry of a link: the first Fresnel-zone radius and the radio horizon.
 */
import { CalcInputError, requireNonNegative, requirePositive } from '../errors';
import { freeSpaceWavelengthM } from '../wavelength';

/** Mean earth radius, m (6371 km; the value ITU-R P.452 and P.530 use, from memory). */
export const EARTH_RADIUS_M = 6_371_000;

/** Effective earth-radius factor of the standard atmosphere, k = 4/3 (common practice; ITU-R P.453/P.530 median, from memory). */
export const STANDARD_EARTH_RADIUS_FACTOR = 4 / 3;

/**
 * Radius (m) of the n-th Fresnel zone at distance distanceFromTransmitterM along a path of
 * length pathLengthM: √(n·λ·d₁·d₂/(d₁ + d₂)). At the midpoint of the first zone: ½√(λd).
 */
export function fresnelZoneRadiusM(pathLengthM: number, distanceFromTransmitterM: number, frequencyHz: number, zone = 1): number {
  requirePositive('pathLengthM', pathLengthM, 'm');
  requireNonNegative('distanceFromTransmitterM', distanceFromTransmitterM, 'm');
  if (distanceFromTransmitterM > pathLengthM) {
    throw new CalcInputError('distanceFromTransmitterM', `expected a point on the path, 0 to ${pathLengthM} m, got ${distanceFromTransmitterM} m`);
  }
  requirePositive('zone', zone);
  const d1 = distanceFromTransmitterM;
  const d2 = pathLengthM - d1;
  return Math.sqrt((zone * freeSpaceWavelengthM(frequencyHz) * d1 * d2) / pathLengthM);
}

/** First Fresnel-zone radius (m) at the midpoint of a path of length pathLengthM: ½√(λd). */
export function midpointFresnelRadiusM(pathLengthM: number, frequencyHz: number): number {
  return fresnelZoneRadiusM(pathLengthM, pathLengthM / 2, frequencyHz);
}

/**
 * Radio horizon (m) between two antennas at heights above a smooth earth: √(2kaH₁) + √(2kaH₂),
 * with effective earth-radius factor k (4/3 by default). Beyond it the earth blocks the direct path.
 */
export function radioHorizonM(heightTransmitM: number, heightReceiveM: number, earthRadiusFactor = STANDARD_EARTH_RADIUS_FACTOR): number {
  requireNonNegative('heightTransmitM', heightTransmitM, 'm');
  requireNonNegative('heightReceiveM', heightReceiveM, 'm');
  requirePositive('earthRadiusFactor', earthRadiusFactor);
  const effectiveRadiusM = earthRadiusFactor * EARTH_RADIUS_M;
  return Math.sqrt(2 * effectiveRadiusM * heightTransmitM) + Math.sqrt(2 * effectiveRadiusM * heightReceiveM);
}
