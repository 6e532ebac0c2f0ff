/**
 * Surface-error (phase) efficiency by the Ruze equation: η = exp(−(4π ε/λ)²), ε the RMS surface
 * error normal to the surface, errors Gaussian, uncorrelated over many correlation cells.
 * J. Ruze, "Antenna tolerance theory — a review", Proc. IEEE 54(4), 1966.
 */
import { requireNonNegative, requirePositive } from '../errors';

/** Ruze surface efficiency (linear, 0…1) for RMS surface error ε and wavelength λ (same units). */
export function ruzeEfficiency(rmsSurfaceErrorM: number, wavelengthM: number): number {
  requireNonNegative('rmsSurfaceErrorM', rmsSurfaceErrorM, 'm');
  requirePositive('wavelengthM', wavelengthM, 'm');
  const x = (4 * Math.PI * rmsSurfaceErrorM) / wavelengthM;
  return Math.exp(-x * x);
}

/** Wavelength at which the Ruze-limited gain G ∝ λ⁻² exp(−(4πε/λ)²) peaks: λ = 4πε, metres (shorter wavelengths lose gain). */
export function ruzePeakGainWavelengthM(rmsSurfaceErrorM: number): number {
  requirePositive('rmsSurfaceErrorM', rmsSurfaceErrorM, 'm');
  return 4 * Math.PI * rmsSurfaceErrorM;
}
