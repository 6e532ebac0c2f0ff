import { describe, expect, it } from 'vitest';
import { displacedFeedBeam, feedOffsetAngleRad, feedOffsetForTiltM, loBeamDeviationFactor } from '../../../calc/reflector/feedOffset';
import { CalcInputError } from '../../../calc/errors';

describe("Lo's beam deviation factor (Y. T. Lo, IRE Trans. AP-8, 1960)", () => {
  it('f/D = 0.4: (1 + 0.36·0.390625)/1.390625 = 0.82022 (hand-worked)', () => {
    expect(loBeamDeviationFactor(0.4)).toBeCloseTo(0.8202247191, 9);
  });
  it('tends to 1 for a flat dish and to k for a very deep one', () => {
    expect(loBeamDeviationFactor(100)).toBeCloseTo(1, 4);
    expect(loBeamDeviationFactor(0.001)).toBeCloseTo(0.36, 4);
  });
  it('feedOffsetForTiltM inverts BDF·atan(δ/f) (round trip, 1e-12)', () => {
    const bdf = loBeamDeviationFactor(0.45);
    const delta = feedOffsetForTiltM(0.031, 0.9, bdf);
    expect(bdf * feedOffsetAngleRad(delta, 0.9)).toBeCloseTo(0.031, 12);
  });
});

describe('displacedFeedBeam: aperture integration with the exact path error', () => {
  const base = { diameterWavelengths: 100, focalRatio: 0.4, powerExponent: 2, blockedDiameterFraction: 0 };
  it('no offset, no tilt, no loss', () => {
    expect(displacedFeedBeam({ ...base, offsetWavelengths: 0 })).toEqual({ peakTiltRad: 0, scanLossDb: 0 });
  });
  it("for small offsets the computed beam peak agrees with Lo's BDF within 0.01 at f/D 0.4 and 0.6 (Lo 1960 quotes k ≈ 0.36 for typical tapers)", () => {
    for (const fd of [0.4, 0.6]) {
      const f = fd * 100;
      const beam = displacedFeedBeam({ ...base, focalRatio: fd, offsetWavelengths: 0.5 });
      const computedBdf = beam.peakTiltRad / Math.atan(0.5 / f);
      expect(Math.abs(computedBdf - loBeamDeviationFactor(fd))).toBeLessThan(0.01);
    }
  });
  it('scan loss grows roughly as the square of the offset for small offsets and is larger for deeper dishes (coma ∝ (D/f)², Ruze, IEEE Trans. AP-13, 1965, qualitative)', () => {
    const l1 = displacedFeedBeam({ ...base, offsetWavelengths: 0.5 }).scanLossDb;
    const l2 = displacedFeedBeam({ ...base, offsetWavelengths: 1 }).scanLossDb;
    expect(l1).toBeGreaterThan(0);
    expect(l2 / l1).toBeGreaterThan(3);
    expect(l2 / l1).toBeLessThan(5);
    const deep = displacedFeedBeam({ ...base, focalRatio: 0.3, offsetWavelengths: 0.75 }).scanLossDb; // same offset angle, 2.5 mrad·f
    const shallow = displacedFeedBeam({ ...base, focalRatio: 0.6, offsetWavelengths: 1.5 }).scanLossDb;
    expect(deep).toBeGreaterThan(shallow);
  });
  it('depends on offset and size only through the tilt in beamwidths (scale invariance: D/λ 100 → 400 at the same δ/λ keeps the tilt in beamwidths and the coma phase k·(δ/f)·a; 0.01 dB)', () => {
    const a = displacedFeedBeam({ ...base, offsetWavelengths: 1 });
    const b = displacedFeedBeam({ ...base, diameterWavelengths: 400, offsetWavelengths: 1 });
    expect(Math.abs(a.scanLossDb - b.scanLossDb)).toBeLessThan(0.01);
    expect(a.peakTiltRad / b.peakTiltRad).toBeCloseTo(4, 2);
  });
  it('rejects invalid input', () => {
    expect(() => displacedFeedBeam({ ...base, offsetWavelengths: -1 })).toThrow(CalcInputError);
    expect(() => displacedFeedBeam({ ...base, focalRatio: 0.2, offsetWavelengths: 1 })).toThrow(CalcInputError);
  });
});
