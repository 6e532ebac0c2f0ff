/**
 * Thermal noise: the Boltzmann constant and kT in decibels.
 */
import { requirePositive } from '../errors';

/** Boltzmann constant, J/K (exact since the 2019 SI redefinition: BIPM, The International System of Units, 9th ed., 2019). */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

/** Standard reference noise temperature T₀ = 290 K (IEEE Std 145 and the noise-figure definition; common practice). */
export const REFERENCE_NOISE_TEMPERATURE_K = 290;

/** Boltzmann constant in decibels, 10·log10(k / (1 W/(K·Hz))) ≈ −228.60 dBW/(K·Hz). */
export const BOLTZMANN_DBW_PER_K_HZ = 10 * Math.log10(BOLTZMANN_J_PER_K);

/** Available noise power spectral density kT of a source at temperatureK, in dBm/Hz (kT₀ ≈ −173.98 dBm/Hz at 290 K). */
export function noiseDensityDbmPerHz(temperatureK: number): number {
  requirePositive('temperatureK', temperatureK, 'K');
  return 10 * Math.log10(BOLTZMANN_J_PER_K * temperatureK) + 30;
}

/** Available noise power kTB in dBm at temperatureK over bandwidthHz. */
export function thermalNoisePowerDbm(temperatureK: number, bandwidthHz: number): number {
  requirePositive('bandwidthHz', bandwidthHz, 'Hz');
  return noiseDensityDbmPerHz(temperatureK) + 10 * Math.log10(bandwidthHz);
}
