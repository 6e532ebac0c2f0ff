/**
 * Headline checks of the array engine (calc/array) that the array pattern explorer is built on,
 * each against an outside source; the full checks live in tests/calc/array/*.
 */
import type { ReferenceGroup } from './referenceCase';
import {
  buildArrayModel,
  chebyshevLineWeights,
  directivity,
  ordinaryEndFirePhaseStepRad,
  principalPlaneMetrics,
  taylorLineWeights,
  uniformLinearArrayDirectivity,
} from '../../calc/array/index';
import fixture from '../fixtures/array-weights.json';

const db = (x: number) => 10 * Math.log10(x);
const DEG = 180 / Math.PI;
/** Beamwidth (rad) times the aperture size in wavelengths: the constant of HPBW ≈ k λ/L. */
const beamwidthTimesSizeRad = (hpbwDeg: number, sizeWavelengths: number) => (hpbwDeg / DEG) * sizeWavelengths;
const SCIPY = 'SciPy 1.17.1 via scripts/fixtures/array_weights.py (verification/fixtures/array-weights.json)';

const taylorCase = fixture.taylor.find((c) => c.count === 16 && c.nbar === 4 && c.sidelobeDb === 30 && c.norm)!;
const chebyshevCase = fixture.chebyshev.find((c) => c.count === 16 && c.sidelobeDb === 30)!;

// A 2,000-element λ/8 line approximates a continuous uniform line source of L = 250 λ.
const longLine = () => principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count: 2000, spacingWavelengths: 0.125 } })).theta;
// A 100 × 100 λ/2 lattice cut to a circle approximates a uniform circular aperture of D = 50 λ.
const disc = () => principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 100, rows: 100, spacingXWavelengths: 0.5, outline: 'circle' } })).theta;

export const arrayEngineCases: ReferenceGroup = {
  topic: 'Array engine: directivity, tapers, beamwidths and sidelobes',
  modules: ['calc/array/directivity.ts', 'calc/array/linearDirectivity.ts', 'calc/array/taylorWeights.ts', 'calc/array/chebyshevWeights.ts', 'calc/array/beamMetrics.ts'],
  cases: [
    {
      id: 'array-closed-form-vs-integral',
      title: '16-element line, 0.7 λ, scanned 25°: closed-form directivity equals integration over the sphere',
      source: 'Closed form: Hansen, Phased Array Antennas, 2nd ed., ch. 2 (chapter number from memory); integral: IEEE Std 145 definition by Gauss–Legendre quadrature',
      expected: db(uniformLinearArrayDirectivity(16, 0.7, 25)),
      tolerance: 0.01,
      quantity: 'dBi',
      reads: 'directivityDbi',
      compute: () => directivity(buildArrayModel({ geometry: { kind: 'linear', count: 16, spacingWavelengths: 0.7 }, steering: { thetaDeg: 25, phiDeg: 0 } }), { method: 'quadrature' }).directivityDbi,
    },
    {
      id: 'array-taylor-scipy',
      title: 'Taylor weights, 16 elements, n̄ = 4, 30 dB: third weight',
      source: `scipy.signal.windows.taylor(16, 4, 30, norm=True); ${SCIPY}`,
      expected: taylorCase.weights[2],
      tolerance: 1e-12,
      quantity: 'ratio',
      reads: 'taylorLineWeights',
      compute: () => taylorLineWeights(16, 4, 30, true)[2],
    },
    {
      id: 'array-chebyshev-scipy',
      title: 'Dolph–Chebyshev weights, 16 elements, 30 dB: second weight',
      source: `scipy.signal.windows.chebwin(16, 30); ${SCIPY}`,
      expected: chebyshevCase.weights[1],
      tolerance: 1e-9,
      quantity: 'ratio',
      reads: 'chebyshevLineWeights',
      compute: () => chebyshevLineWeights(16, 30)[1],
    },
    {
      id: 'array-chebyshev-equiripple',
      title: 'Dolph–Chebyshev, 21 elements at λ/2 designed for 40 dB: peak sidelobe −40 dB',
      source: 'Dolph, Proc. IRE 34 (1946): equiripple sidelobes at the design level',
      expected: -40,
      tolerance: 0.01,
      quantity: 'dB',
      reads: 'peakSidelobeDb',
      compute: () => principalPlaneMetrics(buildArrayModel({ geometry: { kind: 'linear', count: 21, spacingWavelengths: 0.5 }, taper: { kind: 'chebyshev', sidelobeDb: 40 } })).theta.peakSidelobeDb!,
    },
    {
      id: 'array-line-hpbw',
      title: 'Uniform line source: HPBW (rad) × L/λ = 0.886',
      source: 'Balanis, Antenna Theory, 4th ed., ch. 12 (chapter number from memory; uniform line source); Stutzman & Thiele, Antenna Theory and Design',
      expected: 0.886,
      tolerance: 0.886e-3,
      quantity: 'angleRad',
      reads: 'beamwidthTimesSizeRad',
      compute: () => beamwidthTimesSizeRad(longLine().hpbwDeg!, 250),
    },
    {
      id: 'array-line-sidelobe',
      title: 'Uniform line source: first sidelobe −13.26 dB',
      source: 'Balanis, Antenna Theory, 4th ed., ch. 12 (chapter number from memory; uniform line source)',
      expected: -13.26,
      tolerance: 0.01,
      quantity: 'dB',
      reads: 'peakSidelobeDb',
      compute: () => longLine().peakSidelobeDb!,
    },
    {
      id: 'array-disc-hpbw',
      title: 'Uniform circular aperture (D = 50 λ lattice disc): HPBW (rad) × D/λ = 1.029',
      source: 'Balanis, Antenna Theory, 4th ed., ch. 12 (chapter number from memory; uniform circular aperture)',
      expected: 1.029,
      tolerance: 1.029 * 0.005,
      quantity: 'angleRad',
      reads: 'beamwidthTimesSizeRad',
      compute: () => beamwidthTimesSizeRad(disc().hpbwDeg!, 50),
    },
    {
      id: 'array-disc-sidelobe',
      title: 'Uniform circular aperture (D = 50 λ lattice disc): first sidelobe −17.57 dB',
      source: 'Balanis, Antenna Theory, 4th ed., ch. 12 (chapter number from memory; uniform circular aperture)',
      expected: -17.57,
      tolerance: 0.1,
      quantity: 'dB',
      reads: 'peakSidelobeDb',
      compute: () => disc().peakSidelobeDb!,
    },
    {
      id: 'array-aperture-directivity',
      title: '24 × 24 λ/2 planar array over a λ/4 ground plane: directivity 4πA/λ²',
      source: 'Balanis, Antenna Theory, 4th ed., §12.5 (section number from memory; D = 4πA/λ² for a uniform aperture)',
      expected: db(4 * Math.PI * 24 * 24 * 0.25),
      tolerance: 0.1,
      quantity: 'dBi',
      reads: 'directivityDbi',
      compute: () => directivity(buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 24, rows: 24, spacingXWavelengths: 0.5 }, element: { kind: 'isotropic', groundPlaneHeightWavelengths: 0.25 } })).directivityDbi,
    },
    {
      id: 'array-end-fire',
      title: 'Ordinary end-fire line, 100 elements at λ/4: D / (4L/λ) = 1',
      source: 'Balanis, Antenna Theory, 4th ed., §6.4 (section number from memory; ordinary end-fire, D ≈ 4L/λ)',
      expected: 1,
      tolerance: 0.01,
      quantity: 'ratio',
      reads: 'directivity',
      compute: () => directivity(buildArrayModel({ geometry: { kind: 'linear', count: 100, spacingWavelengths: 0.25 }, phaseStepRad: ordinaryEndFirePhaseStepRad(0.25), beam: { thetaDeg: 90, phiDeg: 0 } })).directivity / (4 * 25),
    },
  ],
};
