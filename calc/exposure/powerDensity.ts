import { requireInRange, requireNonNegative, requirePositive } from '../errors';
import { freeSpaceWavelengthM } from '../wavelength';
import { circularApertureGain } from '../aperture/apertureGain';
import { farFieldDistanceM } from '../aperture/farFieldDistance';

/** EIRP in watts: transmit power × linear gain (gain in dBi, net of feed losses). */
export function eirpW(transmitPowerW: number, gainDbi: number, lossDb = 0): number {
  requirePositive('transmitPowerW', transmitPowerW, 'W');
  requireInRange('gainDbi', gainDbi, -50, 100, 'dBi');
  requireNonNegative('lossDb', lossDb, 'dB');
  return transmitPowerW * 10 ** ((gainDbi - lossDb) / 10);
}

/** Far-field power density on the beam axis, W/m²: S = EIRP/(4πR²). */
export function farFieldPowerDensityWPerM2(eirpWatts: number, distanceM: number): number {
  requirePositive('eirpW', eirpWatts, 'W');
  requirePositive('distanceM', distanceM, 'm');
  return eirpWatts / (4 * Math.PI * distanceM * distanceM);
}

/** Distance beyond which the far-field density falls below limitWPerM2: R = √(EIRP/(4π S_lim)). */
export function farFieldDistanceToLimitM(eirpWatts: number, limitWPerM2: number): number {
  requirePositive('eirpW', eirpWatts, 'W');
  requirePositive('limitWPerM2', limitWPerM2, 'W/m²');
  return Math.sqrt(eirpWatts / (4 * Math.PI * limitWPerM2));
}

/** Far-field boundary of an aperture, m: 2D²/λ (calc/aperture/farFieldDistance.ts), from the frequency. */
export function farFieldBoundaryM(apertureDiameterM: number, frequencyHz: number): number {
  requirePositive('apertureDiameterM', apertureDiameterM, 'm');
  return farFieldDistanceM(apertureDiameterM, freeSpaceWavelengthM(frequencyHz));
}

/**
 * Conservative on-axis power-density model of a circular aperture, after FCC OET Bulletin 65,
 * Edition 97-01 (1997), §2 (section number from memory) "Aperture antennas":
 * - at the surface, at most 4P/A (uniform illumination);
 * - near field (R ≤ D²/(4λ)): S_nf = 16ηP/(πD²);
 * - transition (D²/(4λ) < R < 0.6D²/λ): S_nf · R_nf / R;
 * - far field: P·G/(4πR²), with G = η(πD/λ)².
 * Returns the density at distanceM, W/m².
 */
export function apertureOnAxisPowerDensityWPerM2(
  transmitPowerW: number,
  apertureDiameterM: number,
  apertureEfficiency: number,
  frequencyHz: number,
  distanceM: number,
): number {
  requirePositive('transmitPowerW', transmitPowerW, 'W');
  requirePositive('apertureDiameterM', apertureDiameterM, 'm');
  requireInRange('apertureEfficiency', apertureEfficiency, Number.MIN_VALUE, 1);
  requirePositive('distanceM', distanceM, 'm');
  const { nearFieldExtentM, farFieldStartM, nearFieldDensityWPerM2 } = apertureNearFieldZones(transmitPowerW, apertureDiameterM, apertureEfficiency, frequencyHz);
  if (distanceM <= nearFieldExtentM) return nearFieldDensityWPerM2;
  if (distanceM < farFieldStartM) return (nearFieldDensityWPerM2 * nearFieldExtentM) / distanceM;
  const lambda = freeSpaceWavelengthM(frequencyHz);
  const gain = circularApertureGain(apertureDiameterM, lambda, apertureEfficiency);
  return (transmitPowerW * gain) / (4 * Math.PI * distanceM * distanceM);
}

/** Zone boundaries and levels of the OET-65 aperture model (see apertureOnAxisPowerDensityWPerM2). */
export function apertureNearFieldZones(transmitPowerW: number, apertureDiameterM: number, apertureEfficiency: number, frequencyHz: number) {
  const lambda = freeSpaceWavelengthM(frequencyHz);
  const areaM2 = (Math.PI * apertureDiameterM * apertureDiameterM) / 4;
  return {
    surfaceDensityWPerM2: (4 * transmitPowerW) / areaM2,
    nearFieldDensityWPerM2: (16 * apertureEfficiency * transmitPowerW) / (Math.PI * apertureDiameterM * apertureDiameterM),
    nearFieldExtentM: (apertureDiameterM * apertureDiameterM) / (4 * lambda),
    farFieldStartM: (0.6 * apertureDiameterM * apertureDiameterM) / lambda,
  };
}

/**
 * Distance beyond which the OET-65 aperture model falls below limitWPerM2 (m). Returns 0 when even
 * the surface bound 4P/A is below the limit, and the near-field extent when the limit lies between
 * S_nf and 4P/A (the density is then below the limit everywhere past the near field).
 */
export function apertureDistanceToLimitM(
  transmitPowerW: number,
  apertureDiameterM: number,
  apertureEfficiency: number,
  frequencyHz: number,
  limitWPerM2: number,
): number {
  requirePositive('limitWPerM2', limitWPerM2, 'W/m²');
  const zones = apertureNearFieldZones(transmitPowerW, apertureDiameterM, apertureEfficiency, frequencyHz);
  if (limitWPerM2 >= zones.surfaceDensityWPerM2) return 0;
  if (limitWPerM2 >= zones.nearFieldDensityWPerM2) return zones.nearFieldExtentM;
  const transitionDistance = (zones.nearFieldDensityWPerM2 * zones.nearFieldExtentM) / limitWPerM2;
  if (transitionDistance < zones.farFieldStartM) return transitionDistance;
  const lambda = freeSpaceWavelengthM(frequencyHz);
  const gain = circularApertureGain(apertureDiameterM, lambda, apertureEfficiency);
  return Math.max(zones.farFieldStartM, Math.sqrt((transmitPowerW * gain) / (4 * Math.PI * limitWPerM2)));
}
