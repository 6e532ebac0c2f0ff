import { describe, expect, it } from 'vitest';
import { apertureGainDbi, apertureGainFromArea, circularApertureGain, diameterForGainM, efficiencyForGain } from '../../../calc/aperture/apertureGain';
import { CalcInputError } from '../../../calc/errors';

// G = η·4πA/λ², circular form η(πD/λ)²: IEEE Std 145-2013 (aperture efficiency); Balanis, Antenna Theory, 4th ed., §15.4 (section number from memory).
describe('apertureGainFromArea(A, λ, η) = η·4πA/λ²', () => {
  it('1 m² at λ = 0.1 m, η = 1: 4π·100 = 1256.64 (hand-worked)', () => {
    expect(apertureGainFromArea(1, 0.1)).toBeCloseTo(400 * Math.PI, 10);
  });
  it('scales linearly with η and A and as 1/λ²', () => {
    expect(apertureGainFromArea(2, 0.1, 0.5)).toBeCloseTo(apertureGainFromArea(1, 0.1), 10);
    expect(apertureGainFromArea(1, 0.05) / apertureGainFromArea(1, 0.1)).toBeCloseTo(4, 12);
  });
});

describe('circularApertureGain(D, λ, η) = η(πD/λ)²', () => {
  it('equals the area form with A = πD²/4 (1e-12 relative)', () => {
    for (const [d, l, eta] of [[0.6, 0.0517, 0.55], [3, 0.03, 0.7], [35, 0.21, 0.45]]) {
      expect(circularApertureGain(d, l, eta) / apertureGainFromArea((Math.PI * d * d) / 4, l, eta)).toBeCloseTo(1, 12);
      expect(circularApertureGain(d, l, eta) / (eta * ((Math.PI * d) / l) ** 2)).toBeCloseTo(1, 12);
    }
  });
  it('apertureGainDbi: D = 3 m, 10 GHz, η = 0.6 gives 47.7305 dBi (hand-worked: πD/λ = 314.3768, squared × 0.6 = 59 299.6)', () => {
    expect(apertureGainDbi(0.6, 3, 299_792_458 / 10e9)).toBeCloseTo(47.7305, 4);
  });
});

describe('inverses', () => {
  it('diameterForGainM and efficiencyForGain invert apertureGainDbi (round trip, 1e-12 relative)', () => {
    for (const [d, l, eta] of [[0.45, 0.0125, 0.62], [12, 0.3, 0.5]]) {
      const g = apertureGainDbi(eta, d, l);
      expect(diameterForGainM(g, eta, l) / d).toBeCloseTo(1, 12);
      expect(efficiencyForGain(g, d, l) / eta).toBeCloseTo(1, 12);
    }
  });
  it('efficiencyForGain exceeds 1 when the gain is more than a uniform aperture of that size gives', () => {
    expect(efficiencyForGain(apertureGainDbi(1, 1, 0.03) + 1, 1, 0.03)).toBeCloseTo(10 ** 0.1, 10);
  });
  it('rejects invalid input with CalcInputError', () => {
    expect(() => apertureGainFromArea(0, 0.1)).toThrow(CalcInputError);
    expect(() => apertureGainFromArea(1, -0.1)).toThrow(CalcInputError);
    expect(() => circularApertureGain(1, 0.1, 1.2)).toThrow(CalcInputError);
    expect(() => circularApertureGain(Number.NaN, 0.1)).toThrow(CalcInputError);
    expect(() => efficiencyForGain(30, 0, 0.1)).toThrow(CalcInputError);
  });
});

describe('areaForGainM2: the inverse of the aperture relation', () => {
  it('areaForGainM2(apertureGainFromArea(A, λ, η), λ, η) = A (hand-worked identity of G = η·4πA/λ²)', async () => {
    const { apertureGainFromArea, areaForGainM2 } = await import('../../../calc/aperture/index');
    for (const [area, lambda, eta] of [[1, 0.03, 0.6], [0.01, 0.5, 1], [250, 0.0107, 0.8]]) {
      expect(areaForGainM2(apertureGainFromArea(area, lambda, eta), lambda, eta) / area).toBeCloseTo(1, 12);
    }
    expect(areaForGainM2(4 * Math.PI, 1)).toBeCloseTo(1, 12); // 4π·1 m²/(1 m)² with η = 1
  });
  it('rejects a gain ≤ 0 and an efficiency above 1 with CalcInputError', async () => {
    const { areaForGainM2 } = await import('../../../calc/aperture/index');
    expect(() => areaForGainM2(0, 1)).toThrow(/gain/);
    expect(() => areaForGainM2(10, 1, 1.2)).toThrow(/apertureEfficiency/);
  });
});
