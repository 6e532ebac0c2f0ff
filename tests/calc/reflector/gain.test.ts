import { describe, expect, it } from 'vitest';
import { apertureGainDbi, diameterForGainM } from '../../../calc/aperture/index';
import { solveDiameterForGainM } from '../../../calc/reflector/gain';
import { CalcInputError } from '../../../calc/errors';

describe('apertureGainDbi(η, D, λ) = 10·log10(η (πD/λ)²)', () => {
  it('D = 3 m at 10 GHz, η = 0.6 gives 47.73 dBi (hand-worked: λ = 0.0299792458 m, πD/λ = 314.3768, squared 98 832.7, × 0.6 = 59 299.6, 10·log10 = 47.7305)', () => {
    expect(apertureGainDbi(0.6, 3, 299_792_458 / 10e9)).toBeCloseTo(47.7305, 4);
  });
  it('a 1 m dish at λ = 1 cm with η = 1 gives 49.94 dBi (π² 10⁴ = 98 696, hand-worked)', () => {
    expect(apertureGainDbi(1, 1, 0.01)).toBeCloseTo(49.943, 3);
  });
  it('doubling D adds 6.02 dB', () => {
    expect(apertureGainDbi(0.55, 2, 0.03) - apertureGainDbi(0.55, 1, 0.03)).toBeCloseTo(6.0206, 4);
  });
});

describe('diameter from gain', () => {
  it('diameterForGainM inverts apertureGainDbi (round trip D → gain → D to 1e-12 relative)', () => {
    for (const d of [0.3, 1.2, 7, 70]) {
      const g = apertureGainDbi(0.63, d, 0.0125);
      expect(diameterForGainM(g, 0.63, 0.0125) / d).toBeCloseTo(1, 12);
    }
  });
  it('solveDiameterForGainM finds D for a D-dependent efficiency (round trip to 1e-9 relative)', () => {
    const lambda = 0.03;
    const eta = (d: number) => 0.7 * (1 - (0.2 / d) ** 2) ** 2; // illustrative: uniform-weighted 0.2 m blockage
    const gain = (d: number) => 10 * Math.log10(eta(d) * ((Math.PI * d) / lambda) ** 2);
    const d = solveDiameterForGainM(gain(1.5), gain, 0.2 * (1 + 1e-9), 1);
    expect(d / 1.5).toBeCloseTo(1, 9);
  });
  it('throws CalcInputError when the target is below what the smallest allowed dish gives', () => {
    const gain = (d: number) => 10 * Math.log10(((Math.PI * d) / 0.03) ** 2);
    expect(() => solveDiameterForGainM(10, gain, 1, 2)).toThrow(CalcInputError);
  });
  it('rejects invalid input', () => {
    expect(() => apertureGainDbi(0, 1, 0.03)).toThrow(CalcInputError);
    expect(() => apertureGainDbi(1.1, 1, 0.03)).toThrow(CalcInputError);
    expect(() => diameterForGainM(Number.NaN, 0.6, 0.03)).toThrow(CalcInputError);
  });
});
