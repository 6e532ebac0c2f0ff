import { SPEED_OF_LIGHT_M_PER_S } from './constants';
import { requirePositive, requireInRange } from './errors';

/** Free-space wavelength in metres: λ0 = c / f. */
export function freeSpaceWavelengthM(frequencyHz: number): number {
  requirePositive('frequencyHz', frequencyHz, 'Hz');
  return SPEED_OF_LIGHT_M_PER_S / frequencyHz;
}

/** Frequency (Hz) of a free-space wavelength wavelengthM: f = c / λ0. */
export function freeSpaceFrequencyHz(wavelengthM: number): number {
  requirePositive('wavelengthM', wavelengthM, 'm');
  return SPEED_OF_LIGHT_M_PER_S / wavelengthM;
}

/** Wavelength in a lossless non-magnetic medium, metres: λ = c / (f √εr). */
export function mediumWavelengthM(frequencyHz: number, relativePermittivity: number): number {
  requirePositive('frequencyHz', frequencyHz, 'Hz');
  requireInRange('relativePermittivity', relativePermittivity, 1, 1000);
  return SPEED_OF_LIGHT_M_PER_S / (frequencyHz * Math.sqrt(relativePermittivity));
}

/** Free-space wavenumber k = 2π/λ0 in rad/m. */
export function wavenumberRadPerM(frequencyHz: number): number {
  return (2 * Math.PI) / freeSpaceWavelengthM(frequencyHz);
}
