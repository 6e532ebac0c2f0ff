import { describe, expect, it } from 'vitest';
import { fresnelZoneRadiusM, midpointFresnelRadiusM, radioHorizonM } from '../../../calc/link/lineOfSight';
import { activeArrayEirpW, activeArrayTotalPowerW } from '../../../calc/link/activeArrayEirp';

describe('Fresnel zone and radio horizon', () => {
  it('first Fresnel radius at the midpoint of 10 km at λ = 1 m is 50 m (hand-worked ½√(λd))', () => {
    expect(midpointFresnelRadiusM(10_000, 299_792_458)).toBeCloseTo(50, 9);
  });
  it('is zero at the ends and largest at the midpoint', () => {
    expect(fresnelZoneRadiusM(10_000, 0, 1e9)).toBe(0);
    expect(fresnelZoneRadiusM(10_000, 2500, 1e9)).toBeLessThan(midpointFresnelRadiusM(10_000, 1e9));
    expect(() => fresnelZoneRadiusM(10_000, 12_000, 1e9)).toThrow(/distanceFromTransmitterM/);
  });
  it('radio horizon of a 10 m mast is 13.03 km over a 4/3 earth ("4.12·√h km", common practice)', () => {
    expect(radioHorizonM(10, 0)).toBeCloseTo(13_034.3, 0);
    expect(radioHorizonM(10, 0) / 1000 / Math.sqrt(10)).toBeCloseTo(4.12, 2);
  });
  it('rejects negative heights, naming the input', () => {
    expect(() => radioHorizonM(-1, 10)).toThrow(/heightTransmitM/);
  });
});

describe('active-array EIRP', () => {
  it('64 elements of 0.1 W and 5 dBi: EIRP N²·P·G = 1295 W, total radiated power 6.4 W (hand-worked)', () => {
    expect(activeArrayTotalPowerW(64, 0.1)).toBeCloseTo(6.4, 12);
    expect(activeArrayEirpW(64, 0.1, 5)).toBeCloseTo(64 * 64 * 0.1 * 10 ** 0.5, 9);
  });
  it('doubling N raises EIRP by 6.02 dB and total power by 3.01 dB', () => {
    expect(10 * Math.log10(activeArrayEirpW(32, 1, 0) / activeArrayEirpW(16, 1, 0))).toBeCloseTo(6.0206, 4);
  });
  it('rejects a fractional element count or zero power, naming the input', () => {
    expect(() => activeArrayEirpW(3.5, 1, 0)).toThrow(/elementCount/);
    expect(() => activeArrayTotalPowerW(4, 0)).toThrow(/elementPowerW/);
  });
});
