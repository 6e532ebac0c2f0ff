/**
 * A plane wave in free space: power density ↔ RMS electric and magnetic field strength,
 * S = E²/η₀ = η₀H² with the wave impedance of free space η₀ = μ₀c ≈ 376.73 Ω.
 */
import { requireNonNegative } from '../errors';

/** Impedance of free space, Ω (CODATA 2018 recommended value 376.730 313 412 Ω, from memory; no longer exact since the 2019 SI). */
export const FREE_SPACE_IMPEDANCE_OHM = 376.730313412;

/** RMS electric field (V/m) of a plane wave carrying powerDensityWPerM2: √(S·η₀). */
export function electricFieldFromPowerDensityVPerM(powerDensityWPerM2: number): number {
  requireNonNegative('powerDensityWPerM2', powerDensityWPerM2, 'W/m²');
  return Math.sqrt(powerDensityWPerM2 * FREE_SPACE_IMPEDANCE_OHM);
}

/** RMS magnetic field (A/m) of a plane wave carrying powerDensityWPerM2: √(S/η₀). */
export function magneticFieldFromPowerDensityAPerM(powerDensityWPerM2: number): number {
  requireNonNegative('powerDensityWPerM2', powerDensityWPerM2, 'W/m²');
  return Math.sqrt(powerDensityWPerM2 / FREE_SPACE_IMPEDANCE_OHM);
}

/** Power density (W/m²) of a plane wave of RMS electric field electricFieldVPerM: E²/η₀. */
export function powerDensityFromElectricFieldWPerM2(electricFieldVPerM: number): number {
  requireNonNegative('electricFieldVPerM', electricFieldVPerM, 'V/m');
  return (electricFieldVPerM * electricFieldVPerM) / FREE_SPACE_IMPEDANCE_OHM;
}
