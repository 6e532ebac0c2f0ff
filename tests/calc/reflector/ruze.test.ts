import { describe, expect, it } from 'vitest';
import { ruzeEfficiency, ruzePeakGainWavelengthM } from '../../../calc/reflector/ruze';
import { CalcInputError } from '../../../calc/errors';

// Ruze, "Antenna tolerance theory — a review", Proc. IEEE 54(4), 1966: η = exp(−(4π ε/λ)²).
describe('ruzeEfficiency(rms, λ)', () => {
  it('ε = λ/16 gives exp(−(π/4)²) = 0.539641 = −2.679 dB (hand-worked from the Ruze equation)', () => {
    const eta = ruzeEfficiency(1 / 16, 1);
    expect(eta).toBeCloseTo(0.5396414858162972, 13);
    expect(10 * Math.log10(eta)).toBeCloseTo(-2.6789, 4);
  });
  it('ε = λ/40 gives exp(−(π/10)²) = 0.90610 (about −0.43 dB, hand-worked)', () => {
    expect(ruzeEfficiency(0.025, 1)).toBeCloseTo(Math.exp(-((Math.PI / 10) ** 2)), 14);
    expect(10 * Math.log10(ruzeEfficiency(0.025, 1))).toBeCloseTo(-0.4286, 4);
  });
  it('is 1 for a perfect surface and depends on ε/λ only', () => {
    expect(ruzeEfficiency(0, 0.03)).toBe(1);
    expect(ruzeEfficiency(0.001, 0.03)).toBeCloseTo(ruzeEfficiency(0.002, 0.06), 15);
  });
  it('Ruze-limited gain peaks at λ = 4πε (d/dλ of λ⁻² exp(−(4πε/λ)²) = 0, hand-derived)', () => {
    const eps = 0.0005;
    const lp = ruzePeakGainWavelengthM(eps);
    const g = (l: number) => ruzeEfficiency(eps, l) / (l * l);
    expect(g(lp)).toBeGreaterThan(g(lp * 1.01));
    expect(g(lp)).toBeGreaterThan(g(lp * 0.99));
  });
  it('rejects negative error and non-positive wavelength', () => {
    expect(() => ruzeEfficiency(-1e-3, 0.03)).toThrow(CalcInputError);
    expect(() => ruzeEfficiency(1e-3, 0)).toThrow(CalcInputError);
  });
});
