/**
 * Figure of merit G/T and the carrier-to-noise ratios of a link (any satellite-communications or
 * radio-systems text, e.g. Maral & Bousquet, Satellite Communications Systems, 5th ed., 2009).
 */
import { requireFinite, requirePositive } from '../errors';
import { BOLTZMANN_J_PER_K, noiseDensityDbmPerHz, REFERENCE_NOISE_TEMPERATURE_K } from './thermalNoise';

/** Receiving figure of merit G/T in dB/K: receive gain (dBi) minus 10·log10(T_sys / 1 K). */
export function gOverTDbPerK(receiveGainDbi: number, systemNoiseTemperatureK: number): number {
  requireFinite('receiveGainDbi', receiveGainDbi, 'dBi');
  requirePositive('systemNoiseTemperatureK', systemNoiseTemperatureK, 'K');
  return receiveGainDbi - 10 * Math.log10(systemNoiseTemperatureK);
}

/** Carrier-to-noise-density ratio C/N₀ in dB·Hz: received power (dBm) minus kT_sys (dBm/Hz). */
export function carrierToNoiseDensityDbHz(receivedPowerDbm: number, systemNoiseTemperatureK: number): number {
  requireFinite('receivedPowerDbm', receivedPowerDbm, 'dBm');
  return receivedPowerDbm - noiseDensityDbmPerHz(systemNoiseTemperatureK);
}

/** Carrier-to-noise-density ratio C/N₀ in dB·Hz from EIRP (dBW), the path losses (dB) and G/T (dB/K): EIRP − L + G/T − 10·log10 k. */
export function carrierToNoiseDensityFromGOverTDbHz(eirpDbw: number, pathLossDb: number, gOverTValueDbPerK: number): number {
  requireFinite('eirpDbw', eirpDbw, 'dBW');
  requireFinite('pathLossDb', pathLossDb, 'dB');
  requireFinite('gOverTDbPerK', gOverTValueDbPerK, 'dB/K');
  return eirpDbw - pathLossDb + gOverTValueDbPerK - 10 * Math.log10(BOLTZMANN_J_PER_K);
}

/** Carrier-to-noise ratio C/N in dB in a noise bandwidth: C/N₀ − 10·log10(B). */
export function carrierToNoiseDb(carrierToNoiseDensityValueDbHz: number, bandwidthHz: number): number {
  requireFinite('carrierToNoiseDensityDbHz', carrierToNoiseDensityValueDbHz, 'dB·Hz');
  requirePositive('bandwidthHz', bandwidthHz, 'Hz');
  return carrierToNoiseDensityValueDbHz - 10 * Math.log10(bandwidthHz);
}

/** Energy per bit over noise density Eb/N₀ in dB at a bit rate: C/N₀ − 10·log10(R_b). */
export function ebN0Db(carrierToNoiseDensityValueDbHz: number, bitRateBitPerS: number): number {
  requireFinite('carrierToNoiseDensityDbHz', carrierToNoiseDensityValueDbHz, 'dB·Hz');
  requirePositive('bitRateBitPerS', bitRateBitPerS, 'bit/s');
  return carrierToNoiseDensityValueDbHz - 10 * Math.log10(bitRateBitPerS);
}

/**
 * Receiver sensitivity in dBm: kT₀B + NF + required SNR, the smallest input power at which a
 * receiver of noise figure noiseFigureDb, fed from a source at T₀ = 290 K, reaches requiredSnrDb
 * in bandwidthHz.
 */
export function sensitivityDbm(bandwidthHz: number, noiseFigureDb: number, requiredSnrDb: number): number {
  requirePositive('bandwidthHz', bandwidthHz, 'Hz');
  requireFinite('noiseFigureDb', noiseFigureDb, 'dB');
  requireFinite('requiredSnrDb', requiredSnrDb, 'dB');
  return noiseDensityDbmPerHz(REFERENCE_NOISE_TEMPERATURE_K) + 10 * Math.log10(bandwidthHz) + noiseFigureDb + requiredSnrDb;
}

/** C/N₀ in dB·Hz that gives ebN0ValueDb at a bit rate: Eb/N₀ + 10·log10(R_b). */
export function carrierToNoiseDensityFromEbN0DbHz(ebN0ValueDb: number, bitRateBitPerS: number): number {
  requireFinite('ebN0Db', ebN0ValueDb, 'dB');
  requirePositive('bitRateBitPerS', bitRateBitPerS, 'bit/s');
  return ebN0ValueDb + 10 * Math.log10(bitRateBitPerS);
}
