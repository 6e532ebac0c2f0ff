import { describe, expect, it } from 'vitest';
import { blockageEfficiency, centralBlockedFraction } from '../../../calc/reflector/blockage';
import { rimHalfAngleRad, feedAngleAtApertureRadiusRad } from '../../../calc/reflector/geometry';
import { CalcInputError } from '../../../calc/errors';
import fixture from '../../../verification/fixtures/reflector-efficiency.json';

const blockedAngle = (fd: number, fraction: number) => feedAngleAtApertureRadiusRad(fd, fraction / 2); // D = 1

describe('central blockage', () => {
  it('centralBlockedFraction matches SciPy quad for a disk of 10 % of the diameter (scripts/fixtures/reflector_efficiency.py; 1e-7)', () => {
    for (const c of fixture.efficiencies) {
      const cb = centralBlockedFraction(c.powerExponent, rimHalfAngleRad(c.focalRatio), blockedAngle(c.focalRatio, 0.1));
      expect(Math.abs(cb - c.blockedFraction10pct), `f/D=${c.focalRatio} q=${c.powerExponent}`).toBeLessThan(1e-7);
    }
  });
  it('q = 2, f/D = 0.5, Db/D = 0.2: C = I(0.01)/I(0.25) with I(S) = 2S/(1+S) − ln(1+S) (closed form, hand-derived; 1e-12)', () => {
    const i = (s: number) => (2 * s) / (1 + s) - Math.log(1 + s);
    expect(centralBlockedFraction(2, rimHalfAngleRad(0.5), blockedAngle(0.5, 0.2))).toBeCloseTo(i(0.01) / i(0.25), 12);
  });
  it('a nearly uniform aperture (q = 0, f/D = 50) gives C → (Db/D)² and η → (1 − (Db/D)²)² (standard uniform-aperture form; 1e-4)', () => {
    const c = centralBlockedFraction(0, rimHalfAngleRad(50), blockedAngle(50, 0.1));
    expect(c).toBeCloseTo(0.01, 4);
    expect(blockageEfficiency(c)).toBeCloseTo(0.99 ** 2, 4);
  });
  it('a tapered illumination weights the centre more: C exceeds the area fraction', () => {
    expect(centralBlockedFraction(6, rimHalfAngleRad(0.4), blockedAngle(0.4, 0.1))).toBeGreaterThan(0.01);
  });
  it('rejects a fraction outside [0, 1] and a blockage wider than the dish', () => {
    expect(() => blockageEfficiency(1.2)).toThrow(CalcInputError);
    expect(() => centralBlockedFraction(2, 1, 1.2)).toThrow(CalcInputError);
  });
});
