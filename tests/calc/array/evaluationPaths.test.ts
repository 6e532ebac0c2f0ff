import { describe, expect, it } from 'vitest';
import { buildArrayModel } from '../../../calc/array/buildArray';
import type { ArraySpec } from '../../../calc/array/buildArray';
import { patternCut } from '../../../calc/array/patternCut';
import { patternThetaPhiGrid } from '../../../calc/array/patternGrid';
import { patternUvGrid } from '../../../calc/array/uvGrid';

// Self-consistency: every fast path is an exact rewrite of Σ w_n e^{jk r_n·û}, so they must agree to round-off.
const maxRelativeDifference = (a: Float64Array, b: Float64Array) => {
  let peak = 0, difference = 0;
  for (let i = 0; i < a.length; i++) { peak = Math.max(peak, a[i]); difference = Math.max(difference, Math.abs(a[i] - b[i])); }
  return difference / peak;
};

const specs: Array<[string, ArraySpec]> = [
  ['rectangular Taylor steered', { geometry: { kind: 'planar', lattice: 'rectangular', columns: 16, rows: 12, spacingXWavelengths: 0.5, spacingYWavelengths: 0.5 }, taper: { kind: 'taylor', nbar: 4, sidelobeDb: 30 }, steering: { thetaDeg: 25, phiDeg: 40 }, element: { kind: 'cosine', powerExponent: 2.4 } }],
  ['linear Chebyshev', { geometry: { kind: 'linear', count: 33, spacingWavelengths: 0.5 }, taper: { kind: 'chebyshev', sidelobeDb: 35 }, steering: { thetaDeg: 40, phiDeg: 0 } }],
  ['triangular circle 3-bit', { geometry: { kind: 'planar', lattice: 'triangular', columns: 14, rows: 14, spacingXWavelengths: 0.5, outline: 'circle' }, steering: { thetaDeg: 20, phiDeg: 10 }, phaseBits: 3 }],
  ['elliptical radial cosine', { geometry: { kind: 'planar', lattice: 'rectangular', columns: 20, rows: 10, spacingXWavelengths: 0.5, outline: 'ellipse' }, taper: { kind: 'cosineOnPedestal', pedestal: 0.3 }, taperForm: 'radial', element: { kind: 'halfWaveDipole', axis: 'y', groundPlaneHeightWavelengths: 0.25 } }],
];

describe('evaluation paths agree with direct summation', () => {
  for (const [name, spec] of specs) {
    const model = buildArrayModel(spec);
    it(`${name}: u–v grid by FFT / separable / lattice equals direct summation to 1e-12 of the peak`, () => {
      const direct = patternUvGrid(model, { count: 64, path: 'direct' });
      const auto = patternUvGrid(model, { count: 64 });
      expect(maxRelativeDifference(auto.power, direct.power)).toBeLessThan(1e-12);
      if (model.lattice) expect(maxRelativeDifference(patternUvGrid(model, { count: 64, path: 'lattice' }).power, direct.power)).toBeLessThan(1e-12);
      if (model.separable) expect(maxRelativeDifference(patternUvGrid(model, { count: 64, path: 'separable' }).power, direct.power)).toBeLessThan(1e-12);
    });
    it(`${name}: θ cut and θ–φ grid agree between the fastest path and direct summation to 1e-12`, () => {
      expect(maxRelativeDifference(patternCut(model, { phiDeg: 33, count: 361 }).power, patternCut(model, { phiDeg: 33, count: 361, path: 'direct' }).power)).toBeLessThan(1e-12);
      expect(maxRelativeDifference(patternThetaPhiGrid(model, 19, 37).power, patternThetaPhiGrid(model, 19, 37, 'direct').power)).toBeLessThan(1e-12);
    });
  }
  it('the FFT path is used for a λ/2 rectangular lattice on the default [−1, 1) grid with power-of-two count', () => {
    expect(patternUvGrid(buildArrayModel(specs[0][1]), { count: 128 }).path).toBe('fft');
    expect(patternUvGrid(buildArrayModel(specs[0][1]), { count: 100 }).path).not.toBe('fft');
  });
  it('the FFT path agrees with direct summation for more elements than FFT points (folding) and a sub-window of u–v', () => {
    const model = buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns: 40, rows: 24, spacingXWavelengths: 0.5 }, steering: { thetaDeg: 10, phiDeg: 0 } });
    const options = { count: 32, uMin: -0.5, uMax: 0.5, vMin: -0.25, vMax: 0.75 };
    const fft = patternUvGrid(model, { ...options, path: 'fft' });
    expect(maxRelativeDifference(fft.power, patternUvGrid(model, { ...options, path: 'direct' }).power)).toBeLessThan(1e-12);
  });
  it('cut with negative θ equals the cut at φ + 180° (convention in patternCut)', () => {
    const model = buildArrayModel(specs[0][1]);
    const a = patternCut(model, { phiDeg: 10, thetaStartDeg: -80, thetaStopDeg: -10, count: 8 }).power;
    const b = patternCut(model, { phiDeg: 190, thetaStartDeg: 80, thetaStopDeg: 10, count: 8 }).power;
    expect(maxRelativeDifference(a, b)).toBeLessThan(1e-12);
  });
});
