import { describe, expect, it } from 'vitest';
import { buildArrayModel } from '../../../calc/array/buildArray';
import { directivity } from '../../../calc/array/directivity';
import { linearArrayDirectivity, uniformLinearArrayDirectivity } from '../../../calc/array/linearDirectivity';
import { CalcInputError } from '../../../calc/errors';

const db = (x: number) => 10 * Math.log10(x);

describe('uniformLinearArrayDirectivity(count, spacingWavelengths, scanDeg)', () => {
  it('equals the numerical integral over the sphere within 0.01 dB for several N, spacings and scans (closed form: Hansen, "Phased Array Antennas", 2nd ed., ch. 2 (chapter number from memory))', () => {
    for (const count of [2, 5, 16, 41]) {
      for (const spacing of [0.25, 0.5, 0.7, 1]) {
        for (const scanDeg of [0, 25, 60]) {
          const model = buildArrayModel({ geometry: { kind: 'linear', count, spacingWavelengths: spacing }, steering: { thetaDeg: scanDeg, phiDeg: 0 } });
          const numeric = directivity(model, { method: 'quadrature' });
          expect(numeric.method).toBe('quadrature');
          const exact = uniformLinearArrayDirectivity(count, spacing, scanDeg);
          expect(Math.abs(db(exact) - numeric.directivityDbi), `N=${count} d=${spacing} θ0=${scanDeg}`).toBeLessThan(0.01);
        }
      }
    }
  });
  it('is exactly N at λ/2 spacing for any scan (sinc(mπ) = 0 in the closed form; Balanis, "Antenna Theory", 4th ed., §6.3 (section number from memory): D0 ≈ 2Nd/λ), to 1e-12', () => {
    expect(uniformLinearArrayDirectivity(10, 0.5, 0)).toBeCloseTo(10, 12);
    expect(uniformLinearArrayDirectivity(10, 0.5, 47)).toBeCloseTo(10, 12);
    expect(uniformLinearArrayDirectivity(1, 0.5, 0)).toBe(1);
  });
  it('agrees with the general-weights form linearArrayDirectivity to 1e-12 relative', () => {
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 12, spacingWavelengths: 0.3 }, steering: { thetaDeg: 35, phiDeg: 0 } });
    const general = linearArrayDirectivity(model.weights, 0.3, Math.sin((35 * Math.PI) / 180));
    expect(general / uniformLinearArrayDirectivity(12, 0.3, 35) - 1).toBeLessThan(1e-12);
  });
  it('tapered weights: closed form equals quadrature within 0.01 dB (same source)', () => {
    const model = buildArrayModel({ geometry: { kind: 'linear', count: 24, spacingWavelengths: 0.6 }, taper: { kind: 'taylor', nbar: 4, sidelobeDb: 30 }, steering: { thetaDeg: 20, phiDeg: 0 } });
    const closed = directivity(model).directivityDbi;
    const numeric = directivity(model, { method: 'quadrature' }).directivityDbi;
    expect(Math.abs(closed - numeric)).toBeLessThan(0.01);
  });
  it('rejects N ≤ 0, spacing ≤ 0 and NaN scan with CalcInputError', () => {
    expect(() => uniformLinearArrayDirectivity(0, 0.5, 0)).toThrow(CalcInputError);
    expect(() => uniformLinearArrayDirectivity(8, 0, 0)).toThrow(/spacingWavelengths/);
    expect(() => uniformLinearArrayDirectivity(8, 0.5, Number.NaN)).toThrow(/scanDeg/);
  });
});
