import { requireFinite, requirePositive } from '../errors';
import { freeSpaceWavelengthM } from '../wavelength';
import { dbToPowerRatio, powerRatioToDb } from '../decibel';

/**
 * Free-space path loss in dB between isotropic antennas: 20·log10(4πR/λ).
 * Friis, "A note on a simple transmission formula", Proc. IRE 34 (1946).
 */
export function freeSpacePathLossDb(distanceM: number, frequencyHz: number): number {
  requirePositive('distanceM', distanceM, 'm');
  return 20 * Math.log10((4 * Math.PI * distanceM) / freeSpaceWavelengthM(frequencyHz));
}

/**
 * Free-space basic transmission loss in the ITU-R P.525 form: 32.4 + 20·log10(f/MHz) + 20·log10(d/km) dB.
 * Recommendation ITU-R P.525-4 (2019), eq. (8) (equation number from memory). The constant 32.4 is 20·log10(4π·10⁹/c) = 32.45 rounded.
 */
export function p525BasicTransmissionLossDb(distanceM: number, frequencyHz: number): number {
  requirePositive('distanceM', distanceM, 'm');
  requirePositive('frequencyHz', frequencyHz, 'Hz');
  return 32.4 + 20 * Math.log10(frequencyHz / 1e6) + 20 * Math.log10(distanceM / 1e3);
}

/**
 * Received power in dBm by the Friis equation: Pr = Pt + Gt + Gr − FSPL − other losses (all dB).
 */
export function friisReceivedPowerDbm(
  transmitPowerDbm: number,
  transmitGainDbi: number,
  receiveGainDbi: number,
  distanceM: number,
  frequencyHz: number,
  otherLossDb = 0,
): number {
  requireFinite('transmitPowerDbm', transmitPowerDbm, 'dBm');
  requireFinite('transmitGainDbi', transmitGainDbi, 'dBi');
  requireFinite('receiveGainDbi', receiveGainDbi, 'dBi');
  requireFinite('otherLossDb', otherLossDb, 'dB');
  return transmitPowerDbm + transmitGainDbi + receiveGainDbi - freeSpacePathLossDb(distanceM, frequencyHz) - otherLossDb;
}

/**
 * Largest distance at which the received power still reaches requiredDbm (Friis solved for R):
 * R = (λ/4π)·10^((Pt + Gt + Gr − L − Preq)/20).
 */
export function friisMaxRangeM(
  transmitPowerDbm: number,
  transmitGainDbi: number,
  receiveGainDbi: number,
  requiredPowerDbm: number,
  frequencyHz: number,
  otherLossDb = 0,
): number {
  requireFinite('requiredPowerDbm', requiredPowerDbm, 'dBm');
  const budgetDb = transmitPowerDbm + transmitGainDbi + receiveGainDbi - otherLossDb - requiredPowerDbm;
  requireFinite('link budget', budgetDb, 'dB');
  return (freeSpaceWavelengthM(frequencyHz) / (4 * Math.PI)) * 10 ** (budgetDb / 20);
}

/**
 * Sum of the two antenna gains (dBi) needed to close a link at distanceM:
 * Gt + Gr = Preq − Pt + FSPL + L.
 */
export function friisRequiredGainSumDbi(
  transmitPowerDbm: number,
  requiredPowerDbm: number,
  distanceM: number,
  frequencyHz: number,
  otherLossDb = 0,
): number {
  requireFinite('transmitPowerDbm', transmitPowerDbm, 'dBm');
  requireFinite('requiredPowerDbm', requiredPowerDbm, 'dBm');
  return requiredPowerDbm - transmitPowerDbm + freeSpacePathLossDb(distanceM, frequencyHz) + otherLossDb;
}

/** Watts to dBm. */
export function wattsToDbm(powerW: number): number {
  requirePositive('powerW', powerW, 'W');
  return powerRatioToDb(powerW) + 30;
}

/** dBm to watts. */
export function dbmToWatts(powerDbm: number): number {
  requireFinite('powerDbm', powerDbm, 'dBm');
  return dbToPowerRatio(powerDbm - 30);
}
