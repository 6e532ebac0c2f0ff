import type { ReferenceGroup } from './referenceCase';
import { freeSpacePathLossDb, p525BasicTransmissionLossDb } from '../../calc/link/friis';
import { apertureDistanceToLimitM, farFieldBoundaryM, farFieldDistanceToLimitM } from '../../calc/exposure/powerDensity';

export const linkExposureCases: ReferenceGroup = {
  topic: 'Link range and RF exposure',
  modules: ['calc/link/friis.ts', 'calc/exposure/powerDensity.ts'],
  cases: [
    { id: 'fspl-1km-1ghz', title: 'Free-space path loss, 1 km at 1 GHz: 20·log10(4πR/λ)', source: 'Friis, Proc. IRE 34 (1946); hand-worked', expected: 92.44778, tolerance: 1e-4, quantity: 'dB', reads: 'freeSpacePathLossDb', compute: () => freeSpacePathLossDb(1000, 1e9) },
    { id: 'p525-10km-2g4', title: 'Basic transmission loss, 10 km at 2.4 GHz, P.525 form', source: 'Recommendation ITU-R P.525-4 (2019), eq. (8) (equation number from memory)', expected: 120.0042, tolerance: 1e-3, quantity: 'dB', reads: 'p525BasicTransmissionLossDb', compute: () => p525BasicTransmissionLossDb(10_000, 2.4e9) },
    { id: 'fspl-vs-p525', title: 'Friis and P.525 forms differ by the rounding of the constant (32.448 − 32.4)', source: 'Recommendation ITU-R P.525-4 (2019), eq. (8) (equation number from memory)', expected: 0.0478, tolerance: 5e-4, quantity: 'dB', reads: 'freeSpacePathLossDb', compute: () => freeSpacePathLossDb(5e4, 7e9) - p525BasicTransmissionLossDb(5e4, 7e9) },
    { id: 'exposure-ff-10kw', title: '10 kW EIRP, 10 W/m² limit: distance √(EIRP/(4πS))', source: 'FCC OET Bulletin 65, Ed. 97-01 (1997), eq. (3) (equation number from memory); hand-worked', expected: 8.92062, tolerance: 1e-4, quantity: 'lengthM', reads: 'farFieldDistanceToLimitM', compute: () => farFieldDistanceToLimitM(10_000, 10) },
    { id: 'exposure-aperture-transition', title: '100 W into a 1 m aperture (η 0.55, λ 0.1 m), 200 W/m² limit: transition region 16ηP/(πD²)·R_nf/S', source: 'FCC OET Bulletin 65, Ed. 97-01 (1997), §2 (section number from memory); hand-worked', expected: 3.50141, tolerance: 1e-4, quantity: 'lengthM', reads: 'apertureDistanceToLimitM', compute: () => apertureDistanceToLimitM(100, 1, 0.55, 2_997_924_580, 200) },
    { id: 'far-field-3m-10ghz', title: 'Far-field boundary 2D²/λ of a 3 m aperture at 10 GHz', source: 'IEEE Std 149-2021, IEEE Recommended Practice for Antenna Measurements (far-field criterion); hand-worked', expected: 600.4153, tolerance: 1e-3, quantity: 'lengthM', reads: 'farFieldBoundaryM', compute: () => farFieldBoundaryM(3, 10e9) },
  ],
};
