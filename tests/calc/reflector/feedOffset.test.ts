import { describe, expect, it } from 'vitest';
import { displacedFeedBeam, feedOffsetAngleRad, feedOffsetForTiltM, loBeamDeviationFactor, peakInWidenedWindow } from '../../../calc/reflector/feedOffset';
import offsetFixture from '../../../verification/fixtures/reflector-feed-offset.json';
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
  it('beam peak and coma loss match a NumPy direct aperture sum with its own dense search, offsets 0.5…6 λ at f/D 0.3 and 0.4 (up to about 14 beamwidths) (scripts/fixtures/reflector_feed_offset.py): peak to 1e-3 λ/D, loss to 1e-4 dB', () => {
    for (const c of offsetFixture.cases) {
      const beam = displacedFeedBeam(c);
      const where = `f/D ${c.focalRatio}, δ ${c.offsetWavelengths} λ`;
      expect(Math.abs(beam.peakTiltRad - c.peakTiltRad) * c.diameterWavelengths, where).toBeLessThan(1e-3);
      expect(Math.abs(beam.scanLossDb - c.scanLossDb), where).toBeLessThan(1e-4);
    }
  });
  it('far off axis the peak lies beyond the old ±0.8 λ/D window around Lo\'s prediction (f/D 0.3, δ = 6 λ: fixture peak more than 2 λ/D beyond it), and is still found', () => {
    const c = offsetFixture.cases.find((x) => x.focalRatio === 0.3 && x.offsetWavelengths === 6)!;
    const predicted = loBeamDeviationFactor(0.3) * Math.atan(6 / (0.3 * 50));
    expect((Math.sin(c.peakTiltRad) - Math.sin(predicted)) * 50).toBeGreaterThan(2);
    expect(displacedFeedBeam(c).scanLossDb).toBeCloseTo(c.scanLossDb, 4);
  });
});

describe('peakInWidenedWindow', () => {
  const bump = (centre: number) => (s: number) => Math.exp(-(((s - centre) / 0.01) ** 2));
  it('finds a peak far outside the first window by doubling it (1e-8)', () => {
    expect(peakInWidenedWindow(bump(0.3), 0, 0.02, 0.002, 1e-10)).toBeCloseTo(0.3, 8);
    expect(peakInWidenedWindow(bump(-0.45), 0, 0.02, 0.002, 1e-10)).toBeCloseTo(-0.45, 8);
  });
  it('stops at the edge of visible space when the function rises towards it', () => {
    expect(peakInWidenedWindow((s) => s, 0.5, 0.1, 0.01, 1e-10)).toBeCloseTo(1, 6);
  });
  it('rejects a non-positive window or step', () => {
    expect(() => peakInWidenedWindow(bump(0), 0, 0, 0.01, 1e-10)).toThrow(CalcInputError);
    expect(() => peakInWidenedWindow(bump(0), 0, 0.1, 0, 1e-10)).toThrow(CalcInputError);
  });
});

