import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import fixture from '../../../verification/fixtures/link-budget.json';
import { axialRatioFromDb, polarizationEfficiency, polarizationMismatchLossDb } from '../../../calc/link/polarizationMismatch';

// The closed form is the one for two elliptically polarized antennas in W. L. Stutzman,
// Polarization in Electromagnetic Systems (Artech House, 1993); the fixture computes the same
// efficiency independently as |e₁ᴴe₂|² of Jones vectors (scripts/fixtures/link_budget.py).

describe('polarizationEfficiency and polarizationMismatchLossDb', () => {
  it('matches the Jones-vector efficiency from NumPy in every fixture case, 1e-12 absolute', () => {
    for (const c of fixture.polarization) {
      const p = polarizationEfficiency(axialRatioFromDb(c.axialRatio1Db), axialRatioFromDb(c.axialRatio2Db), c.sameSense, c.tiltDifferenceDeg);
      expect(Math.abs(p - c.efficiency), JSON.stringify(c)).toBeLessThan(1e-12);
    }
  });
  it('special cases: two linear antennas cos²Δτ, linear–circular ½ (3 dB), co-circular 1, cross-circular 0 (Stutzman 1993)', () => {
    const linear = Number.MAX_SAFE_INTEGER;
    expect(polarizationEfficiency(linear, linear, true, 30)).toBeCloseTo(Math.cos(Math.PI / 6) ** 2, 12);
    expect(polarizationEfficiency(linear, 1, true, 17)).toBeCloseTo(0.5, 12);
    expect(polarizationMismatchLossDb(0, 0, true, 0)).toBe(0);
    expect(polarizationEfficiency(1, 1, false, 0)).toBe(0);
  });
  it('a circular antenna receiving an elliptical wave of axial ratio r gets (1 + r)²/(2(1 + r²)) (hand-worked from the closed form)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1e4, noNaN: true }), fc.double({ min: -180, max: 180, noNaN: true }), (r, tilt) => {
        expect(polarizationEfficiency(1, r, true, tilt)).toBeCloseTo((1 + r) ** 2 / (2 * (1 + r * r)), 12);
      }),
    );
  });
  it('lies between 0 and 1 and never gives NaN or Infinity: cross-polarization is capped at 60 dB', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), fc.boolean(), fc.double({ min: -180, max: 180, noNaN: true }), (a, b, same, tilt) => {
        const loss = polarizationMismatchLossDb(a, b, same, tilt);
        expect(loss).toBeGreaterThanOrEqual(0);
        expect(loss).toBeLessThanOrEqual(60 + 1e-9);
      }),
    );
    expect(polarizationMismatchLossDb(0, 0, false, 0)).toBeCloseTo(60, 9);
  });
  it('rejects an axial ratio below 0 dB, naming the input', () => {
    expect(() => polarizationMismatchLossDb(-1, 0, true, 0)).toThrow(/axialRatio1Db/);
    expect(() => axialRatioFromDb(-0.5)).toThrow(/axial ratio ≥ 0 dB/);
    expect(() => polarizationEfficiency(0.5, 1, true, 0)).toThrow(/axialRatio1/);
  });
});
