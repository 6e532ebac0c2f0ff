import { describe, expect, it } from 'vitest';
import { forwardCosineKernel } from '../../../calc/array/forwardCosineKernel';
import { buildArrayModel, directivity, type ArraySpec } from '../../../calc/array/index';
import fixture from '../../fixtures/cosine-kernel.json';

describe('forwardCosineKernel(ρ λ, n): sphere average of the pair phase times a forward cosⁿθ power pattern', () => {
  it('matches SciPy quad of ½∫₀¹ J0(2πρ√(1−t²)) tⁿ dt to 1e-12 for ρ up to 44 λ and n from 0 to 5 (scripts/fixtures/cosine_kernel.py)', () => {
    expect(fixture.cases.length).toBe(60);
    for (const c of fixture.cases) expect(Math.abs(forwardCosineKernel(c.rhoWavelengths, c.powerExponent) - c.kernel), JSON.stringify(c)).toBeLessThan(1e-12);
  });
  it('K(0) = 1/(2(n + 1)): a single element has directivity 2(n + 1) (hand-worked, ∫ cosⁿθ dΩ over the forward half space = 2π/(n + 1))', () => {
    expect(forwardCosineKernel(0, 1.3)).toBeCloseTo(1 / 4.6, 15);
    const single = directivity(buildArrayModel({ geometry: { kind: 'linear', count: 1, spacingWavelengths: 0.5 }, element: { kind: 'cosine', powerExponent: 1.3 } }));
    expect(single.method).toBe('closedForm');
    expect(single.directivity).toBeCloseTo(4.6, 12);
  });
  it('rejects a negative separation and an exponent outside 0…1000 with CalcInputError', () => {
    expect(() => forwardCosineKernel(-1, 1)).toThrow(/rhoWavelengths/);
    expect(() => forwardCosineKernel(1, -0.5)).toThrow(/powerExponent/);
  });
});

describe('directivity: the exact pair sum for flat arrays of forward cosⁿθ elements agrees with quadrature over the sphere', () => {
  const cases: [string, ArraySpec][] = [
    ['8 × 8 triangular, n = 1.3, broadside', { geometry: { kind: 'planar', lattice: 'triangular', columns: 8, rows: 8, spacingXWavelengths: 0.5 }, element: { kind: 'cosine', powerExponent: 1.3 } }],
    ['12 × 10 at 0.6 λ, n = 2, Taylor, steered (40°, 30°)', { geometry: { kind: 'planar', lattice: 'rectangular', columns: 12, rows: 10, spacingXWavelengths: 0.6 }, element: { kind: 'cosine', powerExponent: 2 }, steering: { thetaDeg: 40, phiDeg: 30 }, taper: { kind: 'taylor', nbar: 4, sidelobeDb: 30 } }],
    ['16-element line at 0.7 λ, n = 1, steered 50°', { geometry: { kind: 'linear', count: 16, spacingWavelengths: 0.7 }, element: { kind: 'cosine', powerExponent: 1 }, steering: { thetaDeg: 50, phiDeg: 0 } }],
    ['24-element ring of radius 2 λ, n = 1.3, steered (20°, 40°)', { geometry: { kind: 'circular', count: 24, radiusWavelengths: 2 }, element: { kind: 'cosine', powerExponent: 1.3 }, steering: { thetaDeg: 20, phiDeg: 40 } }],
  ];
  for (const [title, spec] of cases) {
    it(`${title}: within 1e-7 dB of Gauss–Legendre quadrature at 5 panels per wavelength (two independent paths)`, () => {
      const model = buildArrayModel(spec);
      const exact = directivity(model);
      const integrated = directivity(model, { method: 'quadrature', panelsPerWavelength: 5 });
      expect(exact.method).toBe('closedForm');
      expect(Math.abs(exact.directivityDbi - integrated.directivityDbi)).toBeLessThan(1e-7);
    });
  }
  it('a ground plane or an element off the x–y plane still uses quadrature', () => {
    const grounded = buildArrayModel({ geometry: { kind: 'linear', count: 4, spacingWavelengths: 0.5 }, element: { kind: 'cosine', powerExponent: 1.3, groundPlaneHeightWavelengths: 0.25 } });
    expect(directivity(grounded).method).toBe('quadrature');
    expect(() => directivity(grounded, { method: 'closedForm' })).toThrow(/closed form/);
  });
});
