import { describe, expect, it } from 'vitest';
import { hpbwFromDirectivityDeg, squareApertureDirectivity, squareApertureSideForDirectivity, stackingDistanceWavelengths, stackingGainIncreaseDb } from '../../../calc/endFire/index';
import { CalcInputError } from '../../../calc/errors';

describe('stacking identical Yagis (common practice, no source)', () => {
  it('gain increase: +2.5 to +3 dB for two bays, +5 to +6 dB for four', () => {
    expect(stackingGainIncreaseDb(1)).toEqual({ low: 0, high: 0 });
    expect(stackingGainIncreaseDb(2)).toEqual({ low: 2.5, high: 3 });
    expect(stackingGainIncreaseDb(4)).toEqual({ low: 5, high: 6 });
    expect(() => stackingGainIncreaseDb(3 as never)).toThrow(CalcInputError);
  });
  it('distance λ/(2 sin(HPBW/2)): 1 λ at 60°, grows as the beam narrows', () => {
    expect(stackingDistanceWavelengths(60)).toBeCloseTo(1, 14);
    expect(stackingDistanceWavelengths(30)).toBeGreaterThan(stackingDistanceWavelengths(40));
    expect(() => stackingDistanceWavelengths(0)).toThrow(CalcInputError);
  });
});

describe('beamwidth from directivity (Balanis, "Antenna Theory", 4th ed., §2.7 (section number from memory), Kraus\'s approximation)', () => {
  it('√(41 253/D) degrees with 41 253 = 4π(180/π)²', () => {
    expect(hpbwFromDirectivityDeg(41252.96124941928 / 400)).toBeCloseTo(20, 9);
    expect(hpbwFromDirectivityDeg(0.5)).toBe(180);
  });
});

describe('square aperture of side L (Balanis, "Antenna Theory", 4th ed., ch. 12 (chapter number from memory): 4πA/λ²)', () => {
  it('4π L²/λ² and its inverse', () => {
    expect(squareApertureDirectivity(1)).toBeCloseTo(4 * Math.PI, 14);
    expect(squareApertureSideForDirectivity(squareApertureDirectivity(3.7))).toBeCloseTo(3.7, 12);
  });
});

describe('directivityForEqualPlaneHpbw', () => {
  it('inverts hpbwFromDirectivityDeg (Kraus beam-area estimate, round trip)', async () => {
    const { directivityForEqualPlaneHpbw, hpbwFromDirectivityDeg } = await import('../../../calc/endFire/stacking');
    for (const bw of [2, 10, 30, 90]) expect(hpbwFromDirectivityDeg(directivityForEqualPlaneHpbw(bw))).toBeCloseTo(bw, 10);
  });
});
