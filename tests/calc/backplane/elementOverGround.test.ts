import { describe, expect, it } from 'vitest';
import { dipoleOverPlaneDirectivity, type DipoleKind } from '../../../calc/backplane/index';
import { buildArrayModel } from '../../../calc/array/buildArray';
import { directivity } from '../../../calc/array/directivity';
import { CalcInputError } from '../../../calc/errors';
import fixture from '../../../verification/fixtures/backplane.json';

describe('dipoleOverPlaneDirectivity against SciPy dblquad (scripts/fixtures/backplane.py)', () => {
  for (const c of fixture.cases) {
    it(`${c.element} dipole, h = ${c.heightWavelengths ?? 'no plane'}: D = ${c.directivity.toFixed(5)} within 1e-9 relative`, () => {
      expect(Math.abs(dipoleOverPlaneDirectivity(c.element as DipoleKind, c.heightWavelengths) / c.directivity - 1)).toBeLessThan(1e-9);
    });
  }
});

describe('textbook values', () => {
  it('half-wave dipole alone: 1.641 (2.15 dBi) (Balanis, "Antenna Theory", 4th ed., §4.6 (section number from memory))', () => {
    const d = dipoleOverPlaneDirectivity('halfWave', null);
    expect(d).toBeCloseTo(1.6409, 4);
    expect(10 * Math.log10(d)).toBeCloseTo(2.15, 2);
  });
  it('short dipole alone: 1.5 (Balanis, "Antenna Theory", 4th ed., §4.2 (section number from memory))', () => {
    expect(dipoleOverPlaneDirectivity('short', null)).toBeCloseTo(1.5, 12);
  });
  it('short horizontal dipole over a plane: D0 = 4 sin²(kh)/R(kh) (Balanis, "Antenna Theory", 4th ed., §4.7.2 (section number from memory)), h < 0.4585 λ', () => {
    for (const h of [0.02, 0.1, 0.2, 0.25, 0.33, 0.45]) {
      const x = 2 * Math.PI * h, t = 2 * x;
      const r = 2 / 3 - Math.sin(t) / t - Math.cos(t) / t ** 2 + Math.sin(t) / t ** 3;
      expect(Math.abs(dipoleOverPlaneDirectivity('short', h) / ((4 * Math.sin(x) ** 2) / r) - 1)).toBeLessThan(1e-9);
    }
  });
  it('half-wave horizontal dipole at λ/4 over a plane: 7.48 dBi, computed by two independent integrations (ours and the array engine\'s)', () => {
    const ours = 10 * Math.log10(dipoleOverPlaneDirectivity('halfWave', 0.25));
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 1, spacingWavelengths: 1 }, element: { kind: 'halfWaveDipole', axis: 'x', groundPlaneHeightWavelengths: 0.25 } });
    const engine = directivity(model, { method: 'quadrature', direction: { thetaDeg: 0, phiDeg: 0 }, panelsPerWavelength: 8 }).directivityDbi;
    expect(ours).toBeCloseTo(7.4845, 3);
    expect(Math.abs(ours - engine)).toBeLessThan(1e-6);
  });
  it('…and ≈ 7.49 dBi from impedances, 1.641 × 4 × 73.1/(73.1 + 12.5) with R12(λ/2) ≈ −12.5 Ω (from memory), within 0.05 dB', () => {
    const estimate = 10 * Math.log10((1.641 * 4 * 73.1) / (73.1 + 12.5));
    expect(Math.abs(10 * Math.log10(dipoleOverPlaneDirectivity('halfWave', 0.25)) - estimate)).toBeLessThan(0.05);
  });
  it('is 0 (not NaN) at the broadside null h = λ/2, and throws CalcInputError for a negative height', () => {
    expect(dipoleOverPlaneDirectivity('halfWave', 0.5)).toBeLessThan(1e-20);
    expect(() => dipoleOverPlaneDirectivity('short', -0.1)).toThrow(CalcInputError);
  });
});
