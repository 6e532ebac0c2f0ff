import { describe, expect, it } from 'vitest';
import { GAUSSIAN_POINTING_COEFFICIENT, pointingErrorForLossDeg, pointingLossDb } from '../../../calc/reflector/pointing';
import { CalcInputError } from '../../../calc/errors';

describe('pointing (Gaussian-beam rule, common practice, no source)', () => {
  it('the coefficient is 40 ln2 / ln10 = 12.04 (exact for a Gaussian beam: 3 dB at Δθ = HPBW/2)', () => {
    expect(GAUSSIAN_POINTING_COEFFICIENT).toBeCloseTo(12.0412, 4);
    expect(pointingLossDb(0.5, 1)).toBeCloseTo(3.0103, 4);
  });
  it('0.1 dB costs 0.0911 HPBW and 1 dB 0.2882 HPBW (√(L/12.04), hand-worked)', () => {
    expect(pointingErrorForLossDeg(0.1, 2)).toBeCloseTo(2 * 0.091131, 5);
    expect(pointingErrorForLossDeg(1, 1)).toBeCloseTo(0.288181, 6);
    expect(pointingLossDb(pointingErrorForLossDeg(0.7, 1.3), 1.3)).toBeCloseTo(0.7, 12);
  });
  it('rejects invalid input', () => {
    expect(() => pointingLossDb(-0.1, 1)).toThrow(CalcInputError);
    expect(() => pointingErrorForLossDeg(1, 0)).toThrow(CalcInputError);
  });
});
