import { describe, expect, it } from 'vitest';
import { buildArrayModel } from '../../../calc/array/buildArray';
import { directivity } from '../../../calc/array/directivity';
import { hansenWoodyardPhaseStepRad, ordinaryEndFirePhaseStepRad } from '../../../calc/array/endFirePhase';
import { CalcInputError } from '../../../calc/errors';

const db = (x: number) => 10 * Math.log10(x);
const planar = (columns: number, element: object) =>
  buildArrayModel({ geometry: { kind: 'planar', lattice: 'rectangular', columns, rows: columns, spacingXWavelengths: 0.5 }, element: element as never });

describe('directivity(model) of a large broadside planar array at λ/2 (A = N·(λ/2)²)', () => {
  // 4πA/λ² for a uniformly illuminated aperture: Balanis, "Antenna Theory", 4th ed., §12.5 (section number from memory; D = 4πA/λ²).
  const count = 24;
  const aperture = 4 * Math.PI * count * count * 0.25;
  it('with a forward element of power pattern cos²θ (field cos θ) approaches 4πA/λ² within 0.1 dB', () => {
    const d = directivity(planar(count, { kind: 'cosine', powerExponent: 2 }));
    expect(d.method).toBe('closedForm'); // exact pair sum with the forward cosⁿθ kernel (flat array, no ground plane)
    expect(Math.abs(d.directivityDbi - db(aperture))).toBeLessThan(0.1);
  });
  it('over a ground plane at λ/4 approaches 4πA/λ² within 0.1 dB', () => {
    const d = directivity(planar(count, { kind: 'isotropic', groundPlaneHeightWavelengths: 0.25 }));
    expect(Math.abs(d.directivityDbi - db(aperture))).toBeLessThan(0.1);
  });
  it('with isotropic elements is about 3 dB lower because of the mirror beam (the mirror beam behind the array takes half the power: hand-derived): 64 × 64 within 0.05 dB of 4πA/λ² − 3.01 dB', () => {
    const d = directivity(planar(64, { kind: 'isotropic' }));
    expect(d.method).toBe('closedForm');
    expect(Math.abs(d.directivityDbi - (db(4 * Math.PI * 64 * 64 * 0.25) - db(2)))).toBeLessThan(0.05);
  });
  it('closed form (FFT autocorrelation on the lattice) equals quadrature within 0.01 dB for a circular-outline steered array', () => {
    const model = buildArrayModel({
      geometry: { kind: 'planar', lattice: 'triangular', columns: 12, rows: 12, spacingXWavelengths: 0.6, outline: 'circle' },
      steering: { thetaDeg: 30, phiDeg: 40 }, taper: { kind: 'taylor', nbar: 4, sidelobeDb: 30 }, taperForm: 'radial',
    });
    expect(Math.abs(directivity(model).directivityDbi - directivity(model, { method: 'quadrature' }).directivityDbi)).toBeLessThan(0.01);
  });
  it('pair sum equals quadrature within 0.01 dB for a random 3-D array', () => {
    const model = buildArrayModel({ geometry: { kind: 'random', count: 40, extentXWavelengths: 4, extentYWavelengths: 3, extentZWavelengths: 2, seed: 7 }, steering: { thetaDeg: 50, phiDeg: 200 } });
    expect(Math.abs(directivity(model).directivityDbi - directivity(model, { method: 'quadrature' }).directivityDbi)).toBeLessThan(0.01);
  });
  it('refuses the closed form for an element with no exact pair sum (a dipole, or any element over a ground plane)', () => {
    expect(() => directivity(planar(4, { kind: 'halfWaveDipole', axis: 'x' }), { method: 'closedForm' })).toThrow(CalcInputError);
    expect(() => directivity(planar(4, { kind: 'cosine', powerExponent: 2, groundPlaneHeightWavelengths: 0.25 }), { method: 'closedForm' })).toThrow(CalcInputError);
  });
});

describe('end-fire directivity of long arrays (Balanis, "Antenna Theory", 4th ed., §6.3 and §6.4 (section number from memory))', () => {
  for (const count of [100, 300]) {
    const d = 0.25;
    const lengthWavelengths = count * d;
    it(`ordinary end-fire, N=${count}, d=λ/4: D ≈ 4L/λ within 1 %`, () => {
      const model = buildArrayModel({ geometry: { kind: 'linear', count, spacingWavelengths: d }, phaseStepRad: ordinaryEndFirePhaseStepRad(d), beam: { thetaDeg: 90, phiDeg: 0 } });
      expect(Math.abs(directivity(model).directivity / (4 * lengthWavelengths) - 1)).toBeLessThan(0.01);
    });
    it(`Hansen–Woodyard, N=${count}, d=λ/4: D ≈ 1.805 × 4L/λ within 1 %`, () => {
      const model = buildArrayModel({ geometry: { kind: 'linear', count, spacingWavelengths: d }, phaseStepRad: hansenWoodyardPhaseStepRad(count, d), beam: { thetaDeg: 90, phiDeg: 0 } });
      expect(Math.abs(directivity(model).directivity / (1.805 * 4 * lengthWavelengths) - 1)).toBeLessThan(0.01);
    });
  }
  it('Hansen–Woodyard (π/N form): closed form and quadrature agree within 0.01 dB', () => {
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 30, spacingWavelengths: 0.25 }, phaseStepRad: hansenWoodyardPhaseStepRad(30, 0.25, 'piOverN'), beam: { thetaDeg: 90, phiDeg: 0 } });
    expect(Math.abs(directivity(model).directivityDbi - directivity(model, { method: 'quadrature' }).directivityDbi)).toBeLessThan(0.01);
  });
});
