import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  mismatchLossDb,
  mismatchLossFromVswrDb,
  reflectionMagnitudeFromReturnLossDb,
  reflectionMagnitudeFromVswr,
  returnLossDbFromReflectionMagnitude,
  vswrFromReflectionMagnitude,
} from '../../../calc/link/mismatch';
import { CalcInputError } from '../../../calc/errors';

describe('VSWR ↔ |Γ| ↔ return loss ↔ mismatch loss', () => {
  it('VSWR 2: |Γ| = 1/3, return loss 9.54 dB, mismatch loss 0.51 dB (hand-worked)', () => {
    expect(reflectionMagnitudeFromVswr(2)).toBeCloseTo(1 / 3, 15);
    expect(returnLossDbFromReflectionMagnitude(1 / 3)).toBeCloseTo(9.5424, 4);
    expect(mismatchLossFromVswrDb(2)).toBeCloseTo(0.51153, 5);
  });
  it('VSWR 1.5: |Γ| = 0.2, return loss 13.98 dB, mismatch loss 0.177 dB (hand-worked)', () => {
    expect(reflectionMagnitudeFromVswr(1.5)).toBeCloseTo(0.2, 15);
    expect(returnLossDbFromReflectionMagnitude(0.2)).toBeCloseTo(13.9794, 4);
    expect(mismatchLossDb(0.2)).toBeCloseTo(0.17729, 5);
  });
  it('a perfect match has no mismatch loss', () => {
    expect(mismatchLossFromVswrDb(1)).toBe(0);
  });
  it('VSWR → |Γ| → VSWR and return loss → |Γ| → return loss are the identity (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1000, noNaN: true }), (s) => {
        expect(vswrFromReflectionMagnitude(reflectionMagnitudeFromVswr(s))).toBeCloseTo(s, 6);
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 0, max: 80, noNaN: true }), (rl) => {
        expect(returnLossDbFromReflectionMagnitude(reflectionMagnitudeFromReturnLossDb(rl))).toBeCloseTo(rl, 9);
      }),
    );
  });
  it('a worse match never lowers the mismatch loss (property, up to floating-point rounding of 1e-12 relative)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (s, ds) => {
        const before = mismatchLossFromVswrDb(s);
        expect(mismatchLossFromVswrDb(s + ds)).toBeGreaterThanOrEqual(before - 1e-12 * Math.abs(before));
      }),
    );
  });
  it('rejects VSWR below 1 and |Γ| ≥ 1 with a message naming the input', () => {
    expect(() => reflectionMagnitudeFromVswr(0.9)).toThrow(CalcInputError);
    expect(() => reflectionMagnitudeFromVswr(0.9)).toThrow(/vswr: expected a VSWR ≥ 1/);
    expect(() => mismatchLossDb(1)).toThrow(/reflectionMagnitude/);
    expect(() => reflectionMagnitudeFromReturnLossDb(-1)).toThrow(/returnLossDb/);
  });
});
