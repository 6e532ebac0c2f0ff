import type { ReferenceGroup } from './referenceCase';
import { backplaneRoundTripPhaseRad, dipoleOverPlaneDirectivity, flattestSpacingM, quarterWaveSpacingM } from '../../calc/backplane/index';
import fixture from '../fixtures/backplane.json';

const scipy = (element: string, h: number | null) => fixture.cases.find((c) => c.element === element && c.heightWavelengths === h)!;
/** Directivity as a ratio → dBi. */
const ratioToDbi = (x: number) => 10 * Math.log10(x);

export const backplaneCases: ReferenceGroup = {
  topic: 'Backplane spacing and dipoles over a ground plane',
  modules: ['calc/backplane/imageFactor.ts', 'calc/backplane/elementOverGround.ts'],
  cases: [
    { id: 'bp-quarter-wave-phase', title: 'Round-trip phase at h = λ/4: π/2 + π + π/2 = 2π', source: 'Common practice, no source (the quarter-wave rule), hand-worked', expected: 2 * Math.PI, tolerance: 1e-12, quantity: 'angleRad', reads: 'backplaneRoundTripPhaseRad', compute: () => backplaneRoundTripPhaseRad(quarterWaveSpacingM(5.8e9, 1), 5.8e9, 1) },
    { id: 'bp-halfwave-free', title: 'Half-wave dipole directivity by integration: 2.15 dBi', source: 'Balanis, Antenna Theory, 4th ed., §4.6 (section number from memory; D0 = 1.643 ≈ 2.15 dBi)', expected: 2.15, tolerance: 0.005, quantity: 'dBi', reads: 'ratioToDbi', compute: () => ratioToDbi(dipoleOverPlaneDirectivity('halfWave', null)) },
    { id: 'bp-halfwave-quarter', title: 'Horizontal half-wave dipole at λ/4 over an infinite plane, broadside: 7.48 dBi', source: 'SciPy dblquad (scripts/fixtures/backplane.py); a second, independent integration by the array engine in tests/calc/backplane', expected: scipy('halfWave', 0.25).directivityDbi, tolerance: 1e-8, quantity: 'dBi', reads: 'ratioToDbi', compute: () => ratioToDbi(dipoleOverPlaneDirectivity('halfWave', 0.25)) },
    {
      id: 'bp-short-closed-form', title: 'Short horizontal dipole at 0.1 λ: 4 sin²(kh)/R(kh)', source: 'Balanis, Antenna Theory, 4th ed., §4.7.2 (section number from memory; horizontal infinitesimal dipole above ground)',
      expected: (() => { const x = 0.2 * Math.PI, t = 2 * x; return ratioToDbi((4 * Math.sin(x) ** 2) / (2 / 3 - Math.sin(t) / t - Math.cos(t) / t ** 2 + Math.sin(t) / t ** 3)); })(),
      tolerance: 1e-8, quantity: 'dBi', reads: 'ratioToDbi', compute: () => ratioToDbi(dipoleOverPlaneDirectivity('short', 0.1)),
    },
    { id: 'bp-flattest-octave', title: 'Flattest spacing over 2–4 GHz in air: λ/4 at 3 GHz', source: 'Hand-derived from the image factor (equal |sin k h| at both band edges)', expected: 299792458 / 3e9 / 4, tolerance: 1e-9, quantity: 'lengthM', reads: 'flattestSpacingM', compute: () => flattestSpacingM(2e9, 4e9, 1) },
  ],
};
