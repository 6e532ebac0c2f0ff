import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  backplaneImageFactor,
  backplaneImageFactorDb,
  backplaneRoundTripPhaseRad,
  bestBroadsideFrequencyHz,
  broadsideBandHz,
  broadsideNullFrequencyHz,
  broadsideRippleDb,
  flattestSpacingM,
  quarterWaveSpacingM,
} from '../../../calc/backplane/index';
import { groundPlaneImageFactor } from '../../../calc/array/imageFactor';
import { patternPowerAtDirections } from '../../../calc/array/patternPower';
import { customGeometryWavelengths } from '../../../calc/array/customGeometry';
import type { ArrayModel } from '../../../calc/array/types';
import { CalcInputError } from '../../../calc/errors';

const C = 299_792_458;

describe('quarter-wave rule (common practice, no source)', () => {
  it('λ0/(4√εr): 12.92 mm at 5.8 GHz in air, half that at εr = 4', () => {
    expect(quarterWaveSpacingM(5.8e9, 1)).toBeCloseTo(C / 5.8e9 / 4, 15);
    expect(quarterWaveSpacingM(5.8e9, 4)).toBeCloseTo(C / 5.8e9 / 8, 15);
  });
  it('phase arithmetic at h = λ_s/4: π/2 down + π at the conductor + π/2 back = 2π, in air and in a spacer', () => {
    for (const er of [1, 2.2, 4.4, 10]) expect(backplaneRoundTripPhaseRad(quarterWaveSpacingM(1e9, er), 1e9, er)).toBeCloseTo(2 * Math.PI, 12);
  });
  it('so the broadside factor is 2 (+6.02 dB) there, in air and in a spacer', () => {
    for (const er of [1, 3]) expect(backplaneImageFactor(quarterWaveSpacingM(2e9, er), 2e9, er, 0)).toBeCloseTo(2, 12);
  });
});

describe('image factor |2 sin(k0 h √(εr − sin²θ))| (Balanis, "Antenna Theory", 4th ed., §4.7 (section number from memory))', () => {
  it('εr = 1: equals the array engine\'s groundPlaneImageFactor at every angle', () => {
    const h = 0.013, f = 7.3e9;
    for (let theta = 0; theta <= 90; theta += 7.5) {
      const w = Math.cos((theta * Math.PI) / 180);
      expect(backplaneImageFactor(h, f, 1, theta)).toBeCloseTo(Math.abs(groundPlaneImageFactor((h * f) / C, w, 'horizontal')), 13);
    }
  });
  it('εr = 1: equals |AF| of the element and its image summed as two point sources by the array engine (+1 at +h, −1 at −h)', () => {
    const hWl = 0.37;
    const model: ArrayModel = {
      positionsWavelengths: customGeometryWavelengths([0, 0], [0, 0], [hWl, -hWl]).positionsWavelengths,
      weights: { re: Float64Array.of(1, -1), im: Float64Array.of(0, 0) },
      element: { kind: 'isotropic' },
      beam: { thetaDeg: 0, phiDeg: 0 },
    };
    const thetas = Array.from({ length: 19 }, (_, i) => (i * 5 * Math.PI) / 180);
    const power = patternPowerAtDirections(model, thetas.map(Math.sin), thetas.map(() => 0), thetas.map(Math.cos));
    thetas.forEach((t, i) => expect(backplaneImageFactor(hWl * (C / 1e9), 1e9, 1, (t * 180) / Math.PI)).toBeCloseTo(Math.sqrt(power[i]), 12));
  });
  it('spacer: the broadside phase is k0 h √εr (normal incidence), the grazing phase k0 h √(εr − 1)', () => {
    const h = 0.004, f = 6e9, er = 4.4, k0 = (2 * Math.PI * f) / C;
    expect(backplaneImageFactor(h, f, er, 0)).toBeCloseTo(2 * Math.abs(Math.sin(k0 * h * Math.sqrt(er))), 13);
    expect(backplaneImageFactor(h, f, er, 90)).toBeCloseTo(2 * Math.abs(Math.sin(k0 * h * Math.sqrt(er - 1))), 13);
  });
  it('in dB is floored, never −Infinity, at the broadside null (h = λ/2)', () => {
    expect(backplaneImageFactorDb(C / 1e9 / 2, 1e9, 1, 0)).toBe(-60);
  });
  it('throws CalcInputError for a bad angle or spacing', () => {
    expect(() => backplaneImageFactor(0.01, 1e9, 1, 95)).toThrow(CalcInputError);
    expect(() => backplaneImageFactor(0, 1e9, 1, 0)).toThrow(CalcInputError);
  });
});

describe('band figures (hand-derived from the image factor)', () => {
  it('null at twice the best frequency: h = λ_s/2', () => {
    const h = 0.01;
    expect(broadsideNullFrequencyHz(h, 2.5)).toBeCloseTo(C / (2 * h * Math.sqrt(2.5)), 3);
    expect(broadsideNullFrequencyHz(h, 1) / bestBroadsideFrequencyHz(h, 1)).toBeCloseTo(2, 14);
    expect(backplaneImageFactor(h, broadsideNullFrequencyHz(h, 2.5), 2.5, 0)).toBeLessThan(1e-12);
  });
  it('at the 1 dB and 3 dB band edges the broadside factor is exactly 1 dB and 3 dB below +6.02 dB', () => {
    const h = 0.02, er = 2.2;
    for (const within of [1, 3]) {
      const band = broadsideBandHz(h, er, within);
      for (const f of [band.lowHz, band.highHz]) expect(backplaneImageFactorDb(h, f, er, 0)).toBeCloseTo(20 * Math.log10(2) - within, 10);
      expect(backplaneImageFactorDb(h, (band.lowHz + band.highHz) / 2, er, 0)).toBeCloseTo(20 * Math.log10(2), 10);
    }
  });
  it('ripple: 3.01 dB for an octave-wide band centred on f_q (edges at π/4 and 3π/4)', () => {
    expect(broadsideRippleDb(C / 1e9 / 4, 0.5e9, 1.5e9, 1)).toBeCloseTo(10 * Math.log10(2), 12);
  });
  it('ripple throws CalcInputError when the band reaches the null or the edges are reversed', () => {
    expect(() => broadsideRippleDb(C / 1e9 / 2, 0.5e9, 1.2e9, 1)).toThrow(CalcInputError);
    expect(() => broadsideRippleDb(0.01, 2e9, 1e9, 1)).toThrow(CalcInputError);
  });
});

describe('flattestSpacingM: golden-section search vs the analytic optimum λ_s/4 at (f_lo + f_hi)/2 (hand-derived)', () => {
  it('finds the analytic optimum for a few bands and spacers', () => {
    for (const [lo, hi, er] of [[2e9, 4e9, 1], [5.725e9, 5.875e9, 1.05], [0.9e9, 1.6e9, 3.0]] as const) {
      const expected = quarterWaveSpacingM((lo + hi) / 2, er);
      expect(Math.abs(flattestSpacingM(lo, hi, er) / expected - 1)).toBeLessThan(1e-7);
    }
  });
  it('property: no other spacing gives a flatter broadside factor, and every ripple is finite and ≥ 0 (fast-check)', () => {
    fc.assert(fc.property(fc.double({ min: 1e8, max: 2e10, noNaN: true }), fc.double({ min: 1.01, max: 3, noNaN: true }), fc.double({ min: 1, max: 10, noNaN: true }), fc.double({ min: 0.01, max: 0.99, noNaN: true }), (lo, ratio, er, fraction) => {
      const hi = lo * ratio;
      const best = flattestSpacingM(lo, hi, er);
      const other = fraction * quarterWaveSpacingM(hi, er) * 2;
      const rBest = broadsideRippleDb(best, lo, hi, er), rOther = broadsideRippleDb(other, lo, hi, er);
      return Number.isFinite(rBest) && rBest >= 0 && rOther >= rBest - 1e-9;
    }), { numRuns: 200, seed: 5 });
  });
  it('property: the broadside factor falls monotonically from f_q to the null (fast-check)', () => {
    fc.assert(fc.property(fc.double({ min: 1e-3, max: 1, noNaN: true }), fc.double({ min: 1, max: 10, noNaN: true }), fc.double({ min: 0, max: 0.98, noNaN: true }), (h, er, t) => {
      const fq = bestBroadsideFrequencyHz(h, er);
      const f1 = fq * (1 + t), f2 = fq * (1 + t + 0.01);
      return backplaneImageFactor(h, f2, er, 0) < backplaneImageFactor(h, f1, er, 0);
    }), { numRuns: 200, seed: 9 });
  });
});
