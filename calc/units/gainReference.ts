/** Gain over isotropic ↔ over a half-wave dipole: dBd = dBi − 2.15 (the lossless half-wave dipole's directivity). */
import { DIPOLE_DIRECTIVITY_DBI } from '../constants';
import { requireFinite } from '../errors';

/** Gain over a half-wave dipole (dBd) from gain over isotropic (dBi). */
export function dbiToDbd(gainDbi: number): number {
  requireFinite('gainDbi', gainDbi, 'dBi');
  return gainDbi - DIPOLE_DIRECTIVITY_DBI;
}

/** Gain over isotropic (dBi) from gain over a half-wave dipole (dBd). */
export function dbdToDbi(gainDbd: number): number {
  requireFinite('gainDbd', gainDbd, 'dBd');
  return gainDbd + DIPOLE_DIRECTIVITY_DBI;
}
