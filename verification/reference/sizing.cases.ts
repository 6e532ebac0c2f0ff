import type { ReferenceGroup } from './referenceCase';
import { diameterForGainM } from '../../calc/aperture/index';
import { freeSpaceWavelengthM } from '../../calc/wavelength';
import { RING_FIRST_SIDELOBE_DB } from '../../calc/sizing/ringCandidates';
import { elementBeamwidthDeg } from '../../calc/sizing/lineCandidate';
import { coverageCornerScanDeg, coverageSpacingLimitWavelengths } from '../../calc/sizing/coverage';

export const sizingCases: ReferenceGroup = {
  topic: 'Architecture sizing',
  modules: ['calc/sizing/'],
  cases: [
    { id: 'sizing-dish-40dbi', title: 'Dish for 40 dBi at 10 GHz with η = 0.6: D = (λ/π)√(G/η)', source: 'Gain of a circular aperture G = η(πD/λ)² (Balanis, Antenna Theory, 4th ed., §15.4 (section number from memory)); hand-worked', expected: (0.0299792458 / Math.PI) * Math.sqrt(1e4 / 0.6), tolerance: 1e-9, quantity: 'lengthM', reads: 'diameterForGainM', compute: () => diameterForGainM(40, 0.6, freeSpaceWavelengthM(10e9)) },
    { id: 'sizing-ring-sidelobe', title: 'First sidelobe of a continuous uniform ring: 20·log10|J0(3.8317)|', source: 'Balanis, Antenna Theory, 4th ed., §6.10 (section number from memory) (ring pattern J0)', expected: -7.90, tolerance: 0.01, quantity: 'dB', reads: 'RING_FIRST_SIDELOBE_DB', compute: () => RING_FIRST_SIDELOBE_DB },
    { id: 'sizing-element-beam', title: 'Beamwidth of a 6 dBi element by the beam-area relation G ≈ 41 253/θ²', source: 'Kraus, Antennas, 2nd ed., §2-13 (section number from memory) (beam area; 41 253 = 4π(180/π)² deg²); hand-worked √(41 252.96/3.981) = 101.8°', expected: 101.795, tolerance: 1e-3, quantity: 'angleDeg', reads: 'elementBeamwidthDeg', compute: () => elementBeamwidthDeg(6) },
    { id: 'sizing-coverage-corner', title: 'Corner of a ±45° az × ±45° el coverage from the face normal: acos(cos 45° · cos 45°)', source: 'Direction cosines of an az/el direction (Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory)); hand-worked acos(0.5) = 60°', expected: 60, tolerance: 1e-9, quantity: 'angleDeg', reads: 'coverageCornerScanDeg', compute: () => coverageCornerScanDeg(45, 45) },
    { id: 'sizing-region-spacing', title: 'Grating-lobe-free square-lattice spacing over ±45° az × ±45° el: 1/(1 + sin 45°)', source: 'Grating lobes at û0 + (λ/d)·g (Mailloux, Phased Array Antenna Handbook, 2nd ed., §2.1 (section number from memory)); hand-worked 1/1.7071 = 0.5858 λ, the plane edge deciding', expected: 0.585786, tolerance: 1e-6, quantity: 'lengthWavelengths', reads: 'coverageSpacingLimitWavelengths', compute: () => coverageSpacingLimitWavelengths(45, 45, 'rectangular') },
  ],
};
