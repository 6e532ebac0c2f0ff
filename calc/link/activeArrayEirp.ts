/**
 * EIRP of an active array whose N elements each radiate elementPowerW through an element gain: the
 * powers add in the far field coherently in the beam direction, so EIRP = N²·P_el·G_el while the
 * total radiated power is N·P_el (array gain N·G_el times N·P_el). Mailloux, Phased Array Antenna
 * Handbook, 3rd ed., 2018 (from memory). Idealized: equal amplitudes, no mutual-coupling mismatch.
 */
import { requireFinite, requireInteger, requirePositive } from '../errors';

/** Total power (W) radiated by N elements of elementPowerW each. */
export function activeArrayTotalPowerW(elementCount: number, elementPowerW: number): number {
  requireInteger('elementCount', elementCount, 1, 1e9);
  requirePositive('elementPowerW', elementPowerW, 'W');
  return elementCount * elementPowerW;
}

/** EIRP (W) of N elements of elementPowerW each, element gain elementGainDbi in the beam direction: N²·P_el·G_el. */
export function activeArrayEirpW(elementCount: number, elementPowerW: number, elementGainDbi: number): number {
  requireFinite('elementGainDbi', elementGainDbi, 'dBi');
  return activeArrayTotalPowerW(elementCount, elementPowerW) * elementCount * 10 ** (elementGainDbi / 10);
}
